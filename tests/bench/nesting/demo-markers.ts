/**
 * Garment markers of Seamrun's two demo styles for the nesting benchmark: the shirt dress SR-101 and the lined
 * dress SR-202, their pieces graded by the grading core exactly as the demo seed does (server/seed/grading.seed.ts
 * `demoGrading`, server/seed/lined-dress.seed.ts `linedDressGrading`), turned into cutting pieces
 * (`cuttingPiecesOf`, fold pieces unfolded) and into engine input per material (`buildMarkerInput`: the
 * material's fabric width, 2 mm gap, 0°/180°, mirrored pairs), as the product's marker jobs do.
 *
 * Sizes: the demo batch's size quantities (server/seed/demo-studio.ts `DEMO_QUANTITIES`, XS 4, S 8, M 12, L 10,
 * XL 6) shared out over 2, 4 and 6 garments by largest remainder (ties to the larger quantity, then size order).
 * The lined dress has no batch in the demo; it takes the same size mix.
 */
import { DEMO_SIZE_RUN, demoSizeChart } from '@grading';
import type { NestingInput } from '../../../planning/nesting';
import { cuttingPiecesOf, type CuttingPiece } from '../../../server/modules/grading/graded-pieces';
import { buildMarkerInput } from '../../../server/modules/markers/marker-input';
import { DEMO_FABRIC } from '../../../server/seed/cutting.seed';
import { DEMO_QUANTITIES } from '../../../server/seed/demo-studio';
import { demoGrading } from '../../../server/seed/grading.seed';
import { LINED_DRESS_FABRICS, LINED_DRESS_STYLE, linedDressGrading } from '../../../server/seed/lined-dress.seed';

export const GARMENT_COUNTS = [2, 4, 6];

/** One benchmark marker: a style, one of its materials, a garment count and its size ratio. */
export interface DemoMarker {
  style: string;
  material: string;
  garments: number;
  ratio: Record<string, number>;
  input: NestingInput;
}

/** `garments` shared out in proportion to `quantities` (largest remainder; ties: larger quantity, then run order). */
export function sizeRatio(quantities: Record<string, number>, garments: number, order: readonly string[] = DEMO_SIZE_RUN): Record<string, number> {
  const sizes = order.filter((s) => (quantities[s] ?? 0) > 0);
  const total = sizes.reduce((a, s) => a + quantities[s], 0);
  const exact = sizes.map((s) => (quantities[s] * garments) / total);
  const out = Object.fromEntries(sizes.map((s, k) => [s, Math.floor(exact[k])]));
  let left = garments - Object.values(out).reduce((a, b) => a + b, 0);
  const byRemainder = sizes
    .map((s, k) => ({ s, k, r: exact[k] - Math.floor(exact[k]) }))
    .sort((a, b) => b.r - a.r || quantities[b.s] - quantities[a.s] || a.k - b.k);
  for (const { s } of byRemainder) if (left-- > 0) out[s]++;
  return Object.fromEntries(Object.entries(out).filter(([, n]) => n > 0));
}

function materialsOf(pieces: Record<string, CuttingPiece[]>): string[] {
  return [...new Set(Object.values(pieces).flat().map((p) => p.material))].sort();
}

/** Every demo marker: style × material × garment count. */
export function demoMarkers(): DemoMarker[] {
  const chart = demoSizeChart();
  const styles = [
    { code: 'SR-101', base: 'M', grading: demoGrading('M'), widths: { self: DEMO_FABRIC.widthMm } as Record<string, number> },
    {
      code: LINED_DRESS_STYLE.code,
      base: LINED_DRESS_STYLE.baseSize,
      grading: linedDressGrading(),
      widths: { self: DEMO_FABRIC.widthMm, ...Object.fromEntries(Object.entries(LINED_DRESS_FABRICS).map(([m, f]) => [m, f.widthMm])) } as Record<string, number>,
    },
  ];
  const out: DemoMarker[] = [];
  for (const s of styles) {
    const pieces = cuttingPiecesOf({ sizeChart: chart, pieces: s.grading.pieces, gradeRules: s.grading.rules }, s.base);
    for (const material of materialsOf(pieces)) {
      const width = s.widths[material] ?? DEMO_FABRIC.widthMm;
      const ofMaterial = Object.fromEntries(Object.entries(pieces).map(([size, list]) => [size, list.filter((p) => p.material === material)]));
      for (const garments of GARMENT_COUNTS) {
        const ratio = sizeRatio(DEMO_QUANTITIES, garments);
        const job = buildMarkerInput(ofMaterial, ratio, { widthMm: width, isDirectional: false, seconds: 0 });
        if (job.engine.pieces.length) out.push({ style: s.code, material, garments, ratio, input: job.engine });
      }
    }
  }
  return out;
}
