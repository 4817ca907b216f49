import { mm, type Millimetres } from '@shared/units';
import { DEFAULT_END_ALLOWANCE_PER_PLY_MM, DEFAULT_REMNANT_STOCK_THRESHOLD_MM } from './spreading-constants';

/** A fabric roll. `length` in mm; `width` (mm) is carried through, not used for the length plan. */
export interface FabricRoll {
  id: string;
  length: Millimetres;
  shadeLot: string;
  width?: Millimetres;
}

/** A lay to be spread: marker length (mm) and plies. */
export interface LayToSpread {
  plies: number;
  markerLength: Millimetres;
}

/** Input to {@link allocateRolls}. */
export interface RollAllocationInput {
  lays: LayToSpread[];
  rolls: FabricRoll[];
  /** Per ply, both ends together. Default 20 mm (Vilumsone-Nemes, §4.2.3, p. 31). */
  endAllowance?: Millimetres;
  /** When set, a ply may be spliced from the end of one roll and the start of the next roll of the same lot, overlapping this much (mm). Default: no splicing. */
  spliceOverlap?: Millimetres;
  /** Remnants at or above this length are kept as stock (default 1 000 mm, common practice). */
  remnantThreshold?: Millimetres;
}

/** Plies of one lay taken from one roll; `spliced` counts plies that began on the previous roll. */
export interface RollSegment {
  lay: number;
  plies: number;
  spliced: number;
  /** Roll length left after this segment, mm. */
  remaining: Millimetres;
}

/** One roll's part of the plan (the marker list per roll). */
export interface RollUse {
  id: string;
  shadeLot: string;
  length: Millimetres;
  segments: RollSegment[];
  /** Length left at the end of the plan, mm. */
  remnant: Millimetres;
  /** True when the remnant is at least the stock threshold and is kept; otherwise it is end-of-roll waste. */
  isStock: boolean;
}

/** Result of {@link allocateRolls}. */
export interface RollAllocation {
  rolls: RollUse[];
  /** Per lay, plies taken from each shade lot, in allocation order. */
  layLots: { shadeLot: string; plies: number }[][];
  /** Indices of lays whose plies came from more than one shade lot (shading risk: bundle by lot). */
  splitLays: number[];
  /** Per lay, plies that no roll could supply. */
  shortfall: number[];
  /** Σ remnants below the threshold, mm. */
  endOfRollWaste: Millimetres;
  /** Σ remnants kept as stock, mm. */
  stockKept: Millimetres;
}

interface Piece {
  roll: RollUse;
  rem: number;
}

/**
 * Assigns rolls to lays. Plies per roll = ⌊usable length ÷ (marker length + end allowance)⌋, a ply
 * never spans two rolls unless `spliceOverlap` is set. Each lay is spread from one shade lot where one
 * lot can supply it (the lot with the smallest sufficient capacity), else it is split across lots
 * (largest first) and reported in `splitLays`. Lays are served longest spread first so shorter lays
 * can use the ends; within a lot, rolls whose length divides best are used first. Heuristic (not
 * proven minimal waste); deterministic. Throws RangeError on non-positive spread or negative lengths.
 */
