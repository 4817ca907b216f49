import { describe, expect, it } from 'vitest';
import { mm } from '@shared/units/units';
import { LayoutState } from './layout-state';
import { buildNestModel } from './nest-model';
import { swapLargeItems } from './nest-pieces';
import { createRng } from './random';

// The exploration move of Gardeyn, Vanden Berghe & Wauters (2025): two large items of different shapes swap
// places, and an item that the moved one now covers goes into the room it left. Positions worked by hand.
describe('swapLargeItems', () => {
  const rect = (w: number, h: number) => [{ x: 0, y: 0 }, { x: w, y: 0 }, { x: w, y: h }, { x: 0, y: h }];

  it('swaps the two large items box centre for box centre and carries a covered item into the room left', () => {
    for (let seed = 1; seed <= 6; seed++) {
      // Areas 400, 200, 16 (total 616): the largest items making up 75 % (462) are the 20 × 20 and the 10 × 20.
      const model = buildNestModel(
        { stripWidth: mm(20), pieces: [
          { id: 'a', polygon: rect(20, 20), quantity: 1, orientations: [0] },
          { id: 'b', polygon: rect(10, 20), quantity: 1, orientations: [0] },
          { id: 'c', polygon: rect(4, 4), quantity: 1, orientations: [0] },
        ] },
        0,
      );
      const layout = new LayoutState(model);
      layout.length = 50;
      layout.place(0, model.items[0].variants[0], 0, 0); // a: 0..20, centre (10, 10)
      layout.place(1, model.items[1].variants[0], 30, 0); // b: 30..40, centre (35, 10)
      layout.place(2, model.items[2].variants[0], 41, 8); // c: 41..45 × 8..12, right of b
      swapLargeItems(layout, createRng(seed));
      // a now spans 25..45 (centre 35, 10) and covers c; b spans 5..15 (centre 10, 10).
      expect([layout.x[0], layout.y[0]]).toEqual([25, 0]);
      expect([layout.x[1], layout.y[1]]).toEqual([5, 0]);
      // c moves with a's shift back, (10, 10) − (35, 10): from x = 41 to 16.
      expect([layout.x[2], layout.y[2]]).toEqual([16, 8]);
    }
  });
});
