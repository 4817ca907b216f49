import { minor, type MinorUnits } from '@shared/units';

/** One claim of finished work: a person did `pieces` of an operation on a bundle on a date. */
export interface WorkRecord {
  personId: string;
  bundleId: string;
  operationId: string;
  pieces: number;
  /** `yyyy-MM-dd` */
  date: string;
  /** Work redone after a quality check: never paid again. */
  isRework?: boolean;
}

/** Input to {@link computePiecePay}. Rates are integer minor units per piece. */
export interface PiecePayInput {
  records: WorkRecord[];
  rates: Record<string, MinorUnits>;
  /** Pay period, ISO dates inclusive. */
  from: string;
  to: string;
}

/** One person's pay for the period. */
export interface PersonPay {
  personId: string;
  pieces: number;
  reworkPieces: number;
  amount: MinorUnits;
}

/** Result of {@link computePiecePay}. */
export interface PiecePay {
  people: PersonPay[];
  total: MinorUnits;
  /** Records refused: a bundle-operation already paid (first claim wins), or an unknown operation. */
  rejected: { record: WorkRecord; reason: 'already-paid' | 'unknown-operation' }[];
}

/**
 * Piece-rate pay per person for a period: Σ pieces × rate (integer minor units, so no rounding).
 * Rework pieces are counted but not paid, and each bundle × operation is paid once: pieces beyond
 * the first claim's are rejected. Records outside the period are ignored; people sorted by id.
 */
export function computePiecePay(input: PiecePayInput): PiecePay {
  const inPeriod = input.records
    .filter((r) => r.date >= input.from && r.date <= input.to)
    .map((r, i) => ({ r, i }))
    .sort((a, b) => (a.r.date < b.r.date ? -1 : a.r.date > b.r.date ? 1 : a.i - b.i));
  const paid = new Set<string>();
  const people = new Map<string, PersonPay>();
  const rejected: PiecePay['rejected'] = [];
  for (const { r } of inPeriod) {
    const person = people.get(r.personId) ?? { personId: r.personId, pieces: 0, reworkPieces: 0, amount: minor(0) };
    people.set(r.personId, person);
    if (r.isRework) {
      person.reworkPieces += r.pieces;
      continue;
    }
    const rate = input.rates[r.operationId];
    if (rate === undefined) {
      rejected.push({ record: r, reason: 'unknown-operation' });
      continue;
    }
    const key = `${r.bundleId}\u0000${r.operationId}`;
    if (paid.has(key)) {
      rejected.push({ record: r, reason: 'already-paid' });
      continue;
    }
    paid.add(key);
    person.pieces += r.pieces;
    person.amount = minor(person.amount + r.pieces * rate);
  }
  const list = [...people.values()].sort((a, b) => (a.personId < b.personId ? -1 : a.personId > b.personId ? 1 : 0));
  return { people: list, total: minor(list.reduce((a, p) => a + p.amount, 0)), rejected };
}
