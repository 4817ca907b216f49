import { describe, expect, it } from 'vitest';
import { polygonArea } from '@shared/geometry/polygon';
import { polygonIsSimple, polylineLength, segmentDistance } from '@shared/geometry/polyline';
import type { Point } from '@shared/geometry/types';
import { MM_PER_INCH } from '@shared/units/units';
import { cuttingOutline, validateCuttingOutline } from '../pieces/cutting-outline';
import { edgePoints, type Piece } from '../pieces/piece';
import { demoSizeChart } from '../size-charts/demo-size-chart';
import { measurementsForSize } from '../size-charts/size-chart';
import { draftBlocks, openOutPieces, type BlockSpec } from './draft-blocks';
import { unfoldPiece } from './drafted-piece';
import { draftFittedBodiceBack, draftFittedBodiceFront } from './fitted-bodice-block';
import { draftSetInSleeve } from './set-in-sleeve-block';
import { draftSkirtShape } from './skirt-shapes-block';
import { draftBodiceFacings, draftPeplum } from './trim-pieces-block';

const IN = MM_PER_INCH;
const M = measurementsForSize(demoSizeChart(), 'M');
const inches = (mm: number) => mm / IN;

/** Length of every edge of that name, summed, measured on the outline (independent of the drafting formulas). */
const edgeLen = (p: Piece, name: string) => p.edges.filter((e) => e.name === name).reduce((s, e) => s + polylineLength(edgePoints(p, e)), 0);
const edge = (p: Piece, name: string) => {
  const e = p.edges.find((x) => x.name === name);
  if (!e) throw new Error(`no edge ${name} on ${p.id}`);
  return edgePoints(p, e);
};
/** Radius of the circle through three points (circumradius). */
function circumradius(a: Point, b: Point, c: Point): number {
  const ab = Math.hypot(b.x - a.x, b.y - a.y), bc = Math.hypot(c.x - b.x, c.y - b.y), ca = Math.hypot(a.x - c.x, a.y - c.y);
  const area2 = Math.abs((b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x));
  return (ab * bc * ca) / (2 * area2);
}
/** Radius of a drafted arc, measured through the vertices a quarter, half and three quarters along it (a full
 * ring's edge starts and ends at the same point). */
const arcRadius = (w: Point[]) => circumradius(w[Math.floor(w.length / 4)], w[Math.floor(w.length / 2)], w[Math.floor((3 * w.length) / 4)]);
const waistRadius = (p: Piece) => arcRadius(edge(p, 'waist'));
const circleSkirt = (waistMm: number, fraction: number, lengthMm = 500, cut?: 'ring' | 'halves') =>
  openOutPieces(draftBlocks({ waist: waistMm }, [{ block: 'skirt', shape: 'circle', fraction, lengthMm, waistEaseMm: 0, cut }]))[0];

