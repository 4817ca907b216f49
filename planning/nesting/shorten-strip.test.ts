import { describe, expect, it } from 'vitest';
import { mm } from '@shared/units/units';
import { LayoutState } from './layout-state';
import { buildNestModel } from './nest-model';
import { shortenStrip } from './nest-pieces';
import { createRng } from './random';

// Gardeyn, Vanden Berghe & Wauters (2025) shorten the strip by cutting it at a random x and sliding what lies
// right of the cut to the left, so the overlaps spread along the cut instead of piling up at the strip end.
describe('shortenStrip', () => {
  const square = [{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 10 }, { x: 0, y: 10 }];
  const row = () => {
    // Six 10 × 10 squares side by side on a strip 10 wide: L = 60 (computed).
    const model = buildNestModel({ stripWidth: mm(10), pieces: [{ id: 'sq', polygon: square, quantity: 6, orientations: [0] }] }, 0);
    const layout = new LayoutState(model);
    for (let i = 0; i < 6; i++) layout.place(i, model.items[i].variants[0], 10 * i, 0);
    layout.length = 60;
    return layout;
  };

  it('slides every piece right of the cut left by the shortening and leaves the others, for each seed', () => {
    let movedMoreThanOne = false;
    for (let seed = 1; seed <= 8; seed++) {
      const layout = row();
      shortenStrip(layout, 55, createRng(seed));
      expect(layout.length).toBe(55);
      const shifts = Array.from(layout.x, (x, i) => 10 * i - x);
      // Each piece moved by 0 or by the full 5 units, and the moved ones form the right-hand end of the row.
      expect(shifts.every((d) => d === 0 || d === 5)).toBe(true);
      const first = shifts.indexOf(5);
      expect(first).toBeGreaterThanOrEqual(0);
      expect(shifts.slice(first).every((d) => d === 5)).toBe(true);
      if (shifts.filter((d) => d === 5).length > 1) movedMoreThanOne = true;
      // Everything stays inside the shorter strip; exactly one pair overlaps (by 5 units of depth).
      expect(Math.max(...Array.from(layout.x, (x) => x + 10))).toBeLessThanOrEqual(55);
      expect(layout.collidingItems()).toHaveLength(2);
    }
    // Pushing in only the pieces past the new end (the earlier rule) would move the last piece alone.
    expect(movedMoreThanOne).toBe(true);
  });
});
