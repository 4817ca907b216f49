import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { arcFlatten, cubicBezierFlatten, cubicBezierPoint } from './bezier';
import { segmentDistance, polygonIsSimple, polylineLength } from './polyline';

const pt = fc.record({ x: fc.double({ min: -500, max: 500, noNaN: true }), y: fc.double({ min: -500, max: 500, noNaN: true }) });

describe('cubicBezierFlatten', () => {
  it('keeps the polyline within the stated tolerance of the curve (Wang bound)', () => {
    fc.assert(
      fc.property(pt, pt, pt, pt, fc.constantFrom(0.1, 0.25, 1), (a, b, c, d, tol) => {
        const poly = cubicBezierFlatten(a, b, c, d, tol);
        for (let i = 0; i < 200; i++) {
          const p = cubicBezierPoint(a, b, c, d, i / 199);
          const dist = Math.min(...poly.slice(1).map((q, k) => segmentDistance(p, poly[k], q)));
          expect(dist).toBeLessThanOrEqual(tol + 1e-9);
        }
      }),
      { numRuns: 40 },
    );
  });

  it('returns a straight curve as one chord', () => {
    expect(cubicBezierFlatten({ x: 0, y: 0 }, { x: 1, y: 0 }, { x: 2, y: 0 }, { x: 3, y: 0 })).toHaveLength(2);
  });
});

describe('arcFlatten', () => {
  it('approximates a circle length within tolerance (2πr, exact π)', () => {
    const ring = arcFlatten({ x: 0, y: 0 }, 100, 0, 2 * Math.PI, 0.05);
    expect(polylineLength(ring)).toBeGreaterThan(2 * Math.PI * 100 - 0.5);
    expect(polylineLength(ring)).toBeLessThanOrEqual(2 * Math.PI * 100);
    expect(polygonIsSimple(ring.slice(0, -1))).toBe(true);
  });
});

describe('polygonIsSimple', () => {
  it('rejects a bow tie and accepts a square', () => {
    expect(polygonIsSimple([{ x: 0, y: 0 }, { x: 1, y: 1 }, { x: 1, y: 0 }, { x: 0, y: 1 }])).toBe(false);
    expect(polygonIsSimple([{ x: 0, y: 0 }, { x: 1, y: 0 }, { x: 1, y: 1 }, { x: 0, y: 1 }])).toBe(true);
    expect(polygonIsSimple([{ x: 0, y: 0 }, { x: 1, y: 0 }])).toBe(false);
  });
});