describe('circle skirts: r = W / (2π·f) (sizing-and-grading.md §3.2)', () => {
  // prettyquirkypants.com, "DIY tips: circle skirt, half circle skirt formulas" (web article), W = 26 in.
  it('drafts a full circle in halves for a 26 in waist with the published 4.13 in radius (truncated; exact π 4.138)', () => {
    const r = inches(waistRadius(circleSkirt(26 * IN, 1, 500, 'halves')));
    expect(Math.trunc(r * 100) / 100).toBe(4.13);
  });
  it('drafts a half circle for a 26 in waist with the published 8.2 in radius (truncated; exact π 8.276)', () => {
    expect(Math.trunc(inches(waistRadius(circleSkirt(26 * IN, 0.5))) * 10) / 10).toBe(8.2);
  });
  it('drafts a quarter circle for a 26 in waist within 0.01 in of the published 16.56 in (published with π ≈ 3.14)', () => {
    expect(Math.abs(inches(waistRadius(circleSkirt(26 * IN, 0.25))) - 16.56)).toBeLessThan(0.01);
  });
  it('drafts a ¾ circle for a 28 in waist at 5.942 in (block-drafting-and-line-planning.md §3, [computed] from the published formula)', () => {
    expect(inches(waistRadius(circleSkirt(28 * IN, 0.75)))).toBeCloseTo(5.942, 2);
  });
  it('keeps the waist edge within 1 mm of the waist and the hem one skirt length out, for every fraction and cut', () => {
    for (const fraction of [1, 0.75, 0.5, 0.25]) {
      for (const cut of ['ring', 'halves', 'quarters'] as const) {
        const pieces = openOutPieces(draftBlocks({ waist: 700 }, [{ block: 'skirt', shape: 'circle', fraction, cut, lengthMm: 450, waistEaseMm: 0 }]));
        const total = pieces.reduce((s, p) => s + p.copies * edgeLen(p, 'waist'), 0);
        expect(Math.abs(total - 700), `${fraction} ${cut}`).toBeLessThan(1);
        const p = pieces[0];
        expect(arcRadius(edge(p, 'hem')) - waistRadius(p)).toBeCloseTo(450, 1);
      }
    }
  });
  it('opens a full ring at centre back with two centre-back seam edges and counts one copy', () => {
    const p = circleSkirt(700, 1);
    expect(p.edges.map((e) => e.name)).toEqual(['centre-back', 'hem', 'centre-back', 'waist']);
    expect(p.copies).toBe(1);
    // Sector of an annulus, θ/2 · (R² − r²), with θ the waist's own angle (waist length ÷ radius): the opened ring
    // covers the circle once less the gap its opening allowances need.
    const r = waistRadius(p);
    const theta = edgeLen(p, 'waist') / r;
    expect(theta).toBeLessThan(2 * Math.PI);
    expect(polygonArea(p.outline)).toBeCloseTo((theta / 2) * ((r + 500) ** 2 - r ** 2), -3);
  });
  it('cuts a full ring whose cutting outline passes the cutting check, the inner sewing edge on target within 1 mm', () => {
    // Before: a full ring spanned 2π, so its two opening allowances overlapped at the waist (~87 mm).
    for (const [waist, allowance] of [[700, undefined], [30 * IN, 10], [600, 2 * IN]] as const) {
      const target = 2 * waist + 10 * IN;
      const p = draftPeplum({ waist }, { innerEdge: { times: 2, plusMm: 10 * IN }, lengthMm: 6 * IN, openingAllowanceMm: allowance });
      expect(validateCuttingOutline(p, cuttingOutline(p)), `waist ${waist}`).toEqual([]);
      expect(Math.abs(edgeLen(p, 'waist') - target)).toBeLessThan(1);
      // The gap the two allowances take, from the drafted radius: the sewing line spans 2π less that angle.
      const a = allowance ?? 10, s = 10;
      const gap = 2 * Math.asin(a / (p.innerRadiusMm - s));
      expect(edgeLen(p, 'waist') / p.innerRadiusMm).toBeCloseTo(2 * Math.PI - gap, 2);
    }
    const skirt = circleSkirt(700, 1);
    expect(validateCuttingOutline(skirt, cuttingOutline(skirt))).toEqual([]);
  });
});

describe('peplum and flounce', () => {
  it('cuts the practitioner\'s gathered peplum, 2 × waist + 10 in, at r = 11.1 in for a 30 in waist (issue 16 seed document)', () => {
    // Cut in halves on folds, so no opening gap changes the radius (a ring grows it to leave the opening room).
    const p = openOutPieces(draftBlocks({ waist: 30 * IN }, [{ block: 'peplum', shape: 'circle', innerEdge: { times: 2, plusMm: 10 * IN }, lengthMm: 6 * IN, cut: 'halves' }]))[0];
    expect(inches(waistRadius(p))).toBeCloseTo(11.1, 1);
    // the inner edges of both halves, measured on the outline, make the 70 in target within 1 mm
    expect(Math.abs(p.copies * edgeLen(p, 'waist') - 70 * IN)).toBeLessThan(1);
  });
  it('cuts a flat circle peplum whose inner edge equals the waist within 1 mm', () => {
    const p = unfoldPiece(draftPeplum({ waist: 737 }, { lengthMm: 150 }));
    expect(Math.abs(edgeLen(p, 'waist') - 737)).toBeLessThan(1);
  });
  it('gives a 70 cm seam, 15 cm deep flounce a fullness of 2.35 (block-drafting-and-line-planning.md §3, [computed])', () => {
    // In halves: the published fullness is for r = seam / 2π (a ring grows r to leave its opening room).
    const p = unfoldPiece(draftPeplum({ waist: 700 }, { lengthMm: 150, cut: 'halves' }));
    expect(edgeLen(p, 'hem') / edgeLen(p, 'waist')).toBeCloseTo(2.35, 2);
  });
  it('rounds the hem corners at the opening when asked, leaving the inner edge as it was', () => {
    const p = draftPeplum({ waist: 700 }, { cornerRadiusMm: 25.4, lengthMm: 150 });
    const turn = (q: Piece) => {
      const n = q.outline.length, i = q.edges[0].to;
      const a = q.outline[(i - 1 + n) % n], b = q.outline[i], c = q.outline[(i + 1) % n];
      const u = { x: b.x - a.x, y: b.y - a.y }, v = { x: c.x - b.x, y: c.y - b.y };
      return Math.acos((u.x * v.x + u.y * v.y) / (Math.hypot(u.x, u.y) * Math.hypot(v.x, v.y)));
    };
    // square corners turn 90° from the seam onto the hem; a fillet turns a few degrees per flattened step
    expect(turn(p)).toBeLessThan((10 * Math.PI) / 180);
    expect(turn(draftPeplum({ waist: 700 }, { lengthMm: 150 }))).toBeCloseTo(Math.PI / 2, 1);
    expect(Math.abs(edgeLen(p, 'waist') - 700)).toBeLessThan(1);
  });
  it('cuts halves and quarters on folds whose pieces together make the inner edge', () => {
    for (const cut of ['halves', 'quarters'] as const) {
      const drafted = draftPeplum({ waist: 700 }, { innerEdge: { times: 2, plusMm: 254 }, cut });
      expect(drafted.edges.some((e) => e.isFold)).toBe(true);
      const p = unfoldPiece(drafted);
      expect(Math.abs(drafted.quantity * edgeLen(p, 'waist') - (2 * 700 + 254))).toBeLessThan(1);
    }
  });
});

