/**
 * Seamrun's line style per size position in a graded set, drawn over each other: the base size is a solid, heavy
 * thread-teal line; sizes below it run cool (indigo, teal) and above it warm (madder, saffron), each with its own
 * dash so the set reads in grey print too.
 */
export interface SizeLineStyle {
  stroke: string;
  width: number;
  dash: string;
}

const BELOW: SizeLineStyle[] = [
  { stroke: '#15596A', width: 1.4, dash: '7 3' },
  { stroke: '#3D4A8C', width: 1.4, dash: '2 3' },
  { stroke: '#2A3366', width: 1.2, dash: '1 4' },
];
const ABOVE: SizeLineStyle[] = [
  { stroke: '#B5523B', width: 1.4, dash: '10 3 2 3' },
  { stroke: '#D99A1E', width: 1.6, dash: '14 4' },
  { stroke: '#7D3524', width: 1.2, dash: '4 2 1 2' },
];
const BASE: SizeLineStyle = { stroke: '#0B3945', width: 2.6, dash: '' };

/** Line style for `size` within `sizes` around `baseSize` (further from the base → further along its list). */
export function sizeLineStyle(sizes: readonly string[], baseSize: string, size: string): SizeLineStyle {
  const b = sizes.indexOf(baseSize), i = sizes.indexOf(size);
  if (i === b) return BASE;
  const list = i < b ? BELOW : ABOVE;
  return list[Math.min(Math.abs(i - b) - 1, list.length - 1)];
}
