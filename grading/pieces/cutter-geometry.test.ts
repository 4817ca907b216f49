import { describe, expect, it } from 'vitest';
import { polylineLength } from '@shared/geometry/polyline';
import type { Point, Polygon } from '@shared/geometry/types';
import { MM_PER_INCH } from '@shared/units/units';
import { draftShirtDress, SHIRT_DRESS_STYLE } from '../blocks/shirt-dress';
import { draftSkirtShape } from '../blocks/skirt-shapes-block';
import { demoSizeChart } from '../size-charts/demo-size-chart';
import { measurementsForSize } from '../size-charts/size-chart';
import { cuttingOutline, validateCuttingOutline } from './cutting-outline';
import { edgePoints, OutlineBuilder, type Piece } from './piece';

// Closed-form checks of what a cutter looks at: hem allowances folded about the hem line, squared hems, notches that
// meet, drill holes where the sewing hides them. Expected values come from plane geometry on the piece's own
// drafted points, never from the cutting-outline code.

const IN = MM_PER_INCH;
const M = measurementsForSize(demoSizeChart(), 'M');
const [front, back, sleeve, , pocket] = draftShirtDress(M);

/** Largest x of the cutting line among its vertices within 1e-6 mm of height y. */
const maxXAt = (ring: Polygon, y: number) => Math.max(...ring.filter((p) => Math.abs(p.y - y) < 1e-6).map((p) => p.x));
const minXAt = (ring: Polygon, y: number) => Math.min(...ring.filter((p) => Math.abs(p.y - y) < 1e-6).map((p) => p.x));

/** Arc length along edge `name` from its start to outline vertex k. */
const along = (p: Piece, name: string, k: number) => polylineLength(edgePoints(p, { from: p.edges.find((e) => e.name === name)!.from, to: k }));
/** Notches strictly inside the edge (not at its ends). */
const notchesOn = (p: Piece, name: string) => {
  const e = p.edges.find((x) => x.name === name)!;
  return p.notches.filter((i) => (e.from < e.to ? i > e.from && i < e.to : i > e.from || i < e.to));
};

describe('hem allowance mirrored about the hem fold (closed form)', () => {
  it('cuts a tapered panel\'s hem corner at x = w + a·t + s·√(1 + t²) when the side seam leans out by t per mm', () => {
    // Hem 200 mm wide at y = 0, top 300 mm wide at y = 400: each side leans out t = 50/400 = 0.125.
    const b = new OutlineBuilder({ x: -100, y: 0 });
    b.edge('hem', { allowanceMm: 50 }).line({ x: 100, y: 0 });
    b.edge('side', { allowanceMm: 10 }).line({ x: 150, y: 400 });
    b.edge('top', { allowanceMm: 10 }).line({ x: -150, y: 400 });
    b.edge('side', { allowanceMm: 10 }).line({ x: -100, y: 0 });
    const piece = b.close();
    const cut = cuttingOutline(piece);
    const t = 0.125, a = 50, s = 10;
    // Folded up, the allowance lies on the panel up to y = a, where the side's cutting line is at 100 + a·t + s/cos θ.
    const expected = 100 + a * t + s * Math.sqrt(1 + t * t);
    // Within 0.005 mm: the union snaps to clipper's 1 µm grid.
    expect(maxXAt(cut, -a)).toBeCloseTo(expected, 2);
    expect(minXAt(cut, -a)).toBeCloseTo(-expected, 2);
    expect(validateCuttingOutline(piece, cut)).toEqual([]);
  });

  it('widens the demo sleeve\'s 25 mm turned hem by a·t per side: the extended allowance was 2·a·t = 7.5 mm per side too narrow', () => {
    const hem = sleeve.edges.find((e) => e.name === 'hem')!;
    const a = hem.allowanceMm;
    const s = sleeve.edges.find((e) => e.name === 'underarm-back')!.allowanceMm;
    const hemBack = sleeve.outline[sleeve.landmarks['hem-back']], ua = sleeve.outline[sleeve.landmarks['underarm-back']];
    const t = (ua.x - hemBack.x) / (ua.y - hemBack.y);
    const cut = cuttingOutline(sleeve);
    const rawEdge = hemBack.y - a;
    expect(maxXAt(cut, rawEdge)).toBeCloseTo(hemBack.x + a * t + s * Math.sqrt(1 + t * t), 2);
    // What extending the side seam down gave (x − a·t + …), 2·a·t narrower on each side.
    expect(2 * a * t).toBeCloseTo(7.5, 6);
  });
});

