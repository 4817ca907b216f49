import { mm, type Millimetres } from '@shared/units';
import { checkRollWidth, type RollWidthRefusal } from './roll-rules';
import type { SpliceZone } from './splice-zones';
import { DEFAULT_END_ALLOWANCE_PER_PLY_MM, DEFAULT_MIN_SPLICE_TAIL_MM, DEFAULT_REMNANT_STOCK_THRESHOLD_MM } from './spreading-constants';

/** A fabric roll. `length` in mm; a roll narrower than a lay's marker is refused for that lay. */
export interface FabricRoll {
  id: string;
  length: Millimetres;
  shadeLot: string;
  width?: Millimetres;
  /** Shown in refusals; the id when absent. */
  label?: string;
}

/** A lay to be spread: marker length (mm) and plies. */
export interface LayToSpread {
  plies: number;
  markerLength: Millimetres;
  /** The marker's width (mm); rolls narrower than it are refused for this lay. Absent: no width check. */
  markerWidth?: Millimetres;
  /** Where the marker lets a ply be joined (`markerSpliceZones`); absent or empty: no splices in this lay. */
  spliceZones?: SpliceZone[];
}

/** Input to {@link allocateRolls}. */
export interface RollAllocationInput {
  lays: LayToSpread[];
  rolls: FabricRoll[];
  /** Per ply, both ends together. Default 20 mm (Vilumsone-Nemes, §4.2.3, p. 31). */
  endAllowance?: Millimetres;
  /**
   * When set, a ply may be spliced from the end of one roll and the start of the next roll of the same
   * lot, only at a splice zone its lay's marker marks (old roll to the zone's far line, new roll from its
   * near line). The zones carry the overlap; this switch says splicing is allowed. Default: no splicing.
   */
  spliceOverlap?: Millimetres;
  /** Roll ends shorter than this are never spliced into a ply: they go to remnants. Default {@link DEFAULT_MIN_SPLICE_TAIL_MM}. */
  minSpliceTail?: Millimetres;
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
  /** Rolls refused for a lay because they are narrower than its marker, lay by lay in input order. */
  refusals: { lay: number; refusal: RollWidthRefusal }[];
}

interface Piece {
  roll: RollUse;
  rem: number;
  width?: number;
  label?: string;
}

/** What one lay's plies need: spread length, where the marker starts on the ply, its splice zones. */
interface Spread {
  lay: number;
  length: number;
  /** End allowance before the marker's start: half the per-ply allowance. */
  lead: number;
  zones: SpliceZone[];
  minTail: number;
}

/**
 * Assigns rolls to lays. Plies per roll = ⌊usable length ÷ (marker length + end allowance)⌋, a ply
 * never spans two rolls unless `spliceOverlap` is set and the lay's marker marks splice zones; a roll end
 * shorter than `minSpliceTail` is never spliced (it stays a remnant). A roll narrower than a lay's
 * marker is refused for that lay (`refusals`, naming the roll and both widths). Each lay is spread from one shade lot where one
 * lot can supply it (the lot with the smallest sufficient capacity), else it is split across lots
 * (largest first) and reported in `splitLays`. Lays are served longest spread first so shorter lays
 * can use the ends; within a lot, rolls whose length divides best are used first. Heuristic (not
 * proven minimal waste); deterministic. Throws RangeError on non-positive spread or negative lengths.
 */
