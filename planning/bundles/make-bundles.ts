/** A cut lay as the bundler sees it: ratio and its plies per shade lot (in spreading order). */
export interface CutLay {
  /** Garments of each size per ply. */
  ratio: Record<string, number>;
  pliesByLot: { shadeLot: string; plies: number }[];
}

/** Input to {@link makeBundles}. */
export interface MakeBundlesInput {
  /** Batch (cut) reference printed on tickets. */
  batch: string;
  /** Size order for numbering. */
  sizes: string[];
  lays: CutLay[];
  /** Plies (= garments) per bundle, default 10 ("10 pieces, a dozen or a multiple", Scribd 36983755). */
  bundleSize?: number;
  /** Number of the first bundle, default 1: the caller counts on from the studio's last bundle. */
  firstNumber?: number;
}

/** One bundle: one size, one shade lot, a ply range of one marker position. */
export interface Bundle {
  /** Consecutive from `firstNumber` (1 by default). */
  number: number;
  /** `${batch}-${number}` */
  ticket: string;
  /** 0-based lay index. */
  lay: number;
  size: string;
  /** Which of the size's garments in the marker (1-based) when the ratio has more than one. */
  position: number;
  shadeLot: string;
  /** Ply range within the lay, 1-based, inclusive (plies counted across lots in spreading order). */
  plyFrom: number;
  plyTo: number;
  pieces: number;
}

/**
 * Cuts each lay into bundles: for each lay, size (in `sizes` order), marker position, shade lot (in
 * spreading order) and consecutive ply ranges of `bundleSize` (the last may be smaller). A bundle
 * never mixes sizes or shade lots. Numbering is deterministic, from `firstNumber`. Throws RangeError for
 * bundleSize < 1 or a firstNumber that is not a whole number ≥ 1.
 */
export function makeBundles(input: MakeBundlesInput): Bundle[] {
  const size = input.bundleSize ?? 10;
  if (!(Number.isInteger(size) && size >= 1)) throw new RangeError('bundleSize must be an integer ≥ 1');
  const first = input.firstNumber ?? 1;
  if (!(Number.isInteger(first) && first >= 1)) throw new RangeError('firstNumber must be an integer ≥ 1');
  const out: Bundle[] = [];
  input.lays.forEach((lay, li) => {
    for (const s of input.sizes) {
      for (let pos = 1; pos <= (lay.ratio[s] ?? 0); pos++) {
        let ply = 1;
        for (const { shadeLot, plies } of lay.pliesByLot) {
          for (let from = ply; from < ply + plies; from += size) {
            const to = Math.min(from + size - 1, ply + plies - 1);
            const number = first + out.length;
            out.push({ number, ticket: `${input.batch}-${number}`, lay: li, size: s, position: pos, shadeLot, plyFrom: from, plyTo: to, pieces: to - from + 1 });
          }
          ply += plies;
        }
      }
    }
  });
  return out;
}
