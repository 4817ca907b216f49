/**
 * No-fit polygons by one Clipper union of every Minkowski quad against the tree union (clipper-path.ts), on the
 * benchmark instances and the demo styles' 2-garment markers (unsimplified outlines): each piece with itself and
 * its next K − 1 (K=3 by default; NOG=1 skips the garments, whose single unions take minutes):
 *   K=3 npx tsx tests/bench/nesting/nfpcmp.ts
 * Prints per set: milliseconds of each method and the largest XOR area of the two ÷ the NFP's area.
 */
import ClipperLib from 'clipper-lib';
import type { Paths } from 'clipper-lib';
import type { Polygon } from '@shared/geometry/types';
import path from 'node:path';
import { readdirSync } from 'node:fs';
import { polygonNoFitRings, toClipperPath, clipperScaleFor } from '../../../planning/nesting/clipper-path';
import { datasetDir, instanceToInput, readJsonInstance } from './json-instance';
import { demoMarkers } from './demo-markers';
function xorArea(a: Polygon[], b: Polygon[], scale: number) {
  const c = new ClipperLib.Clipper();
  c.AddPaths(a.map((r) => toClipperPath(r, scale)), ClipperLib.PolyType.ptSubject, true);
  c.AddPaths(b.map((r) => toClipperPath(r, scale)), ClipperLib.PolyType.ptClip, true);
  const out: Paths = [];
  c.Execute(ClipperLib.ClipType.ctXor, out, ClipperLib.PolyFillType.pftEvenOdd, ClipperLib.PolyFillType.pftEvenOdd);
  return Math.abs(out.reduce((s, p) => s + ClipperLib.Clipper.Area(p), 0)) / scale / scale;
}
const sets: [string, Polygon[]][] = [];
for (const f of readdirSync(datasetDir('json')).filter((f) => f.endsWith('.json'))) sets.push([f, instanceToInput(readJsonInstance(path.join(datasetDir('json'), f))).pieces.map((p) => p.polygon)]);
for (const m of demoMarkers().filter((m) => m.garments === 2 && !process.env.NOG)) sets.push([m.style + m.material, m.input.pieces.map((p) => p.polygon)]);
for (const [name, polys] of sets) {
  let maxAbs = 0; for (const p of polys) for (const q of p) maxAbs = Math.max(maxAbs, Math.abs(q.x), Math.abs(q.y));
  const scale = clipperScaleFor(maxAbs);
  let tq = 0, tc = 0, worst = 0;
  for (let i = 0; i < polys.length; i++) for (let j = i; j < Math.min(polys.length, i + Number(process.env.K ?? 3)); j++) {
    const a = polys[i], b = polys[j];
    let t = performance.now();
    const q = polygonNoFitRings(a, b, scale, false);
    tq += performance.now() - t; t = performance.now();
    const c = polygonNoFitRings(a, b, scale, true);
    tc += performance.now() - t;
    const area = Math.abs(q.reduce((s, r) => s + ClipperLib.Clipper.Area(toClipperPath(r, scale)), 0)) / scale / scale;
    worst = Math.max(worst, xorArea(q, c, scale) / area);
  }
  process.stdout.write([name, polys.length, 'quads', Math.round(tq), 'ms tree', Math.round(tc), 'ms worst xor/area', worst.toExponential(2)].join(' ') + '\n');
}
