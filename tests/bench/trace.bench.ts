/**
 * Photo tracer accuracy on synthetic photos: `npm run bench:trace`. Prints one JSON line per photo (shape,
 * conditions, seed, outline error in mm: mean and worst (Hausdorff), area error in %, the marks' fit residual,
 * trace time) and a last line with the worst figures per shape and condition. The photos come from
 * tests/fixtures/synthetic-photo.ts; no real photo of a printed sheet could be taken where this was written.
 * `-- --seeds N` sets the seeds per case (default 2).
 */
import { outlineError } from '@grading';
import { calibrationLayout } from '@shared/calibration/calibration-sheet';
import { tracePhoto } from '../../src/features/grading/photo-trace/trace-photo';
import { loadOpenCvNode } from '../fixtures/opencv-node';
import { syntheticPhoto, type SyntheticPhotoOptions } from '../fixtures/synthetic-photo';
import { bodicePiece, largePiece, rectanglePiece } from '../fixtures/trace-shapes';

const seedsArg = process.argv.indexOf('--seeds');
const seeds = seedsArg > 0 ? Number(process.argv[seedsArg + 1]) : 2;
const conditions: Record<string, Partial<SyntheticPhotoOptions>> = {
  // About 3 Mpx (a phone takes 12), tilted 18°, blur σ 1.4 px, noise σ 4, light down to 60 %, curl 1.5 mm.
  phone: {},
  // Harsher: 2 Mpx, tilted 30°, blur σ 2.2 px, noise σ 8, light down to 45 %, curl 3 mm.
  harsh: { tiltDeg: 30, blurPx: 2.2, noise: 8, darkest: 0.45, curlMm: 3, fill: 0.75 },
};
const shapes = [
  { name: 'rectangle-A4', kind: 'sheet' as const, piece: rectanglePiece() },
  { name: 'bodice-A4', kind: 'sheet' as const, piece: bodicePiece() },
  { name: 'large-border', kind: 'border' as const, piece: largePiece() },
];

const cv = await loadOpenCvNode();
const summary: Record<string, { meanMm: number; worstMm: number; areaErrorPct: number; failed: number }> = {};
for (const [cond, opts] of Object.entries(conditions)) {
  for (const s of shapes) {
    for (let seed = 1; seed <= seeds; seed++) {
      const layout = calibrationLayout(s.kind, 'A4');
      const size = cond === 'harsh' ? (layout.height > layout.width ? { width: 1200, height: 1600 } : { width: 1600, height: 1200 }) : {};
      const photo = syntheticPhoto(cv, { layout, piece: s.piece, seed: seed * 101, azimuthDeg: 40 + seed * 70, ...size, ...opts });
      const key = `${s.name}/${cond}`;
      const sum = (summary[key] ??= { meanMm: 0, worstMm: 0, areaErrorPct: 0, failed: 0 });
      const t0 = performance.now();
      try {
        const tr = tracePhoto(cv, photo.image, { kind: s.kind, paper: 'A4', toleranceMm: 0.5 });
        const ms = performance.now() - t0;
        const e = outlineError(tr.outline, photo.truth);
        const row = { shape: s.name, conditions: cond, seed, photoPx: [photo.image.width, photo.image.height], pxPerMm: tr.pxPerMm, meanMm: +e.meanMm.toFixed(3), worstMm: +e.worstMm.toFixed(3), areaErrorPct: +(100 * e.areaError).toFixed(3), markResidualMm: +tr.markResidualMm.toFixed(3), points: tr.outline.length, traceMs: Math.round(ms) };
        console.log(JSON.stringify(row));
        sum.meanMm = Math.max(sum.meanMm, row.meanMm); sum.worstMm = Math.max(sum.worstMm, row.worstMm); sum.areaErrorPct = Math.max(sum.areaErrorPct, Math.abs(row.areaErrorPct));
      } catch (e) {
        sum.failed++;
        console.log(JSON.stringify({ shape: s.name, conditions: cond, seed, failed: (e as Error).message }));
      }
    }
  }
}
console.log(JSON.stringify({ summary: 'worst of each case over its seeds', seeds, cases: summary }));
