import { allocateRolls, planCutOrder, type SizeRatio } from '@planning';
import { mm } from '@shared/units/units';

/** Key of a size ratio over the style's size run, e.g. `XS1|S2|M0`. */
export const ratioKey = (ratio: SizeRatio, sizes: string[]) => sizes.map((s) => `${s}${ratio[s] ?? 0}`).join('|');

type OrderOptions = Omit<Parameters<typeof planCutOrder>[0], 'markerLength'>;

/**
 * Everything the cut-order core and roll allocation need, as plain data, so the solve can run in the web
 * process or on a job worker (`npm run worker`) alike. Marker lengths: a stored marker of the ratio on
 * this width, else piece area ÷ (width × assumed utilisation).
 */
export interface CutOrderJobInput {
  order: OrderOptions;
  storedLengthsMm: Record<string, number>;
  garmentAreasMm2: Record<string, number>;
  widthMm: number;
  assumedUtilisation: number;
  rolls: { id: string; lengthMm: number; shadeLot: string; widthMm: number }[];
}

export type CutOrderJobOutput =
  | { plan: ReturnType<typeof planCutOrder>; allocation: ReturnType<typeof allocateRolls> }
  /** The core refused the inputs (a marker-length limit no ratio fits): the caller answers 400. */
  | { rangeError: string };

export function solveCutOrderJob(input: CutOrderJobInput): CutOrderJobOutput {
  const sizes = input.order.sizes;
  const estimate = (ratio: SizeRatio) =>
    sizes.reduce((a, s) => a + (ratio[s] ?? 0) * (input.garmentAreasMm2[s] ?? 0), 0) / (input.widthMm * input.assumedUtilisation);
  const markerLength = (ratio: SizeRatio) => mm(input.storedLengthsMm[ratioKey(ratio, sizes)] ?? estimate(ratio));
  let plan: ReturnType<typeof planCutOrder>;
  try {
    plan = planCutOrder({ ...input.order, markerLength });
  } catch (err) {
    if (err instanceof RangeError) return { rangeError: err.message };
    throw err;
  }
  const allocation = allocateRolls({
    lays: plan.lays.map((l) => ({ plies: l.plies, markerLength: l.markerLength })),
    rolls: input.rolls.map((r) => ({ id: r.id, length: mm(r.lengthMm), shadeLot: r.shadeLot, width: mm(r.widthMm) })),
    endAllowance: plan.endAllowance,
  });
  return { plan, allocation };
}
