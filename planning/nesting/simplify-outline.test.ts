import { describe, expect, it } from 'vitest';
import { polygonArea } from '@shared/geometry/polygon';
import { polygonIntersectionArea } from './clipper-path';
import { defaultSimplifyTolerance, simplifiedPackingShape, simplifyRing } from './simplify-outline';

// A flattened circular arc (radius 100, 200 vertices): the chord error of a k-gon is r(1 − cos(π/k))
// (elementary geometry), so a 1-unit tolerance needs only ≈ 23 vertices.
const circle = Array.from({ length: 200 }, (_, k) => ({ x: 100 * Math.cos((2 * Math.PI * k) / 200), y: 100 * Math.sin((2 * Math.PI * k) / 200) }));

describe('simplifyRing (Douglas & Peucker 1973)', () => {
  it('keeps every original vertex within ε and drops most of a finely flattened circle', () => {
    const s = simplifyRing(circle, 1);
    expect(s.length).toBeLessThan(40);
    expect(s.length).toBeGreaterThan(15);
    const n = s.length;
    for (const p of circle) {
      let d = Infinity;
      for (let k = 0; k < n; k++) {
        const a = s[k], b = s[(k + 1) % n];
        const dx = b.x - a.x, dy = b.y - a.y;
        const t = Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / (dx * dx + dy * dy)));
        d = Math.min(d, Math.hypot(a.x + t * dx - p.x, a.y + t * dy - p.y));
      }
      expect(d).toBeLessThanOrEqual(1 + 1e-9);
    }
  });

  it('returns a triangle or a rectangle unchanged', () => {
    const rect = [{ x: 0, y: 0 }, { x: 5, y: 0 }, { x: 5, y: 2 }, { x: 0, y: 2 }];
    expect(simplifyRing(rect, 1)).toEqual(rect);
  });
});

describe('simplifiedPackingShape', () => {
  it('contains the original outline grown by nothing, with fewer vertices (computed: intersection area = original area)', () => {
    const shape = simplifiedPackingShape(circle, 0, 1, 1e4);
    expect(shape.length).toBeLessThan(60);
    const inter = polygonIntersectionArea(shape, circle, 1e4);
    // Equal up to Clipper's 1e-4 grid rounding: nothing of the original sticks out.
    expect(Math.abs(inter - polygonArea(circle)) / polygonArea(circle)).toBeLessThan(1e-6);
    // Lost area ≤ perimeter × 2ε (offset by ε of a ring within ε): 628 × 2 ≈ 1257.
    expect(polygonArea(shape) - polygonArea(circle)).toBeLessThan(1300);
  });

  it('leaves outlines with few vertices exact (only the gap offset)', () => {
    const rect = [{ x: 0, y: 0 }, { x: 5, y: 0 }, { x: 5, y: 2 }, { x: 0, y: 2 }];
    expect(polygonArea(simplifiedPackingShape(rect, 0, 1, 1e4))).toBeCloseTo(10, 9);
  });

  it('scales the default tolerance with the strip: 1 mm at 1450 mm, 0.04 on a 40-unit benchmark strip', () => {
    expect(defaultSimplifyTolerance(1450)).toBe(1);
    expect(defaultSimplifyTolerance(40)).toBeCloseTo(0.04, 12);
  });
});
