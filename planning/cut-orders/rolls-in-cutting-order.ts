import { mm, type Millimetres } from '@shared/units';
import { DEFAULT_REMNANT_STOCK_THRESHOLD_MM } from './spreading-constants';

/** One lay in cutting order and the length it takes from each roll (mm). */
export interface LayInCuttingOrder {
  layNo: number;
  rolls: { rollId: string; plies: number; lengthMm: Millimetres | number }[];
}

/** A roll before the first lay of the plan. */
export interface RollAtStart {
  rollId: string;
  label: string;
  shadeLot: string;
  lengthMm: Millimetres | number;
}

/** One roll's lays in cutting order, what each takes and what is left after it. */
export interface RollInCuttingOrder {
  rollId: string;
  label: string;
  shadeLot: string;
  startLengthMm: Millimetres;
  uses: { layNo: number; plies: number; lengthMm: Millimetres; remainingAfterMm: Millimetres }[];
  /** Left after the roll's last lay. */
  expectedRemnantMm: Millimetres;
  /** The remnant is long enough to keep as stock (≥ the threshold); otherwise it is end-of-roll waste. */
  isStock: boolean;
  /** Σ uses exceed the roll: the plan cannot be cut from it as printed. */
  isShort: boolean;
}

/**
 * The marker list per roll: each roll's lays in the order the lays are cut (the order of `lays`), with
 * the length left after each, so the remnants printed are those this cutting order leaves. Rolls come
 * in the order of their first lay, then by label; rolls with no lay are left out. Lengths in mm.
 */
export function rollsInCuttingOrder(
  lays: LayInCuttingOrder[],
  rolls: RollAtStart[],
  remnantThreshold: Millimetres | number = DEFAULT_REMNANT_STOCK_THRESHOLD_MM,
): RollInCuttingOrder[] {
  const byId = new Map(rolls.map((r) => [r.rollId, r]));
  const out = new Map<string, RollInCuttingOrder>();
  for (const lay of lays) {
    for (const line of lay.rolls) {
      const start = byId.get(line.rollId);
      if (!start) throw new RangeError(`lay ${lay.layNo} takes from roll ${line.rollId}, which is not listed`);
      let sheet = out.get(line.rollId);
      if (!sheet) {
        sheet = { rollId: start.rollId, label: start.label, shadeLot: start.shadeLot, startLengthMm: mm(start.lengthMm), uses: [], expectedRemnantMm: mm(start.lengthMm), isStock: false, isShort: false };
        out.set(line.rollId, sheet);
      }
      const left = sheet.expectedRemnantMm - line.lengthMm;
      sheet.uses.push({ layNo: lay.layNo, plies: line.plies, lengthMm: mm(line.lengthMm), remainingAfterMm: mm(left) });
      sheet.expectedRemnantMm = mm(left);
    }
  }
  for (const s of out.values()) {
    s.isShort = s.expectedRemnantMm < -1e-6;
    s.isStock = !s.isShort && s.expectedRemnantMm >= remnantThreshold;
  }
  return [...out.values()];
}
