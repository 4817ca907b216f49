/**
 * The garments per size as typed on the new batch form. The text is kept as typed: "8.5" or "-4" reaches the
 * shared schema, which names the size ("Whole garments only", "Cannot be negative"), instead of being cut down to
 * "85" or "4" behind the owner's back. An empty box is 0; text that is not a number is listed in `unreadable`.
 */
export function readSizeQuantities(sizeRun: readonly string[], typed: Record<string, string | undefined>) {
  const quantities: Record<string, number> = {};
  const unreadable: string[] = [];
  for (const size of sizeRun) {
    const text = (typed[size] ?? '').trim();
    if (text === '') quantities[size] = 0;
    else if (/^[-+]?\d+([.,]\d+)?$/.test(text)) quantities[size] = Number(text.replace(',', '.'));
    else {
      quantities[size] = Number.NaN;
      unreadable.push(size);
    }
  }
  const total = Object.values(quantities).reduce((a, q) => a + (Number.isInteger(q) && q > 0 ? q : 0), 0);
  return { quantities, unreadable, total };
}
