/**
 * Writes the real-garment marker fixtures of tests/bench/nesting/fixtures/ (Seamrun's own demo style, so
 * ours to commit): the demo shirt dress drafted at base size M, graded over the demo chart, turned into
 * cutting outlines (fold pieces unfolded) exactly as the product does (server/modules/grading/graded-pieces.ts
 * `cuttingPiecesOf` → server/modules/markers/marker-input.ts `buildMarkerInput`), fabric 1450 mm, gap 2 mm,
 * rotations 0°/180°, mirrored pairs.
 *
 *   npx tsx tests/bench/nesting/garment-fixtures.ts
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { demoSizeChart, draftShirtDress, gradeStyle, measurementsForSize, type BodyMeasurements } from '@grading';
import { cuttingPiecesOf } from '../../../server/modules/grading/graded-pieces';
import { buildMarkerInput } from '../../../server/modules/markers/marker-input';

/** The ratios benchmarked: 1, 3, 3 and 3 garments. */
export const GARMENT_RATIOS: Record<string, number>[] = [{ XS: 1 }, { M: 2, L: 1 }, { S: 3 }, { L: 1, XL: 2 }];

/** Fixture file name of a ratio, e.g. {M:2, L:1} → "garment-L1-M2.json". */
export function fixtureName(ratio: Record<string, number>): string {
  return 'garment-' + Object.entries(ratio).sort(([a], [b]) => a.localeCompare(b)).map(([s, n]) => `${s}${n}`).join('-') + '.json';
}

export const FIXTURE_DIR = path.join(path.dirname(new URL(import.meta.url).pathname), 'fixtures');

function main(): void {
  const chart = demoSizeChart();
  const base = 'M';
  const pieces = draftShirtDress(measurementsForSize(chart, base) as BodyMeasurements);
  const { rules } = gradeStyle(pieces, chart, base);
  const cutting = cuttingPiecesOf({ sizeChart: chart, pieces, gradeRules: rules }, base);
  mkdirSync(FIXTURE_DIR, { recursive: true });
  for (const ratio of GARMENT_RATIOS) {
    const job = buildMarkerInput(cutting, ratio, { widthMm: 1450, isDirectional: false, seconds: 20, gapMm: 2 });
    const file = path.join(FIXTURE_DIR, fixtureName(ratio));
    writeFileSync(file, JSON.stringify({ ratio, input: job.engine }) + '\n');
    const copies = job.engine.pieces.reduce((s, p) => s + (p.mirrored ? 2 : 1) * p.quantity, 0);
    const verts = job.engine.pieces.map((p) => p.polygon.length);
    process.stdout.write(`${file}: ${job.engine.pieces.length} piece types, ${copies} copies, vertices ${Math.min(...verts)}–${Math.max(...verts)}\n`);
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === new URL(import.meta.url).pathname) main();
