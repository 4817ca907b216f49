import { describe, expect, it } from 'vitest';
import { segmentDistance } from '@shared/geometry/polyline';
import type { Point } from '@shared/geometry/types';
import { cuttingOutline, demoSizeChart, draftShirtDress, measurementsForSize } from '@grading';
import { pieceToDxf } from '../dxf/piece-dxf';
import { pieceToSvg } from '../svg/piece-svg';
import { IMPORT_CHORD_TOLERANCE_MM, readDxfPattern, readPatternFile, readSvgPattern } from './index';

/** DXF text from [code, value] pairs: HEADER ($INSUNITS when given), optional BLOCKS, ENTITIES. */
function dxf(entities: (string | number)[][], opts: { insunits?: number; blocks?: (string | number)[][] } = {}): string {
  const pairs: (string | number)[][] = [[0, 'SECTION'], [2, 'HEADER']];
  if (opts.insunits !== undefined) pairs.push([9, '$INSUNITS'], [70, opts.insunits]);
  pairs.push([0, 'ENDSEC']);
  if (opts.blocks) pairs.push([0, 'SECTION'], [2, 'BLOCKS'], ...opts.blocks, [0, 'ENDSEC']);
  pairs.push([0, 'SECTION'], [2, 'ENTITIES'], ...entities, [0, 'ENDSEC'], [0, 'EOF']);
  return pairs.map(([c, v]) => `${c}\n${v}`).join('\n') + '\n';
}
const lwpoly = (layer: string, pts: [number, number, number?][], closed = true) => [
  [0, 'LWPOLYLINE'], [8, layer], [90, pts.length], [70, closed ? 1 : 0],
  ...pts.flatMap(([x, y, b]) => [[10, x], [20, y], ...(b ? [[42, b]] : [])]),
];
const line = (layer: string, a: [number, number], b: [number, number]) => [[0, 'LINE'], [8, layer], [10, a[0]], [20, a[1]], [11, b[0]], [21, b[1]]];
const arc = (layer: string, c: [number, number], r: number, a0: number, a1: number) => [[0, 'ARC'], [8, layer], [10, c[0]], [20, c[1]], [40, r], [50, a0], [51, a1]];
const text = (layer: string, at: [number, number], s: string) => [[0, 'TEXT'], [8, layer], [10, at[0]], [20, at[1]], [40, 3], [1, s]];

/** Largest distance from the points to the polyline. */
function farthest(points: Point[], ring: Point[]): number {
  let worst = 0;
  for (const p of points) {
    let best = Infinity;
    for (let i = 0; i < ring.length; i++) best = Math.min(best, segmentDistance(p, ring[i], ring[(i + 1) % ring.length]));
    worst = Math.max(worst, best);
  }
  return worst;
}