export function allocateRolls(input: RollAllocationInput): RollAllocation {
  const e = input.endAllowance ?? DEFAULT_END_ALLOWANCE_PER_PLY_MM;
  const threshold = input.remnantThreshold ?? DEFAULT_REMNANT_STOCK_THRESHOLD_MM;
  const uses: RollUse[] = input.rolls.map((r) => {
    if (!(r.length >= 0)) throw new RangeError(`roll ${r.id} has a negative length`);
    return { id: r.id, shadeLot: r.shadeLot, length: r.length, segments: [], remnant: r.length, isStock: false };
  });
  const lots = new Map<string, Piece[]>();
  uses.forEach((u) => lots.set(u.shadeLot, [...(lots.get(u.shadeLot) ?? []), { roll: u, rem: u.length }]));
  const order = input.lays.map((_, i) => i).sort((a, b) => input.lays[b].markerLength - input.lays[a].markerLength || a - b);
  const layLots: { shadeLot: string; plies: number }[][] = input.lays.map(() => []);
  const shortfall = input.lays.map((l) => l.plies);
  for (const li of order) {
    const spread = input.lays[li].markerLength + e;
    if (!(spread > 0)) throw new RangeError(`lay ${li} has a non-positive spread length`);
    const capacity = (pieces: Piece[]) => lotCapacity(pieces, spread, input.spliceOverlap);
    const ranked = [...lots.entries()].map(([lot, pieces]) => ({ lot, pieces, cap: capacity(pieces) }));
    const fits = ranked.filter((x) => x.cap >= shortfall[li]).sort((a, b) => a.cap - b.cap);
    const chosen = fits.length > 0 ? [fits[0]] : ranked.filter((x) => x.cap > 0).sort((a, b) => b.cap - a.cap);
    for (const { lot, pieces } of chosen) {
      if (shortfall[li] === 0) break;
      const got = takePlies(pieces, li, spread, shortfall[li], input.spliceOverlap);
      if (got > 0) layLots[li].push({ shadeLot: lot, plies: got });
      shortfall[li] -= got;
    }
  }
  let waste = 0;
  let stock = 0;
  uses.forEach((u) => {
    u.isStock = u.remnant >= threshold;
    if (u.isStock) stock += u.remnant;
    else waste += u.remnant;
  });
  const splitLays = layLots.flatMap((l, i) => (l.length > 1 ? [i] : []));
  return { rolls: uses, layLots, splitLays, shortfall, endOfRollWaste: mm(waste), stockKept: mm(stock) };
}

function lotCapacity(pieces: Piece[], spread: number, overlap: number | undefined): number {
  if (overlap === undefined) return pieces.reduce((acc, p) => acc + Math.floor(p.rem / spread), 0);
  const live = pieces.filter((p) => p.rem > 0);
  const total = live.reduce((acc, p) => acc + p.rem, 0) - overlap * Math.max(0, live.length - 1);
  return Math.max(0, Math.floor(total / spread));
}

/** Takes up to `need` plies from one lot's rolls; returns the plies taken. */
function takePlies(pieces: Piece[], lay: number, spread: number, need: number, overlap: number | undefined): number {
  const sorted = [...pieces].sort((a, b) => (a.rem % spread) - (b.rem % spread) || b.rem - a.rem);
  let got = 0;
  for (const p of sorted) {
    if (got === need) break;
    const k = Math.min(need - got, Math.floor(p.rem / spread));
    if (k > 0) record(p, lay, k, 0, k * spread);
    got += k;
  }
  if (overlap === undefined || got === need) return got;
  // Splicing: a ply starts on the end of one roll and finishes on the next, overlapping `overlap`.
  const live = pieces.filter((p) => p.rem > 0);
  for (let i = 0; i + 1 < live.length && got < need; i++) {
    const a = live[i];
    const b = live[i + 1];
    const fromB = spread - a.rem + overlap;
    if (a.rem <= 0 || fromB > b.rem) continue;
    record(a, lay, 0, 0, a.rem);
    record(b, lay, 1, 1, fromB);
    got += 1;
    const k = Math.min(need - got, Math.floor(b.rem / spread));
    if (k > 0) record(b, lay, k, 0, k * spread);
    got += k;
  }
  return got;
}

function record(p: Piece, lay: number, plies: number, spliced: number, used: number): void {
  p.rem -= used;
  p.roll.remnant = mm(p.rem);
  const last = p.roll.segments[p.roll.segments.length - 1];
  if (last && last.lay === lay) {
    last.plies += plies;
    last.spliced += spliced;
    last.remaining = mm(p.rem);
  } else p.roll.segments.push({ lay, plies, spliced, remaining: mm(p.rem) });
}