describe('flared hems squared to the side seam (closed form)', () => {
  it('ends an A-line side seam at hip + (L − h)·u, u the unit flare direction, meeting the hem at 90°', () => {
    const L = 600, F = 80;
    const [skirt] = draftSkirtShape(M, { shape: 'a-line', lengthMm: L, hemFlareMm: F });
    const hip = skirt.outline[skirt.landmarks['side-hip']];
    const drop = L + hip.y; // hip.y = −(waist to hip)
    const hemEdge = skirt.edges.find((e) => e.name === 'hem')!;
    const corner = skirt.outline[hemEdge.to];
    const flareLen = Math.hypot(F, drop);
    expect(corner.x).toBeCloseTo(hip.x + (F * drop) / flareLen, 9);
    expect(corner.y).toBeCloseTo(hip.y - (drop * drop) / flareLen, 9);
    const before = skirt.outline[hemEdge.to - 1];
    // Dot product of hem's last segment with the side seam direction (F, −drop): 0 when square.
    expect((corner.x - before.x) * F + (corner.y - before.y) * -drop).toBeCloseTo(0, 6);
  });
});

describe('notches on front, back and sleeve', () => {
  it('notches the shirt dress front armhole once at 3 in and the back twice at 3½ and 3¾ in from the underarm', () => {
    const f = notchesOn(front, 'armhole'), b = notchesOn(back, 'armhole');
    expect(f).toHaveLength(1);
    expect(b).toHaveLength(2);
    expect(along(front, 'armhole', f[0])).toBeCloseTo(3 * IN, 6);
    expect(b.map((k) => along(back, 'armhole', k))).toEqual([expect.closeTo(3.5 * IN, 6), expect.closeTo(3.75 * IN, 6)]);
  });

  it('puts a double back and a single front notch on the sleeve cap at the same distances from each underarm, and one at the crown', () => {
    const backCap = notchesOn(sleeve, 'cap-back');
    expect(backCap.map((k) => along(sleeve, 'cap-back', k))).toEqual([expect.closeTo(3.5 * IN, 6), expect.closeTo(3.75 * IN, 6)]);
    const frontEdge = sleeve.edges.find((e) => e.name === 'cap-front')!;
    const frontCap = notchesOn(sleeve, 'cap-front');
    expect(frontCap).toHaveLength(1);
    const capFrontLen = polylineLength(edgePoints(sleeve, frontEdge));
    expect(capFrontLen - along(sleeve, 'cap-front', frontCap[0])).toBeCloseTo(3 * IN, 6);
    expect(sleeve.notches).toContain(sleeve.landmarks['cap-top']);
  });
});

describe('drill holes at dart points and pocket placements', () => {
  const near = (holes: Point[], p: Point, d: number) => holes.some((h) => Math.abs(Math.hypot(h.x - p.x, h.y - p.y) - d) < 1e-9);

  it('drills 10 mm inside both points of the shirt dress\'s waist darts (common practice), front and back', () => {
    for (const p of [front, back]) {
      const dart = p.internalLines.find((l) => l.name === 'waist-dart')!;
      const top = dart.points[0], bottom = dart.points[2];
      expect(near(p.drillHoles, top, 10), `${p.id} top`).toBe(true);
      expect(near(p.drillHoles, bottom, 10), `${p.id} bottom`).toBe(true);
    }
  });

  it('marks the patch pocket on the front with a placement the pocket\'s size and a drill hole 10 mm inside each top corner', () => {
    const place = front.internalLines.find((l) => l.kind === 'placement' && l.name === 'pocket')!;
    const [bl, tl, tr, br] = place.points;
    const pw = pocket.outline[pocket.landmarks['bottom-right']].x, ph = pocket.outline[pocket.landmarks['top-left']].y;
    expect(tr.x - tl.x).toBeCloseTo(pw, 9);
    expect(tl.y - bl.y).toBeCloseTo(ph, 9);
    expect(br.y).toBeCloseTo(bl.y, 9);
    expect(front.drillHoles).toContainEqual({ x: tl.x + 10, y: tl.y - 10 });
    expect(front.drillHoles).toContainEqual({ x: tr.x - 10, y: tr.y - 10 });
    expect(tl.y).toBeCloseTo(-SHIRT_DRESS_STYLE.pocket.belowWaistMm, 9);
  });
});