describe('readDxfPattern', () => {
  it('reads a closed polyline with a bulge of 1 as a half-disc of area πr²/2 when the file is in millimetres', () => {
    // Bulge = tan(θ/4) (AutoCAD DXF reference, LWPOLYLINE group 42): 1 is a half circle. Area πr²/2 is analytic.
    const r = 50;
    const res = readDxfPattern(dxf(lwpoly('1', [[-r, 0, 1], [r, 0]]), { insunits: 4 }));
    expect(res.problems).toEqual([]);
    expect(res.units).toBe('mm');
    const [p] = res.pieces;
    const exact = (Math.PI * r * r) / 2;
    // Chords inside the arc: the lost area is at most arc length × chord tolerance (analytic bound).
    expect(p.areaMm2).toBeLessThanOrEqual(exact);
    expect(exact - p.areaMm2).toBeLessThanOrEqual(Math.PI * r * IMPORT_CHORD_TOLERANCE_MM);
    expect(p.perimeterMm).toBeCloseTo(Math.PI * r + 2 * r, 0);
    // Every vertex of the arc is on the circle (analytic).
    for (const v of p.outline) expect(Math.hypot(v.x, v.y)).toBeCloseTo(r, 9);
  });

  it('chains LINEs and ARCs given in any order and direction into one stadium outline', () => {
    // Stadium 100 × 60 with end radius 30: area 100·60 + π·30², perimeter 2·100 + 2π·30 (analytic).
    const ents = [
      ...arc('CUT', [100, 30], 30, -90, 90), ...line('CUT', [0, 60], [100, 60]), ...line('CUT', [0, 0], [100, 0]),
      ...arc('CUT', [0, 30], 30, 90, 270),
    ];
    const res = readDxfPattern(dxf(ents, { insunits: 4 }));
    expect(res.problems).toEqual([]);
    expect(res.pieces).toHaveLength(1);
    const exact = 6000 + Math.PI * 900;
    expect(exact - res.pieces[0].areaMm2).toBeGreaterThanOrEqual(0);
    expect(exact - res.pieces[0].areaMm2).toBeLessThanOrEqual(2 * Math.PI * 30 * IMPORT_CHORD_TOLERANCE_MM);
    expect(res.pieces[0].perimeterMm).toBeCloseTo(200 + 60 * Math.PI, 0);
  });

  it('names the outline that does not close and gives no piece for it when a line is missing', () => {
    const res = readDxfPattern(dxf([...line('1', [0, 0], [100, 0]), ...line('1', [100, 0], [100, 50]), ...line('1', [100, 50], [0, 50])], { insunits: 4 }));
    expect(res.pieces).toEqual([]);
    expect(res.problems).toHaveLength(1);
    expect(res.problems[0].reason).toMatch(/does not close: its ends are 50\.00 mm apart/);
    expect(res.problems[0].entity).toMatch(/LINE.*layer 1/);
  });

  it('flattens a SPLINE within the chord tolerance of the exact parabola it stands for', () => {
    // Degree-2 clamped B-spline with control points (0,0) (50,100) (100,0) is the quadratic Bézier
    // x = 100t, y = 200t(1−t), i.e. y = 2x − x²/50 (de Boor, A Practical Guide to Splines). Area under it
    // ∫₀¹⁰⁰ (2x − x²/50) dx = 10000/3 (analytic).
    const spline = [[0, 'SPLINE'], [8, '1'], [70, 8], [71, 2], [72, 6], [73, 3], [40, 0], [40, 0], [40, 0], [40, 1], [40, 1], [40, 1],
      [10, 0], [20, 0], [10, 50], [20, 100], [10, 100], [20, 0]];
    const res = readDxfPattern(dxf([...spline, ...line('1', [100, 0], [0, 0])], { insunits: 4 }));
    expect(res.problems).toEqual([]);
    const p = res.pieces[0];
    for (const v of p.outline) expect(v.y).toBeCloseTo(2 * v.x - (v.x * v.x) / 50, 9);
    const exact = Array.from({ length: 2001 }, (_, k) => ({ x: k / 20, y: 2 * (k / 20) - (k / 20) ** 2 / 50 }));
    expect(farthest(exact, p.outline)).toBeLessThanOrEqual(IMPORT_CHORD_TOLERANCE_MM + 1e-9);
    // Chords lie inside the convex arch: lost area ≤ curve length × tolerance, and the curve is no longer than
    // its control polygon (convex hull property), 2·√(50² + 100²).
    expect(10000 / 3 - p.areaMm2).toBeGreaterThanOrEqual(0);
    expect(10000 / 3 - p.areaMm2).toBeLessThanOrEqual(2 * Math.hypot(50, 100) * IMPORT_CHORD_TOLERANCE_MM);
  });

  it('places each INSERT of a block with its point, scale and rotation and reads the piece text and grain', () => {
    // One BLOCK per piece, ENTITIES holding INSERTs: ASTM D6673 §3.1 "block" and the kupdf AAMA note
    // (reference §4.1, [quoted]). Layer 1 boundary and 7 grain line: reference §4.2 [from memory].
    const block = (name: string, size: string) => [
      [0, 'BLOCK'], [8, '0'], [2, name], [70, 0], [10, 10], [20, 10], [3, name],
      ...lwpoly('1', [[10, 10], [30, 10], [30, 40], [10, 40]]), ...line('7', [20, 15], [20, 35]),
      ...text('1', [12, 20], 'Piece Name: Front'), ...text('1', [12, 25], `Size: ${size}`), ...text('1', [12, 30], 'Quantity: 2'),
      ...text('15', [12, 35], 'Material: Shell'),
      [0, 'ENDBLK'], [8, '0'],
    ];
    const ins = (name: string, x: number, y: number, sx: number, sy: number, rot: number) => [[0, 'INSERT'], [8, '0'], [2, name], [10, x], [20, y], [41, sx], [42, sy], [50, rot]];
    const res = readDxfPattern(dxf([...ins('F-S', 100, 200, 2, 3, 90), ...ins('F-M', 0, 0, 1, 1, 0)], { insunits: 4, blocks: [...block('F-S', 'S'), ...block('F-M', 'M')] }));
    expect(res.problems).toEqual([]);
    expect(res.pieces.map((p) => p.size)).toEqual(['S', 'M']);
    const s = res.pieces[0];
    expect(s).toMatchObject({ name: 'Front', quantity: 2, material: 'Shell' });
    // Worked by hand: p − base, scaled (2, 3), rotated 90° (x, y) → (−y, x), moved by (100, 200).
    const want = [{ x: 100, y: 200 }, { x: 100, y: 240 }, { x: 10, y: 240 }, { x: 10, y: 200 }];
    for (const w of want) expect(s.outline.some((v) => Math.hypot(v.x - w.x, v.y - w.y) < 1e-9)).toBe(true);
    expect(s.areaMm2).toBeCloseTo(20 * 30 * 2 * 3, 6);
    expect(s.grainLine!.from.x).toBeCloseTo(85, 9);
    expect(s.grainLine!.from.y).toBeCloseTo(220, 9);
    expect(s.grainLine!.to.x).toBeCloseTo(25, 9);
    expect(res.pieces[1].areaMm2).toBeCloseTo(600, 9);
  });

  it('reads an R12 POLYLINE/VERTEX boundary with a bulge, notches on layer 4, a drill point on 13 and a line on 8', () => {
    // D6673 names AutoCAD R13 DXF (reference §4.1 [quoted]), so POLYLINE + VERTEX sequences must be read
    // (§4.3 item 5 [computed]); layer numbers 4 notch, 8 internal, 13 drill: §4.2 [from memory], kupdf agrees.
    const vertex = (x: number, y: number, bulge = 0) => [[0, 'VERTEX'], [8, '1'], [10, x], [20, y], ...(bulge ? [[42, bulge]] : [])];
    const ents = [
      [0, 'POLYLINE'], [8, '1'], [66, 1], [70, 1], [10, 0], [20, 0],
      ...vertex(0, 0), ...vertex(100, 0), ...vertex(100, 60, 1), ...vertex(0, 60), [0, 'SEQEND'], [8, '1'],
      ...line('4', [50, 0], [50, 5]), [0, 'POINT'], [8, '13'], [10, 30], [20, 30], ...line('8', [10, 10], [90, 10]),
    ];
    const res = readDxfPattern(dxf(ents, { insunits: 4 }));
    expect(res.problems).toEqual([]);
    const p = res.pieces[0];
    // Rectangle 100 × 60 with a half-disc of radius 50 on its top edge (bulge 1 from (100,60) to (0,60)):
    // 6000 + π·50²/2 (analytic), less at most arc length × tolerance.
    const exact = 6000 + (Math.PI * 2500) / 2;
    expect(exact - p.areaMm2).toBeGreaterThanOrEqual(0);
    expect(exact - p.areaMm2).toBeLessThanOrEqual(Math.PI * 50 * IMPORT_CHORD_TOLERANCE_MM);
    expect(Math.max(...p.outline.map((v) => v.y))).toBeCloseTo(110, 9);
    expect(p.notches).toEqual([{ x: 50, y: 0 }]);
    expect(p.drillHoles).toEqual([{ x: 30, y: 30 }]);
    expect(p.internalLines).toEqual([[{ x: 10, y: 10 }, { x: 90, y: 10 }]]);
  });

  it('mirrors a block inserted with a negative x scale and keeps its outline counter-clockwise', () => {
    const blocks = [[0, 'BLOCK'], [8, '0'], [2, 'P'], [70, 0], [10, 0], [20, 0], ...lwpoly('CUT', [[0, 0], [40, 0], [0, 30]]), [0, 'ENDBLK'], [8, '0']];
    const res = readDxfPattern(dxf([[0, 'INSERT'], [8, '0'], [2, 'P'], [10, 0], [20, 0], [41, -1], [42, 1]], { insunits: 4, blocks }));
    const p = res.pieces[0];
    expect(p.areaMm2).toBeCloseTo(600, 9); // right triangle 40 × 30 / 2
    expect(Math.min(...p.outline.map((v) => v.x))).toBeCloseTo(-40, 9);
    const signed = p.outline.reduce((s, a, i) => { const b = p.outline[(i + 1) % p.outline.length]; return s + a.x * b.y - b.x * a.y; }, 0) / 2;
    expect(signed).toBeGreaterThan(0);
  });

  it('says the units are unknown and gives no pieces when $INSUNITS is absent and the caller gave none', () => {
    const file = dxf(lwpoly('1', [[0, 0], [10, 0], [10, 10], [0, 10]]));
    const res = readDxfPattern(file);
    expect(res).toMatchObject({ pieces: [], units: 'unknown' });
    expect(res.problems[0].reason).toMatch(/units/);
    const cm = readDxfPattern(file, { units: 'cm' });
    expect(cm).toMatchObject({ units: 'cm', unitsFrom: 'caller' });
    expect(cm.pieces[0].areaMm2).toBeCloseTo(10000, 9); // 10 cm square = 100 mm × 100 mm
  });

  it('reads inches from $INSUNITS 1 as 25.4 mm (AutoCAD DXF reference, header variables)', () => {
    const res = readDxfPattern(dxf(lwpoly('1', [[0, 0], [1, 0], [1, 1], [0, 1]]), { insunits: 1 }));
    expect(res.pieces[0].areaMm2).toBeCloseTo(25.4 * 25.4, 9);
  });

  it('names each entity it cannot read and why', () => {
    const res = readDxfPattern(dxf([...lwpoly('1', [[0, 0], [10, 0], [10, 10], [0, 10]]), [0, 'SOLID'], [5, 'A1'], [8, '1'], [10, 0], [20, 0]], { insunits: 4 }));
    expect(res.problems).toEqual([{ entity: 'SOLID #A1 on layer 1', reason: 'SOLID entities are not read' }]);
  });

  it('names entity types the parser drops silently, such as HATCH', () => {
    const res = readDxfPattern(dxf([...lwpoly('1', [[0, 0], [10, 0], [10, 10], [0, 10]]), [0, 'HATCH'], [8, '1'], [0, 'HATCH'], [8, '1']], { insunits: 4 }));
    expect(res.pieces).toHaveLength(1);
    expect(res.problems).toEqual([{ entity: '2 HATCH entities', reason: 'HATCH entities are not read' }]);
  });

  it('answers with a problem, not an exception, for text that is not DXF', () => {
    const res = readPatternFile('hello\nworld');
    expect(res.pieces).toEqual([]);
    expect(res.problems[0].entity).toBe('file');
  });
});