describe('fitted bodice: practitioner\'s rules (common practice)', () => {
  const front = draftFittedBodiceFront(M);
  const back = draftFittedBodiceBack(M);
  const bp = { x: M['bust-point-span']! / 2, y: M['front-waist-length']! - M['bust-point-height']! };

  it('stops the waist dart 1 in short of the bust point and drills inside the dart point', () => {
    const dart = front.internalLines.find((l) => l.name === 'waist-dart')!;
    expect(Math.hypot(dart.points[1].x - bp.x, dart.points[1].y - bp.y)).toBeCloseTo(IN, 6);
    expect(front.drillHoles.some((d) => Math.hypot(d.x - dart.points[1].x, d.y - dart.points[1].y) <= 12)).toBe(true);
  });
  it('notches both legs of the waist dart on the waist edge', () => {
    const dart = front.internalLines.find((l) => l.name === 'waist-dart')!;
    const notched = front.notches.map((i) => front.outline[i]);
    for (const leg of [dart.points[0], dart.points[2]]) expect(notched.some((q) => Math.hypot(q.x - leg.x, q.y - leg.y) < 1e-9)).toBe(true);
  });
  it('draws the chest line 2 in above the bust-point level', () => {
    expect(front.internalLines.find((l) => l.name === 'chest-line')!.points[0].y - bp.y).toBeCloseTo(2 * IN, 9);
  });
  it('takes the dart intake from bust − waist, or as given', () => {
    const sewnWaist = (p: Piece, intake: number) => edgeLen(p, 'waist') - intake;
    const intake = (p: Piece) => { const d = p.internalLines.find((l) => l.name === 'waist-dart')!.points; return d[2].x - d[0].x; };
    expect(sewnWaist(front, intake(front)) * 4).toBeCloseTo(M.waist! + IN, 6);
    const given = draftFittedBodiceFront(M, { waistDartMm: 30 });
    expect(intake(given)).toBeCloseTo(30, 9);
    expect(sewnWaist(given, 30) * 4).toBeCloseTo(M.waist! + IN, 6);
  });
  it('puts the shoulder point at half the shoulder measurement from the centre, and 1 in further with shoulder pads, the slope dropped', () => {
    const sp = (p: Piece) => p.outline[p.landmarks.shoulder];
    const hps = (p: Piece) => p.outline[p.landmarks.hps];
    expect(sp(front).x).toBeCloseTo(M['shoulder-width']! / 2, 9);
    const padded = draftFittedBodiceFront(M, { shoulderPads: {} });
    expect(sp(padded).x - sp(front).x).toBeCloseTo(IN, 9);
    const slope = (p: Piece) => (hps(p).y - sp(p).y) / (sp(p).x - hps(p).x);
    expect(slope(padded)).toBeLessThan(slope(front));
  });
  it('starts the round neckline 3 × 3 in; Rosenfeld 1911 Lesson 142 also gives a 3 in back neck width at size 36 (block-drafting §1.1)', () => {
    const hps = front.outline[front.landmarks.hps];
    const cf = front.outline[front.landmarks['cf-neck']];
    expect(hps.x).toBeCloseTo(3 * IN, 9);
    expect(hps.y - cf.y).toBeCloseTo(3 * IN, 9);
    expect(back.outline[back.landmarks.hps].x).toBeCloseTo(3 * IN, 9);
  });
  it('cuts a V neck to the given depth (7 in in the seed document) and keeps square and boat necklines simple', () => {
    const v = draftFittedBodiceFront(M, { neckline: { shape: 'v', depthMm: 7 * IN } });
    expect(v.outline[v.landmarks.hps].y - v.outline[v.landmarks['cf-neck']].y).toBeCloseTo(7 * IN, 9);
    for (const shape of ['square', 'boat'] as const) expect(polygonIsSimple(unfoldPiece(draftFittedBodiceFront(M, { neckline: { shape } })).outline)).toBe(true);
  });
  it('matches side and shoulder seams of front and back, with a bust dart too', () => {
    expect(edgeLen(front, 'side')).toBeCloseTo(edgeLen(back, 'side'), 6);
    expect(edgeLen(front, 'shoulder')).toBeCloseTo(edgeLen(back, 'shoulder'), 6);
    const darted = draftFittedBodiceFront(M, { bustDartMm: 'from-lengths' });
    // The Sewing Corner (block-drafting §2.1): side bust dart = front length − back length
    expect(edgeLen(darted, 'bust-dart')).toBeCloseTo(M['front-waist-length']! - M['back-waist-length']!, 9);
    expect(edgeLen(darted, 'side')).toBeCloseTo(edgeLen(back, 'side'), 6);
  });
  it('drafts front and back differently (neck depth, armhole) ', () => {
    expect(edgeLen(front, 'neckline')).not.toBeCloseTo(edgeLen(back, 'neckline'), 0);
    expect(edgeLen(front, 'armhole')).not.toBeCloseTo(edgeLen(back, 'armhole'), 0);
  });
  it('opens the centre back with a 1.5 in zip allowance by default (common practice: 1.5–2 in) and cuts a pair, else folds', () => {
    const open = draftFittedBodiceBack(M, { centreBackOpening: {} });
    const cb = open.edges.find((e) => e.name === 'centre-back')!;
    expect(cb.allowanceMm).toBeGreaterThanOrEqual(1.5 * IN);
    expect(cb.allowanceMm).toBeLessThanOrEqual(2 * IN);
    expect(open.cut).toBe('pair');
    expect(back.edges.find((e) => e.name === 'centre-back')!.isFold).toBe(true);
  });
  it('adds about 2 in ease at the bust by default (CWU costume text ch. 16: 1½–2 in)', () => {
    expect(4 * front.outline[front.landmarks.underarm].x - M.bust!).toBeCloseTo(2 * IN, 6);
  });
});

