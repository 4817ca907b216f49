import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { LayoutState } from './layout-state';
import { buildNestModel, type NestModel } from './nest-model';
import { createRng, rngInt } from './random';
import { parseEsicupXml } from './testing/esicup-xml';
import { datasetPath, hasDatasets } from '../../tests/fixtures/reference-data';

// The layout keeps its overlap bookkeeping incrementally (per-piece sums, a grid of cells for the broad phase).
// The oracle here is the definition written plainly: every pair tested, no grid, sums recomputed from scratch.
describe.skipIf(!hasDatasets)('LayoutState', () => {
  // Read in beforeAll: a skipped describe's body still runs while tests are collected.
  let model: NestModel;
  beforeAll(() => {
    model = buildNestModel(parseEsicupXml(readFileSync(datasetPath('nesting', 'esicup', 'shapes', 'shapes1.xml'), 'utf8')).input);
  });

  const scatter = (seed: number) => {
    const layout = new LayoutState(model);
    layout.length = 45;
    const rng = createRng(seed);
    const moveAt = (i: number) => {
      const v = model.items[i].variants[rngInt(rng, model.items[i].variants.length)];
      const [x0, x1] = layout.xRange(v);
      const [y0, y1] = layout.yRange(v);
      layout.place(i, v, x0 + rng() * (x1 - x0), y0 + rng() * (y1 - y0));
    };
    for (let i = 0; i < layout.n; i++) moveAt(i);
    for (let k = 0; k < 400; k++) moveAt(rngInt(rng, layout.n));
    return { layout, rng };
  };

  it('keeps every per-piece overlap sum and the total equal to a recount over all pairs after many moves', () => {
    const { layout } = scatter(3);
    let total = 0;
    for (let i = 0; i < layout.n; i++) {
      let row = 0;
      for (let j = 0; j < layout.n; j++) if (j !== i) row += layout.pairDepth(i, layout.v[i], layout.x[i], layout.y[i], j);
      expect(layout.overlapOf(i)).toBeCloseTo(row, 9);
      expect(layout.collidingItems().includes(i)).toBe(row > 0);
      total += row;
    }
    expect(total).toBeGreaterThan(0);
    expect(layout.totalOverlap()).toBeCloseTo(total / 2, 9);
  });

  it('evaluates a trial position to the same weighted sum as a scan over every piece, grid or not', () => {
    const { layout, rng } = scatter(8);
    for (let k = 0; k < layout.w.length; k++) layout.w[k] = 1 + rng();
    for (let t = 0; t < 500; t++) {
      const i = rngInt(rng, layout.n);
      const v = model.items[i].variants[rngInt(rng, model.items[i].variants.length)];
      const [x0, x1] = layout.xRange(v);
      const [y0, y1] = layout.yRange(v);
      const x = x0 + rng() * (x1 - x0), y = y0 + rng() * (y1 - y0);
      let want = 0;
      for (let j = 0; j < layout.n; j++) if (j !== i) want += layout.w[i * layout.n + j] * layout.pairDepth(i, v, x, y, j);
      expect(layout.evaluate(i, v, x, y, Infinity)).toBeCloseTo(want, 9);
    }
  });

  it('reads exactly zero overlap once every piece is moved apart again', () => {
    const { layout } = scatter(5);
    // One piece per column, far apart: no pair can touch.
    layout.length = 1e4;
    for (let i = 0; i < layout.n; i++) layout.place(i, model.items[i].variants[0], 40 * i + 20, 20);
    expect(layout.totalOverlap()).toBe(0);
    expect(layout.collidingItems()).toEqual([]);
    for (let i = 0; i < layout.n; i++) expect(layout.overlapOf(i)).toBe(0);
  });
});