export function allocateRolls(input: RollAllocationInput): RollAllocation {
  const e = input.endAllowance ?? DEFAULT_END_ALLOWANCE_PER_PLY_MM;
  const threshold = input.remnantThreshold ?? DEFAULT_REMNANT_STOCK_THRESHOLD_MM;
  const minTail = input.minSpliceTail ?? DEFAULT_MIN_SPLICE_TAIL_MM;
  const uses: RollUse[] = input.rolls.map((r) => {
    if (!(r.length >= 0)) throw new RangeError(`roll ${r.id} has a negative length`);
    return { id: r.id, shadeLot: r.shadeLot, length: r.length, segments: [], remnant: r.length, isStock: false };
  });
  const lots = new Map<string, Piece[]>();
  uses.forEach((u, i) => {
    const piece: Piece = { roll: u, rem: u.length, width: input.rolls[i].width, label: input.rolls[i].label };
    lots.set(u.shadeLot, [...(lots.get(u.shadeLot) ?? []), piece]);
  });
  const order = input.lays.map((_, i) => i).sort((a, b) => input.lays[b].markerLength - input.lays[a].markerLength || a - b);
  const layLots: { shadeLot: string; plies: number }[][] = input.lays.map(() => []);
  const shortfall = input.lays.map((l) => l.plies);
  const refusals: RollAllocation['refusals'] = [];
  for (const li of order) {
    const lay = input.lays[li];
    const spread: Spread = { lay: li, length: lay.markerLength + e, lead: e / 2, zones: input.spliceOverlap === undefined ? [] : lay.spliceZones ?? [], minTail };
    if (!(spread.length > 0)) throw new RangeError(`lay ${li} has a non-positive spread length`);
    const wideEnough = (pieces: Piece[]) => pieces.filter((p) => {
      const refusal = lay.markerWidth === undefined ? null : checkRollWidth({ id: p.roll.id, label: p.label, width: p.width }, lay.markerWidth);
      if (refusal && p.rem > 0) refusals.push({ lay: li, refusal });
      return !refusal;
    });
    const ranked = [...lots.entries()].map(([lot, all]) => {
      const pieces = wideEnough(all);
      return { lot, pieces, cap: takePlies(pieces, spread, Infinity, false) };
    });
    const fits = ranked.filter((x) => x.cap >= shortfall[li]).sort((a, b) => a.cap - b.cap);
    const chosen = fits.length > 0 ? [fits[0]] : ranked.filter((x) => x.cap > 0).sort((a, b) => b.cap - a.cap);
    for (const { lot, pieces } of chosen) {
      if (shortfall[li] === 0) break;
      const got = takePlies(pieces, spread, shortfall[li], true);
      if (got > 0) layLots[li].push({ shadeLot: lot, plies: got });
      shortfall[li] -= got;
    }
  }
  refusals.sort((a, b) => a.lay - b.lay);
  let waste = 0;
  let stock = 0;
  uses.forEach((u) => {
    u.isStock = u.remnant >= threshold;
    if (u.isStock) stock += u.remnant;
    else waste += u.remnant;
  });
  const splitLays = layLots.flatMap((l, i) => (l.length > 1 ? [i] : []));
  return { rolls: uses, layLots, splitLays, shortfall, endOfRollWaste: mm(waste), stockKept: mm(stock), refusals };
}

/**
 * Takes up to `need` plies from one lot's rolls and returns the plies taken; with `commit` false it only
 * counts (the lot's capacity) and changes nothing. Whole plies first, rolls whose length divides best
 * first; then splices between neighbouring rolls at the marker's splice zones.
 */
function takePlies(all: Piece[], spread: Spread, need: number, commit: boolean): number {
  const pieces = commit ? all : all.map((p) => ({ ...p }));
  const take = (p: Piece, plies: number, spliced: number, used: number) => {
    if (commit) record(p, spread.lay, plies, spliced, used);
    else p.rem -= used;
  };
  const L = spread.length;
  const sorted = [...pieces].sort((a, b) => (a.rem % L) - (b.rem % L) || b.rem - a.rem);
  let got = 0;
  for (const p of sorted) {
    if (got === need) break;
    const k = Math.min(need - got, Math.floor(p.rem / L));
    if (k > 0) take(p, k, 0, k * L);
    got += k;
  }
  if (!spread.zones.length || got === need) return got;
  // A splice: the old roll runs to the far line of the latest zone its end reaches, the new roll starts
  // at that zone's near line; what the old roll has past the far line is cut off and goes to remnants.
  const live = pieces.filter((p) => p.rem > 0);
  for (let i = 0; i + 1 < live.length && got < need; i++) {
    const a = live[i];
    const b = live[i + 1];
    if (a.rem < spread.minTail || a.rem >= L) continue;
    const zone = [...spread.zones].reverse().find((z) => spread.lead + z.far <= a.rem);
    if (!zone) continue;
    const fromB = L - spread.lead - zone.near;
    if (fromB > b.rem) continue;
    take(a, 0, 0, spread.lead + zone.far);
    take(b, 1, 1, fromB);
    got += 1;
    const k = Math.min(need - got, Math.floor(b.rem / L));
    if (k > 0) take(b, k, 0, k * L);
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