describe('sleeve against its armhole', () => {
  const front = draftFittedBodiceFront(M);
  const back = draftFittedBodiceBack(M);
  const af = edgeLen(front, 'armhole'), ab = edgeLen(back, 'armhole');
  const sleeve = draftSetInSleeve(M, { armholeFrontMm: af, armholeBackMm: ab });
  /** Arc length along the cap from underarm-back to each notch on the cap. */
  const capNotchDistances = (p: Piece) => {
    const e = p.edges.find((x) => x.name === 'cap')!;
    const out: number[] = [];
    let run = 0;
    const n = p.outline.length;
    for (let i = e.from; i !== e.to; i = (i + 1) % n) {
      if (p.notches.includes(i) && i !== e.from) out.push(run);
      const q = p.outline[(i + 1) % n], a = p.outline[i];
      run += Math.hypot(q.x - a.x, q.y - a.y);
    }
    if (p.notches.includes(e.to)) out.push(run);
    return { out, total: run };
  };

  it('measures armhole + the stated 1 in ease (sfdlearningcenter.com "Sleeve Facts" midpoints; block-drafting §1.6 band 22–45 mm)', () => {
    const ease = edgeLen(sleeve, 'cap') - (af + ab);
    expect(ease).toBeCloseTo(IN, 1);
    expect(ease).toBeGreaterThanOrEqual(22);
    expect(ease).toBeLessThanOrEqual(45);
  });
  it('gives the back cap more ease than the front, with the crown notch splitting them', () => {
    const { out, total } = capNotchDistances(sleeve);
    const crown = out[2];
    expect(crown - ab).toBeCloseTo((9 / 16) * IN, 1);
    expect(total - crown - af).toBeCloseTo((7 / 16) * IN, 1);
  });
  it('puts a double back notch and a single front notch at the bodice\'s armhole notch distances from the underarm', () => {
    const { out, total } = capNotchDistances(sleeve);
    expect(out).toHaveLength(4);
    const backNotches = back.notches.filter((i) => i > back.edges.find((e) => e.name === 'armhole')!.from && i < back.edges.find((e) => e.name === 'armhole')!.to);
    const frontNotches = front.notches.filter((i) => i > front.edges.find((e) => e.name === 'armhole')!.from && i < front.edges.find((e) => e.name === 'armhole')!.to);
    expect(backNotches).toHaveLength(2);
    expect(frontNotches).toHaveLength(1);
    const along = (p: Piece, k: number) => polylineLength(edgePoints(p, { from: p.edges.find((e) => e.name === 'armhole')!.from, to: k }));
    expect(out[0]).toBeCloseTo(along(back, backNotches[0]), 6);
    expect(out[1]).toBeCloseTo(along(back, backNotches[1]), 6);
    expect(total - out[3]).toBeCloseTo(along(front, frontNotches[0]), 6);
  });
  it('takes the cap height as ⅓ of the armhole: 19½ in armhole → 6½ in (pattern-making.com, block-drafting §1.5a)', () => {
    const s = draftSetInSleeve({ ...M, 'upper-arm': 250 }, { armholeFrontMm: 9.5 * IN, armholeBackMm: 10 * IN });
    const crown = s.outline[s.landmarks['cap-top']];
    const underarm = s.outline[s.landmarks['underarm-back']];
    expect(inches(crown.y - underarm.y)).toBeCloseTo(6.5, 9);
  });
  it('leaves at least 25 mm ease at the bicep (common practice) and refuses a cap too high for it', () => {
    expect(sleeve.bicepMm - M['upper-arm']!).toBeGreaterThanOrEqual(25);
    expect(() => draftSetInSleeve(M, { armholeFrontMm: af, armholeBackMm: ab, capHeightMm: 190 })).toThrow(/capHeightMm/);
  });
  it('gives a long sleeve a 2 in hem (turned back, the seed document) and shorter lengths 1 in (from memory)', () => {
    expect(sleeve.edges.find((e) => e.name === 'hem')!.allowanceMm).toBeCloseTo(2 * IN, 9);
    for (const length of ['short', 'three-quarter'] as const) {
      const s = draftSetInSleeve(M, { armholeFrontMm: af, armholeBackMm: ab, length });
      expect(s.edges.find((e) => e.name === 'hem')!.allowanceMm).toBeCloseTo(IN, 9);
      expect(polygonIsSimple(s.outline)).toBe(true);
    }
  });
});

