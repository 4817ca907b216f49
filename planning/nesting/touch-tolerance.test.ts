import { describe, expect, it } from 'vitest';
import { checkLayout } from './checker';
import { LayoutState } from './layout-state';
import { buildNestModel } from './nest-model';
import type { NestingInput } from './types';
import { mm } from '@shared/units/units';

// What counts as "touching" must agree with the independent checker (polygon-clipping): a long thin piece
// pushed into its neighbour by a tiny depth overlaps by that depth × its length, hand-worked below.
const strip = (w: number, h: number) => [
  { x: 0, y: 0 },
  { x: w, y: 0 },
  { x: w, y: h },
  { x: 0, y: h },
];

describe('touching and overlapping on thin pieces', () => {
  // Two 1000 × 1 strips on a 10-wide fabric. Clipper's scale is 10^4 here (coordinates up to 1000), so one
  // grid step is 1e-4. Stacked with a 0.4e-4 overlap, the shared area is 1000 × 0.4e-4 = 0.04, 4e-5 of a
  // strip's area 1000: the checker refuses it (threshold 1e-6), so the engine must see an overlap too.
  const input: NestingInput = {
    stripWidth: mm(10),
    pieces: [
      { id: 'a', polygon: strip(1000, 1), quantity: 1, orientations: [0] },
      { id: 'b', polygon: strip(1000, 1), quantity: 1, orientations: [0] },
    ],
  };

  it('counts a depth of 0.4 grid steps as an overlap, as the checker does', () => {
    const model = buildNestModel(input);
    const layout = new LayoutState(model);
    layout.length = 1000;
    layout.place(0, model.items[0].variants[0], 0, 0);
    layout.place(1, model.items[1].variants[0], 0, 1 - 0.4e-4);
    expect(layout.overlapOf(1)).toBeGreaterThan(0);
    const check = checkLayout(input, {
      length: mm(1000),
      placements: [
        { pieceId: 'a', copy: 0, rotation: 0, mirrored: false, x: mm(0), y: mm(0) },
        { pieceId: 'b', copy: 0, rotation: 0, mirrored: false, x: mm(0), y: mm(1 - 0.4e-4) },
      ],
    });
    expect(check.valid).toBe(false);
  });

  it('still lets the two strips touch exactly (an exact tiling stays feasible)', () => {
    const model = buildNestModel(input);
    const layout = new LayoutState(model);
    layout.length = 1000;
    layout.place(0, model.items[0].variants[0], 0, 0);
    layout.place(1, model.items[1].variants[0], 0, 1);
    expect(layout.totalOverlap()).toBe(0);
  });

  it('grows a shape whose corners fall between grid points, so rounding never eats into the outline', () => {
    // Corners at 1/3: 0.3333… is rounded to 0.3333 at scale 10^4, 3.3e-5 inside the true corner; stacked
    // exactly on the packed shapes, the true outlines would then overlap by that much over 1000 length.
    const third: NestingInput = {
      stripWidth: mm(10),
      pieces: [
        { id: 'a', polygon: strip(1000, 1 / 3), quantity: 1, orientations: [0] },
        { id: 'b', polygon: strip(1000, 1 / 3), quantity: 1, orientations: [0] },
      ],
    };
    const model = buildNestModel(third);
    const layout = new LayoutState(model);
    layout.length = 1000;
    const y = 0.3333 + 0.00001; // 2.3e-5 below the true top of a: 1000 × 2.3e-5 = 0.023 of overlap
    layout.place(0, model.items[0].variants[0], 0, 0);
    layout.place(1, model.items[1].variants[0], 0, y);
    expect(layout.overlapOf(1)).toBeGreaterThan(0);
    const check = checkLayout(third, {
      length: mm(1000),
      placements: [
        { pieceId: 'a', copy: 0, rotation: 0, mirrored: false, x: mm(0), y: mm(0) },
        { pieceId: 'b', copy: 0, rotation: 0, mirrored: false, x: mm(0), y: mm(y) },
      ],
    });
    expect(check.valid).toBe(false);
  });
});
