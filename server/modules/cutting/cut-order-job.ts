import highsLoader from 'highs';
import { allocateRolls, DEFAULT_SPLICE_OVERLAP_MM, solveCutOrder, type CutCosts, type CutOrderInput, type CutOrderPlan, type MipSolver, type SizeRatio } from '@planning';
import { mm } from '@shared/units/units';

/** Key of a size ratio over the style's size run, e.g. `XS1|S2|M0`. */
export const ratioKey = (ratio: SizeRatio, sizes: string[]) => sizes.map((s) => `${s}${ratio[s] ?? 0}`).join('|');

type OrderOptions = Omit<CutOrderInput, 'markerLength' | 'markers' | 'garmentLength' | 'costs' | 'signal'>;

/**
 * Everything the cut-order solver and roll allocation need, as plain data, so the solve can run in the web
 * process or on a job worker (`npm run worker`) alike. Marker lengths come from one source for the whole
 * plan: the measured (stored) markers on this width when they alone can cut the order, else the estimate
 * piece area ÷ (width × assumed utilisation) for every ratio. Never a mix.
 */
export interface CutOrderJobInput {
  order: OrderOptions;
  /** Measured markers of the style on this width: ratio and plotted length. */
  measured: { ratio: SizeRatio; lengthMm: number; spliceZones?: { near: number; far: number }[] }[];
  garmentAreasMm2: Record<string, number>;
  widthMm: number;
  assumedUtilisation: number;
  rolls: { id: string; label?: string; lengthMm: number; shadeLot: string; widthMm: number }[];
  /** The studio's rates (minor units); absent = least fabric, then fewest lays. */
  costs?: CutCosts;
}

export type CutOrderJobOutput =
  | {
      plan: CutOrderPlan;
      allocation: ReturnType<typeof allocateRolls>;
      markerLengths: 'measured' | 'estimated';
      /** Why measured markers were not used although some exist. */
      measuredRefused?: string;
    }
  /** The core refused the inputs (a marker-length limit no ratio fits): the caller answers 400. */
  | { rangeError: string };

let highs: Promise<MipSolver> | null = null;
/** HiGHS (WebAssembly), loaded once per process. */
const loadSolver = () => (highs ??= highsLoader());

export async function solveCutOrderJob(input: CutOrderJobInput): Promise<CutOrderJobOutput> {
  const solver = await loadSolver();
  const sizes = input.order.sizes;
  const estimate = (ratio: SizeRatio) =>
    mm(sizes.reduce((a, s) => a + (ratio[s] ?? 0) * (input.garmentAreasMm2[s] ?? 0), 0) / (input.widthMm * input.assumedUtilisation));
  let plan: CutOrderPlan | null = null;
  let measuredRefused: string | undefined;
  if (input.measured.length) {
    try {
      plan = solveCutOrder({ ...input.order, costs: input.costs, markers: input.measured.map((m) => ({ ratio: m.ratio, length: mm(m.lengthMm) })) }, solver);
    } catch (err) {
      if (!(err instanceof RangeError)) throw err;
      measuredRefused = 'The measured markers cannot cut this order on their own, so every length is an estimate.';
    }
  }
  try {
    plan ??= solveCutOrder({ ...input.order, costs: input.costs, markerLength: estimate }, solver);
  } catch (err) {
    if (err instanceof RangeError) return { rangeError: err.message };
    throw err;
  }
  const measuredZones = new Map(input.measured.map((m) => [ratioKey(m.ratio, sizes), m.spliceZones ?? []]));
  const zonesOf = (ratio: SizeRatio) =>
    plan!.markerLengths === 'measured' ? (measuredZones.get(ratioKey(ratio, sizes)) ?? []).map((z) => ({ near: mm(z.near), far: mm(z.far) })) : [];
  const allocation = allocateRolls({
    // Every marker of the plan is made on the fabric's cuttable width: a narrower roll is refused for it.
    // Splices only at the splice zones a measured marker marks; an estimated length has no pieces to look at.
    lays: plan.lays.map((l) => ({ plies: l.plies, markerLength: l.markerLength, markerWidth: mm(input.widthMm), spliceZones: zonesOf(l.ratio) })),
    spliceOverlap: DEFAULT_SPLICE_OVERLAP_MM,
    rolls: input.rolls.map((r) => ({ id: r.id, label: r.label, length: mm(r.lengthMm), shadeLot: r.shadeLot, width: mm(r.widthMm) })),
    endAllowance: plan.endAllowance,
  });
  return { plan, allocation, markerLengths: plan.markerLengths ?? 'estimated', ...(measuredRefused ? { measuredRefused } : {}) };
}