describe('straight skirt block (WikiEducator "Handout for drafting skirt block", block-drafting §1.4a)', () => {
  const [front, back] = draftSkirtShape(M, { shape: 'straight', lengthMm: 600 });
  it('takes a 2 cm waist dart, 10 cm long at the front and 12 cm at the back', () => {
    for (const [p, len] of [[front, 100], [back, 120]] as const) {
      const d = p.internalLines.find((l) => l.name === 'waist-dart')!.points;
      expect(d[2].x - d[0].x).toBeCloseTo(20, 9);
      expect(-d[1].y).toBeCloseTo(len, 9);
    }
  });
  it('puts a quarter of hip + 2 in ease at hip level (CWU ch. 16: 2–2¾ in at the hips)', () => {
    expect(4 * front.outline[front.landmarks['side-hip']].x - M.hip!).toBeCloseTo(2 * IN, 9);
  });
  it('opens the back at centre back with the zip allowance asked for and cuts it as a pair', () => {
    const [, b] = draftSkirtShape(M, { shape: 'straight', lengthMm: 600, centreBackOpening: { allowanceMm: 44 } });
    expect(b.edges.find((e) => e.name === 'centre-back')!.allowanceMm).toBe(44);
    expect(b.cut).toBe('pair');
  });
  it('gives a pencil skirt a back vent and keeps every skirt shape simple', () => {
    const [, b] = draftSkirtShape(M, { shape: 'pencil', lengthMm: 600 });
    expect(edgeLen(b, 'vent')).toBeGreaterThan(0);
    for (const shape of ['straight', 'pencil', 'a-line', 'gathered'] as const) {
      for (const p of draftSkirtShape(M, { shape, lengthMm: 600 })) expect(polygonIsSimple(unfoldPiece(p).outline), `${shape} ${p.id}`).toBe(true);
    }
  });
});