describe('a file that is not a DXF drawing', () => {
  // File signatures: PNG (ISO/IEC 15948 §5.2, 89 50 4E 47 0D 0A 1A 0A), PDF (ISO 32000-1 §7.5.2, "%PDF-"),
  // ASCII DXF group code / value pairs starting "0 / SECTION" (AutoCAD DXF Reference).
  const reasonOf = (text: string) => readDxfPattern(text, { units: 'mm' }).problems[0]?.reason ?? '';
  it('names what it is instead of passing on the parser\'s words', () => {
    expect(reasonOf('')).toBe('the file is empty');
    expect(reasonOf('\uFFFDPNG\r\n\u001a\n0000IHDR')).toMatch(/^this is a PNG picture, not a DXF file/);
    expect(reasonOf('%PDF-1.7\n%âãÏÓ')).toMatch(/^this is a PDF, not a DXF file/);
    expect(reasonOf('hello, this is a note\n')).toBe('this is not a DXF file: a DXF file starts with a group code such as 0 followed by SECTION');
    expect(reasonOf('0\nSECTION\n2\nENTITIES\n0\nLWPOLYLINE\n')).toMatch(/stops before its end \(EOF\) marker/);
    expect(readDxfPattern('hello', { units: 'mm' }).pieces).toEqual([]);
  });
});

