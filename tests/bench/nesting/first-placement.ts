/**
 * Time of the constructive first placement (bottom-left fill on NFPs, all NFPs it needs included) of the demo
 * styles' 4- and 6-garment markers, each material, one thread, no search afterwards:
 *   npx tsx tests/bench/nesting/first-placement.ts
 * Prints one line per marker: style, material, garments, pieces, milliseconds, density % of that first marker.
 */
import { nestPieces } from '../../../planning/nesting';
import { demoMarkers } from './demo-markers';

for (const m of demoMarkers()) {
  if (m.garments < 4) continue;
  const t0 = performance.now();
  // One sweep after the start: the figure is the start's cost.
  const r = nestPieces(m.input, { seed: 1, maxIterations: 1 });
  const pieces = m.input.pieces.reduce((s, p) => s + p.quantity, 0);
  process.stdout.write(`${m.style} ${m.material} ${m.garments} ${pieces} ${Math.round(performance.now() - t0)} ms ${(r.utilisation * 100).toFixed(1)} %\n`);
}
