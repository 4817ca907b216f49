import polygonClipping from 'polygon-clipping';
import { describe, expect, it } from 'vitest';
import { polygonMirrorX, polygonRotate } from '@shared/geometry/polygon';
import type { Polygon } from '@shared/geometry/types';
import { NfpCache, nfpDepth, type Nfp } from './nfp-cache';
import { createRng } from './random';

// A comb (deep pockets, so the NFP has holes and many edges) and an L, on a 1e4 integer scale.
const comb: Polygon = [
  { x: 0, y: 0 }, { x: 9, y: 0 }, { x: 9, y: 6 }, { x: 8, y: 6 }, { x: 8, y: 1.5 }, { x: 6.5, y: 1.5 }, { x: 6.5, y: 6 },
  { x: 5.5, y: 6 }, { x: 5.5, y: 1.5 }, { x: 3.5, y: 1.5 }, { x: 3.5, y: 6 }, { x: 2.5, y: 6 }, { x: 2.5, y: 1.5 }, { x: 1, y: 1.5 }, { x: 1, y: 6 }, { x: 0, y: 6 },
];
const ell: Polygon = [{ x: 0, y: 0 }, { x: 4, y: 0 }, { x: 4, y: 1 }, { x: 1, y: 1 }, { x: 1, y: 3 }, { x: 0, y: 3 }];
const pieces = [comb, ell];
const shapeOf = (p: number, m: boolean, r: number) => polygonRotate(m ? polygonMirrorX(pieces[p]) : pieces[p], r);

/** The definition, written plainly: even-odd inside over all rings, then the distance to the nearest edge. */
function referenceDepth(nfp: Nfp, px: number, py: number): number {
  const c = nfp.coords, rs = nfp.ringStarts;
  let inside = false;
  let best = Infinity;
  for (let r = 0; r + 1 < rs.length; r++) {
    for (let i = rs[r]; i < rs[r + 1]; i++) {
      const a = i === rs[r] ? rs[r + 1] - 1 : i - 1;
      const [ax, ay, bx, by] = [c[2 * a], c[2 * a + 1], c[2 * i], c[2 * i + 1]];
      if ((ay > py) !== (by > py) && px < ((bx - ax) * (py - ay)) / (by - ay) + ax) inside = !inside;
      const len2 = (bx - ax) ** 2 + (by - ay) ** 2;
      const t = Math.min(1, Math.max(0, ((px - ax) * (bx - ax) + (py - ay) * (by - ay)) / len2));
      best = Math.min(best, Math.hypot(ax + t * (bx - ax) - px, ay + t * (by - ay) - py));
    }
  }
  return inside ? best : 0;
}

const ring = (p: Polygon, dx = 0, dy = 0): [number, number][] => p.map((q) => [q.x + dx, q.y + dy]);

describe('nfpDepth', () => {
  const cache = new NfpCache(
    [{ piece: 0, mirrored: false, rotation: 0 }, { piece: 1, mirrored: false, rotation: 0 }, { piece: 1, mirrored: true, rotation: 90 }],
    shapeOf,
    1e4,
  );

  it('equals the plain even-odd + nearest-edge depth on every sampled point, cell grid or not', () => {
    const rng = createRng(11);
    let inside = 0;
    for (const [a, b] of [[0, 1], [0, 2], [1, 0], [2, 0], [0, 0]]) {
      const nfp = cache.get(a, b);
      for (let k = 0; k < 4000; k++) {
        const px = nfp.minX - 1 + rng() * (nfp.maxX - nfp.minX + 2);
        const py = nfp.minY - 1 + rng() * (nfp.maxY - nfp.minY + 2);
        const want = referenceDepth(nfp, px, py);
        if (want > 0) inside++;
        const got = nfpDepth(nfp, px, py);
        expect(got === 0).toBe(want === 0);
        expect(Math.abs(got - want)).toBeLessThanOrEqual(1e-12 * (1 + want));
      }
    }
    expect(inside).toBeGreaterThan(1000);
  });

  it('is positive exactly where the two outlines overlap (independent check: polygon-clipping intersection area)', () => {
    const rng = createRng(5);
    const nfp = cache.get(0, 1);
    for (let k = 0; k < 400; k++) {
      const px = nfp.minX + rng() * (nfp.maxX - nfp.minX);
      const py = nfp.minY + rng() * (nfp.maxY - nfp.minY);
      const depth = nfpDepth(nfp, px, py);
      const area = polygonClipping
        .intersection([ring(comb)], [ring(ell, px, py)])
        .reduce((s, poly) => s + poly.reduce((t, r, i) => t + (i === 0 ? 1 : -1) * Math.abs(r.reduce((u, [x, y], j) => u + x * r[(j + 1) % r.length][1] - r[(j + 1) % r.length][0] * y, 0) / 2), 0), 0);
      if (depth > 1e-3) expect(area).toBeGreaterThan(0);
      if (depth === 0) expect(area).toBeLessThan(1e-6);
    }
  });
});