describe('readSvgPattern', () => {
  it('reads two arc commands as an ellipse of area πab (analytic) in millimetres', () => {
    const svg = '<svg xmlns="http://www.w3.org/2000/svg" width="200mm" height="200mm" viewBox="0 0 200 200"><path d="M 100 150 A 80 50 0 1 1 100 50 A 80 50 0 1 1 100 150 Z"/></svg>';
    const res = readSvgPattern(svg);
    expect(res.problems).toEqual([]);
    const exact = Math.PI * 80 * 50;
    expect(res.pieces[0].areaMm2).toBeLessThanOrEqual(exact);
    // Inscribed chords lose at most perimeter × tolerance; Ramanujan's ellipse perimeter < 2π·80.
    expect(exact - res.pieces[0].areaMm2).toBeLessThanOrEqual(2 * Math.PI * 80 * IMPORT_CHORD_TOLERANCE_MM);
  });

  it('reads a rotated relative arc with packed flags and a px size at 96 per inch (SVG 1.1 §7.10)', () => {
    // Ellipse rx 80, ry 50 rotated 30°, drawn from one end of its major axis to the other and back.
    const c = Math.cos(Math.PI / 6) * 160, s = Math.sin(Math.PI / 6) * 160;
    const svg = `<svg width="768" height="768" viewBox="0 0 768 768"><path d="m 300 300 a80 50 30 1 1 ${c} ${s} a 80 50 30 11${-c} ${-s}z"/></svg>`;
    const res = readSvgPattern(svg);
    expect(res.problems).toEqual([]);
    const k = 25.4 / 96;
    const exact = Math.PI * 80 * 50 * k * k;
    expect(res.pieces[0].areaMm2).toBeLessThanOrEqual(exact);
    expect(exact - res.pieces[0].areaMm2).toBeLessThanOrEqual(2 * Math.PI * 80 * k * IMPORT_CHORD_TOLERANCE_MM);
  });

  it('applies nested translate, rotate, scale and matrix transforms (area scales by the determinant)', () => {
    // rect 10 × 20 = 200; scale(2) ×4; matrix(1 0 0.5 1 0 0) (a shear, det 1); rotate and translate keep area.
    const svg = '<svg width="100mm" height="100mm" viewBox="0 0 100 100"><g transform="translate(10 20) rotate(30)"><g transform="scale(2)"><rect x="1" y="1" width="10" height="20" transform="matrix(1 0 0.5 1 0 0)"/></g></g></svg>';
    const res = readSvgPattern(svg);
    expect(res.problems).toEqual([]);
    expect(res.pieces[0].areaMm2).toBeCloseTo(800, 9);
  });

  it('draws H V h v and the smooth S and T commands as their reflected-control forms (SVG 1.1 §8.3.6, §8.3.7)', () => {
    const head = '<svg width="100cm" height="100cm" viewBox="0 0 100 100">';
    const area = (d: string) => readSvgPattern(`${head}<path d="${d}"/></svg>`).pieces[0].areaMm2;
    expect(area('M0 0 H 10 v 5 h -10 V 0 Z')).toBeCloseTo(50 * 100, 9); // 10 cm × 5 cm
    expect(area('M0 0 C 0 20 20 20 20 10 S 40 0 40 0 L 40 -10 Z')).toBeCloseTo(area('M0 0 C 0 20 20 20 20 10 C 20 0 40 0 40 0 L 40 -10 Z'), 9);
    expect(area('M0 0 Q 10 20 20 0 T 40 0 L 40 -30 Z')).toBeCloseTo(area('M0 0 Q 10 20 20 0 Q 30 -20 40 0 L 40 -30 Z'), 9);
    // Quadratic segment: Archimedes, area = 2/3 × chord × height (height 10 for control height 20).
    // Lost area ≤ curve length (≤ control polygon, 2·√(10² + 20²) cm) × tolerance.
    const archimedes = (2 / 3) * 20 * 10 * 100;
    expect(archimedes - area('M0 0 Q 10 20 20 0 Z')).toBeGreaterThanOrEqual(0);
    expect(archimedes - area('M0 0 Q 10 20 20 0 Z')).toBeLessThanOrEqual(2 * Math.hypot(100, 200) * IMPORT_CHORD_TOLERANCE_MM);
  });

  it('asks for the units when the root has no width or height', () => {
    const svg = '<svg viewBox="0 0 10 10"><polygon points="0,0 10,0 10,10 0,10"/></svg>';
    expect(readSvgPattern(svg)).toMatchObject({ pieces: [], units: 'unknown' });
    expect(readSvgPattern(svg, { units: 'in' }).pieces[0].areaMm2).toBeCloseTo(100 * 25.4 * 25.4, 6);
  });

  it('names an open path and a bad path it could not read', () => {
    const svg = '<svg width="10mm" height="10mm" viewBox="0 0 10 10"><path id="hem" d="M0 0 L 5 5"/><path id="x" d="M0 0 L 5"/></svg>';
    const res = readSvgPattern(svg);
    expect(res.pieces).toEqual([]);
    expect(res.problems.map((p) => p.entity)).toEqual(['<path> id="x" #3', '<path> id="hem" #2']);
    expect(res.problems[0].reason).toMatch(/missing a number/);
    expect(res.problems[1].reason).toMatch(/open line/);
  });
});