describe('facings and composition', () => {
  it('follows the bodice neckline and armhole for the facing width (2–2½ in, block-drafting §2.4)', () => {
    const front = draftFittedBodiceFront(M, { neckline: { shape: 'v' } });
    const back = draftFittedBodiceBack(M, { centreBackOpening: {} });
    const [nf, nb] = draftBodiceFacings(front, back, 'neckline');
    expect(edgeLen(nf, 'neckline')).toBeCloseTo(edgeLen(front, 'neckline'), 1);
    expect(edgeLen(nb, 'neckline')).toBeCloseTo(edgeLen(back, 'neckline'), 1);
    expect(nb.cut).toBe('pair');
    const [af] = draftBodiceFacings(front, back, 'armhole');
    expect(edgeLen(af, 'armhole')).toBeCloseTo(edgeLen(front, 'armhole'), 1);
    // the facing's free edge runs the facing width (2½ in) in from the neckline and the edges it turns onto
    const source = ['neckline', 'shoulder', 'centre-front'].map((name) => edge(front, name));
    const dist = (q: Point) => Math.min(...source.flatMap((l) => l.slice(1).map((b, i) => segmentDistance(q, l[i], b))));
    const inner = edge(nf, 'inner').slice(1, -1).map(dist);
    expect(Math.max(...inner)).toBeCloseTo(2.5 * IN, 0);
    expect(Math.min(...inner)).toBeGreaterThan(2 * IN);
  });
  it('drafts the issue\'s corporate dress (V neck, long sleeves with pads, gathered peplum in contrast, centre-back zip)', () => {
    const specs: BlockSpec[] = [
      { block: 'bodice', neckline: { shape: 'v', depthMm: 7 * IN }, shoulderPads: {}, centreBackOpening: {} },
      { block: 'sleeve', length: 'long' },
      { block: 'peplum', innerEdge: { times: 2, plusMm: 10 * IN }, material: 'contrast' },
      { block: 'skirt', shape: 'pencil', centreBackOpening: {} },
      { block: 'facing', of: 'neckline' },
    ];
    const pieces = openOutPieces(draftBlocks(M, specs));
    expect(pieces.map((p) => [p.id, p.material, p.copies])).toEqual([
      ['bodice-front', 'self', 1], ['bodice-back', 'self', 2], ['sleeve', 'self', 2], ['peplum', 'contrast', 1],
      ['skirt-front', 'self', 1], ['skirt-back', 'self', 2],
      ['neckline-facing-front', 'self', 1], ['neckline-facing-front-interfacing', 'interfacing', 1],
      ['neckline-facing-back', 'self', 2], ['neckline-facing-back-interfacing', 'interfacing', 2],
    ]);
    for (const p of pieces) if (p.block !== 'peplum') expect(polygonIsSimple(p.outline), p.id).toBe(true);
    // the padded bodice's armholes are what the sleeve cap fits (opened-out front: two armholes; back: a pair, one)
    const [f, b, s] = pieces;
    expect(edgeLen(s, 'cap') - (edgeLen(f, 'armhole') / 2 + edgeLen(b, 'armhole'))).toBeCloseTo(IN, 1);
  });
  it('opens a piece on the fold into a symmetric whole with twice the area and one waist edge', () => {
    const half = draftFittedBodiceFront(M);
    const whole = unfoldPiece(half);
    expect(polygonArea(whole.outline)).toBeCloseTo(2 * polygonArea(half.outline), 6);
    expect(whole.edges.filter((e) => e.name === 'waist')).toHaveLength(1);
    expect(edgeLen(whole, 'waist')).toBeCloseTo(2 * edgeLen(half, 'waist'), 9);
    expect(whole.edges.some((e) => e.isFold)).toBe(false);
    expect(whole.notches).toHaveLength(2 * half.notches.length);
  });
});
