import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { polygonArea } from '@shared/geometry/polygon';
import { mm } from '@shared/units/units';
import { checkLayout } from './checker';
import { polygonOffsetOutward } from './clipper-path';
import { nestPieces } from './nest-pieces';
import { parseEsicupXml } from './testing/esicup-xml';
import type { NestingInput } from './types';
import { datasetPath, hasDatasets } from '../../tests/fixtures/reference-data';

const rect = (w: number, h: number) => [{ x: 0, y: 0 }, { x: w, y: 0 }, { x: w, y: h }, { x: 0, y: h }];
const garment = (name: string) =>
  (JSON.parse(readFileSync(path.resolve(__dirname, '../../tests/bench/nesting/fixtures', name), 'utf8')) as { input: NestingInput }).input;
const esicup = (...p: string[]) => datasetPath('nesting', 'esicup', ...p);

// Iteration budgets, never time: the timeout only guards a loaded CI machine.
describe('nestPieces', { timeout: 30_000 }, () => {
  it('tiles the strip exactly when rectangles fill it (computed: 10 × (3 × 2) on width 10 → L = 6)', () => {
    const input: NestingInput = { stripWidth: mm(10), pieces: [{ id: 'r', polygon: rect(3, 2), quantity: 10 }] };
    const r = nestPieces(input, { seed: 1, maxIterations: 200 });
    expect(checkLayout(input, r).errors).toEqual([]);
    expect(r.length).toBeCloseTo(6, 9);
    expect(r.utilisation).toBeCloseTo(1, 9);
  });

  it.skipIf(!hasDatasets)('recovers a dense dighe1 layout (Hopper after Dighe & Jakiela 1996; optimum L = 100, density 100 %)', () => {
    const { input } = parseEsicupXml(readFileSync(esicup('dighe', 'dighe1.xml'), 'utf8'));
    const r = nestPieces(input, { seed: 3, maxIterations: 1500 });
    expect(checkLayout(input, r).errors).toEqual([]);
    // Chosen floor (not the optimum): the single-pass start alone is far lower, see the report.
    expect(r.utilisation).toBeGreaterThan(0.8);
    console.info(`dighe1: L = ${r.length.toFixed(3)}, density ${(r.utilisation * 100).toFixed(2)} %`);
  });

  it.skipIf(!hasDatasets)('recovers the dighe2 optimum L = 100 (Hopper after Dighe & Jakiela 1996, esicup/dighe/dighe2.xml) for seed 1', () => {
    const { input } = parseEsicupXml(readFileSync(esicup('dighe', 'dighe2.xml'), 'utf8'));
    // 6,000 sweeps: seeds 1–6 all reach L = 100 there; at 3,000, seeds 2–6 do.
    const r = nestPieces(input, { seed: 1, maxIterations: 6000 });
    expect(checkLayout(input, r).errors).toEqual([]);
    expect(r.length).toBeLessThan(100 + 1e-6);
  });

  it.skipIf(!hasDatasets)('nests shapes0 (Oliveira et al. 2000, esicup/shapes/shapes0.xml) into a layout the independent checker accepts', () => {
    const { input } = parseEsicupXml(readFileSync(esicup('shapes', 'shapes0.xml'), 'utf8'));
    const r = nestPieces(input, { seed: 1, maxIterations: 400 });
    const check = checkLayout(input, r);
    expect(check.errors).toEqual([]);
    expect(r.placements).toHaveLength(43);
  });

  // Was: "reaches at least the density of the engine before the fail-fast overlap tests" (L ≤ 67.794 at 400
  // iterations, recorded from the engine at b9f4f27). Issue 20 changed the search on purpose (strip cut at a
  // random x, a pool of failed layouts, compression), so that marker no longer recurs; the floor is now the
  // reference's single-pass left-bottom baseline (nesting-benchmarks.md, source B, indicative, best of 4:
  // shapes0 L = 69.286), which the search must beat on a small iteration budget.
  it.skipIf(!hasDatasets)('beats the single-pass left-bottom baseline on shapes0 on a small iteration budget', () => {
    const { input } = parseEsicupXml(readFileSync(esicup('shapes', 'shapes0.xml'), 'utf8'));
    const r = nestPieces(input, { seed: 1, maxIterations: 1000 });
    expect(checkLayout(input, r).errors).toEqual([]);
    expect(r.length).toBeLessThan(69.286);
  });

  const shirtLike: NestingInput = {
    stripWidth: mm(30),
    pieces: [
      { id: 'front', polygon: [{ x: 0, y: 0 }, { x: 12, y: 0 }, { x: 14, y: 6 }, { x: 6, y: 9 }, { x: 0, y: 7 }], quantity: 2 },
      { id: 'sleeve', polygon: [{ x: 0, y: 0 }, { x: 10, y: 2 }, { x: 10, y: 6 }, { x: 0, y: 8 }, { x: -2, y: 4 }], quantity: 2, mirrored: true },
      { id: 'cuff', polygon: rect(6, 2), quantity: 3, orientations: [0] },
    ],
  };

  it('returns the identical marker when run twice with the same seed and iteration budget', () => {
    const a = nestPieces(shirtLike, { seed: 42, maxIterations: 300 });
    const b = nestPieces(shirtLike, { seed: 42, maxIterations: 300 });
    expect(b).toEqual(a);
    expect(checkLayout(shirtLike, a).errors).toEqual([]);
  });

  // Issue 20: the search's phases (exploration with its pool of infeasible layouts, then compression) switch
  // on the share of the iteration budget, never on the clock: a clock running at any speed, with no time
  // budget, must not change the marker.
  it.skipIf(!hasDatasets)('returns the identical shapes1 marker for the same seed and iteration budget whatever the clock reads', () => {
    const { input } = parseEsicupXml(readFileSync(esicup('shapes', 'shapes1.xml'), 'utf8'));
    let slow = 0, fast = 0;
    const a = nestPieces(input, { seed: 11, maxIterations: 300, now: () => (slow += 1) });
    const b = nestPieces(input, { seed: 11, maxIterations: 300, now: () => (fast += 1000) });
    const c = nestPieces(input, { seed: 11, maxIterations: 300 });
    expect(checkLayout(input, a).errors).toEqual([]);
    expect(a.iterations).toBe(300);
    expect(b).toEqual(a);
    expect(c).toEqual(a);
    const other = nestPieces(input, { seed: 12, maxIterations: 300 });
    expect(other.placements).not.toEqual(a.placements);
  });

  it('keeps one-way pieces unrotated and cuts mirrored pieces as normal + mirrored pairs', () => {
    const r = nestPieces(shirtLike, { seed: 7, maxIterations: 300 });
    expect(checkLayout(shirtLike, r).errors).toEqual([]);
    expect(r.placements.filter((p) => p.pieceId === 'cuff').map((p) => p.rotation)).toEqual([0, 0, 0]);
    const sleeves = r.placements.filter((p) => p.pieceId === 'sleeve');
    expect(sleeves.map((p) => [p.copy, p.mirrored])).toEqual([[0, false], [1, true], [2, false], [3, true]]);
    expect(r.placements.every((p) => [0, 180].includes(p.rotation))).toBe(true);
  });

  it('gives the same marker length for reversed winding and a rotated start vertex', () => {
    const twisted: NestingInput = {
      ...shirtLike,
      pieces: shirtLike.pieces.map((p, k) => {
        const ring = k % 2 === 0 ? [...p.polygon].reverse() : [...p.polygon.slice(1), p.polygon[0]];
        return { ...p, polygon: ring };
      }),
    };
    const a = nestPieces(shirtLike, { seed: 5, maxIterations: 200 });
    const b = nestPieces(twisted, { seed: 5, maxIterations: 200 });
    expect(checkLayout(twisted, b).errors).toEqual([]);
    expect(b.length).toBe(a.length);
  });

  it('stops with complete: false and a valid best-so-far marker when the signal aborts', () => {
    const controller = new AbortController();
    const r = nestPieces(shirtLike, {
      seed: 1,
      maxIterations: 1_000_000,
      signal: controller.signal,
      onProgress: (p) => p.iteration >= 20 && controller.abort(),
    });
    expect(r.complete).toBe(false);
    expect(r.iterations).toBeLessThan(1_000_000);
    expect(checkLayout(shirtLike, r).errors).toEqual([]);
  });

  it('keeps at least the gap between pieces (outlines grown by gap/2 do not overlap)', () => {
    const gap = 1.5;
    const input = { ...shirtLike, gap: mm(gap) };
    const r = nestPieces(input, { seed: 2, maxIterations: 300 });
    expect(checkLayout(input, r).errors).toEqual([]);
    // Grow each outline by just under gap/2: a layout honouring the gap stays overlap-free. Strip
    // edges need no gap, so the boundary check is relaxed by the growth.
    const grownBy = (gap / 2) * 0.999;
    const grown = { ...input, pieces: input.pieces.map((p) => ({ ...p, polygon: polygonOffsetOutward(p.polygon, grownBy, 1e5) })) };
    const check = checkLayout(grown, r, { boundaryTolerance: grownBy * 2.01 });
    expect(check.errors).toEqual([]);
    expect(polygonArea(grown.pieces[0].polygon)).toBeGreaterThan(polygonArea(input.pieces[0].polygon));
  });

  it('returns an empty marker for no pieces and rejects a piece wider than the strip', () => {
    expect(nestPieces({ stripWidth: mm(10), pieces: [] }, { seed: 1 })).toMatchObject({ placements: [], length: 0, complete: true });
    expect(() => nestPieces({ stripWidth: mm(1), pieces: [{ id: 'x', polygon: rect(2, 2), quantity: 1 }] }, { seed: 1 })).toThrow(RangeError);
  });

  // Seamrun's own demo shirt dress, size XS, 1450 mm fabric, gap 2 mm (tests/bench/nesting/fixtures,
  // written by garment-fixtures.ts): 13 copies with outlines flattened from curves.
  it('nests one real garment validly above a utilisation floor on an iteration budget', () => {
    const input = garment('garment-XS1.json');
    const r = nestPieces(input, { seed: 1, maxIterations: 150 });
    expect(checkLayout(input, r).errors).toEqual([]);
    expect(r.complete).toBe(true);
    // Chosen floor (the bottom-left start alone gives ≈ 0.50).
    expect(r.utilisation).toBeGreaterThan(0.6);
    console.info(`garment XS1: L = ${r.length.toFixed(1)} mm, utilisation ${(r.utilisation * 100).toFixed(2)} %`);
  }, 120_000);

  it('returns a valid marker with complete: false when a tiny time budget runs out during construction (fake clock)', () => {
    const input = garment('garment-L1-M2.json');
    let t = 0;
    const r = nestPieces(input, { seed: 1, timeBudgetMs: 5, now: () => (t += 1) });
    expect(r.complete).toBe(false);
    expect(r.iterations).toBe(0);
    expect(r.placements).toHaveLength(39);
    expect(checkLayout(input, r).errors).toEqual([]);
  });
});