describe('round trip through Seamrun\'s own exports', () => {
  // The exporters (dxf-writer; string templates in piece-svg.ts) share no code with these readers
  // (dxf-parser plus our own entity geometry; our own SVG tokenizer), so a match checks both sides.
  const pieces = draftShirtDress(measurementsForSize(demoSizeChart(), 'M'));

  it('reads the DXF export of every demo piece back to the same outline within 0.1 mm', () => {
    for (const piece of pieces) {
      const res = readDxfPattern(pieceToDxf(piece, { cutting: cuttingOutline }));
      expect(res.problems).toEqual([]);
      expect(res.pieces).toHaveLength(1);
      const back = res.pieces[0];
      expect(back.name).toBe(piece.name);
      // pieceToDxf lays a lone piece out from x = 0: shift by the difference of the left edges.
      const dx = Math.min(...piece.outline.map((p) => p.x)) - Math.min(...back.outline.map((p) => p.x));
      const moved = back.outline.map((p) => ({ x: p.x + dx, y: p.y }));
      expect(farthest(moved, piece.outline)).toBeLessThan(0.1);
      expect(farthest(piece.outline, moved)).toBeLessThan(0.1);
    }
  });

  it('reads the SVG export of every demo piece back to the same outline within 0.1 mm', () => {
    for (const piece of pieces) {
      const res = readSvgPattern(pieceToSvg(piece, { cutting: cuttingOutline }));
      expect(res.problems).toEqual([]);
      expect(res.pieces).toHaveLength(1);
      const back = res.pieces[0].outline;
      expect(farthest(back, piece.outline)).toBeLessThan(0.1);
      expect(farthest(piece.outline, back)).toBeLessThan(0.1);
    }
  });
});
