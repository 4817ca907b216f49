import DxfParser from 'dxf-parser';
import { polygonContainsPoint, segmentDistance } from '@shared/geometry/polyline';
import type { Point } from '@shared/geometry/types';
import {
  IMPORT_CHORD_TOLERANCE_MM, IMPORT_ENDPOINT_TOLERANCE_MM, MM_PER_UNIT, arcPoints, chainPaths, cleanRing, finishPiece, readAnnotations,
  type ImportProblem, type ImportedPiece, type PatternImportResult, type PatternReadOptions, type PatternUnit,
} from './imported-pattern';

/**
 * Layers by meaning. Numbers follow the ASTM D6673 layer list as recalled in
 * shared/reference/block-drafting-and-line-planning.md §4.2 ([from memory]: 1 boundary, 4 notches, 7 grain,
 * 8 internal, 11 internal cut-outs, 13 drill holes, 14 sew lines, 15 annotation; 80–86 notch variants); names
 * are those of the kupdf AAMA note (§4.1 [quoted]: CUT/OUTLINE, DRAW/INK, INTCUT, DRILL, NOTCH, TEXT) and
 * Seamrun's own exporter (SEWING, GRAIN, NOTCH, DRILL, INTERNAL, LABEL; its CUTTING line is skipped because
 * the SEWING line is the piece).
 */
const LAYERS = {
  boundary: new Set(['1', 'CUT', 'OUTLINE', 'BOUNDARY', 'SEWING']),
  skip: new Set(['CUTTING', '2', '3', '5', '6', '9', '10', '12']),
  notch: new Set(['4', 'NOTCH', '80', '81', '82', '83', '84', '85', '86']),
  grain: new Set(['7', 'GRAIN']),
  internal: new Set(['8', 'DRAW', 'INK', 'INTERNAL', '11', 'INTCUT', '14', '26', 'REF']),
  drill: new Set(['13', 'DRILL']),
};

/** $INSUNITS codes (AutoCAD DXF reference, header variables): 1 inches, 4 millimetres, 5 centimetres. */
const INSUNITS: Record<number, PatternUnit> = { 1: 'in', 4: 'mm', 5: 'cm' };

type V = { x: number; y: number; bulge?: number };
interface DxfEntity {
  type: string;
  handle?: string;
  layer?: string;
  vertices?: V[];
  shape?: boolean;
  center?: V;
  radius?: number;
  startAngle?: number;
  endAngle?: number;
  majorAxisEndPoint?: V;
  axisRatio?: number;
  controlPoints?: V[];
  fitPoints?: V[];
  knotValues?: number[];
  degreeOfSplineCurve?: number;
  closed?: boolean;
  rational?: boolean;
  name?: string;
  position?: V;
  startPoint?: V;
  xScale?: number;
  yScale?: number;
  rotation?: number;
  text?: string;
}
interface DxfBlock { name: string; position?: V; entities?: DxfEntity[] }

/** Affine map x' = a x + c y + e, y' = b x + d y + f. */
type M = [number, number, number, number, number, number];
const apply = (m: M, p: V): Point => ({ x: m[0] * p.x + m[2] * p.y + m[4], y: m[1] * p.x + m[3] * p.y + m[5] });
const mul = (m: M, n: M): M => [
  m[0] * n[0] + m[2] * n[1], m[1] * n[0] + m[3] * n[1], m[0] * n[2] + m[2] * n[3], m[1] * n[2] + m[3] * n[3],
  m[0] * n[4] + m[2] * n[5] + m[4], m[1] * n[4] + m[3] * n[5] + m[5],
];
const maxScale = (m: M) => Math.max(Math.hypot(m[0], m[1]), Math.hypot(m[2], m[3]));

type Item =
  | { kind: 'path'; points: Point[]; closed: boolean; layer: string; what: string }
  | { kind: 'point'; p: Point; layer: string; what: string }
  | { kind: 'text'; text: string; p: Point; layer: string };

interface Group { blockName?: string; items: Item[] }

/**
 * Read pattern pieces from DXF text. Closed LWPOLYLINE/POLYLINE (bulges become arcs), LINE/ARC/SPLINE/ELLIPSE
 * chained end to end within {@link IMPORT_ENDPOINT_TOLERANCE_MM}, curves flattened within the chord tolerance
 * (default {@link IMPORT_CHORD_TOLERANCE_MM}), BLOCK/INSERT with insertion point, scale and rotation (one block per
 * piece, each INSERT a piece). Units from $INSUNITS (1 in, 4 mm, 5 cm), else the style text `Units: METRIC|ENGLISH`,
 * else `options.units`; if none, no pieces and units 'unknown'. Every entity that could not be read is a problem.
 */
/**
 * Why a file is plainly not a DXF drawing, said in the owner's words, or null when it may be one. An ASCII DXF
 * (AutoCAD DXF Reference, "DXF Format": group code / value line pairs) starts with a group code, normally
 * `0` then `SECTION`, or `999` for a comment.
 */
export function notDxfReason(text: string): string | null {
  const head = text.slice(0, 64);
  if (!text.trim()) return 'the file is empty';
  if (head.includes('PNG') && /^\W{0,4}PNG/.test(head)) return 'this is a PNG picture, not a DXF file (to use a photo, trace the piece from the photo instead)';
  if (/^\W{0,4}JFIF|^\W{0,4}Exif|^\uFFFD\uFFFD\uFFFD/.test(head) || head.slice(6, 10) === 'JFIF') return 'this is a JPEG picture, not a DXF file (to use a photo, trace the piece from the photo instead)';
  if (head.startsWith('%PDF')) return 'this is a PDF, not a DXF file (export the pattern as DXF from the program that drew it)';
  if (head.startsWith('AutoCAD Binary DXF')) return 'this is a binary DXF; save it again as an ASCII (text) DXF';
  const first = text.split(/\r?\n/).find((l) => l.trim() !== '')?.trim() ?? '';
  if (!/^\d{1,4}$/.test(first)) return 'this is not a DXF file: a DXF file starts with a group code such as 0 followed by SECTION';
  return null;
}

export function readDxfPattern(text: string, options: PatternReadOptions = {}): PatternImportResult {
  const problems: ImportProblem[] = [];
  const notDxf = notDxfReason(text);
  if (notDxf) return { pieces: [], problems: [{ entity: 'file', reason: notDxf }], units: 'unknown', unitsFrom: 'none' };
  let parsed: { header?: Record<string, unknown>; entities?: DxfEntity[]; blocks?: Record<string, DxfBlock> } | null;
  // dxf-parser prints a warning line for unknown group codes; keep the caller's output clean.
  const log = console.log;
  try {
    console.log = () => undefined;
    parsed = new DxfParser().parseSync(text) as typeof parsed;
  } catch (e) {
    // The parser's own words are for developers; a DXF that stops short is the usual cause (a cut-off download or copy).
    const cutShort = /end of (input|file)|EOF/i.test((e as Error).message);
    const reason = cutShort ? 'the DXF file stops before its end (EOF) marker: it may be cut short; save or download it again' : `not a readable DXF file (${(e as Error).message.split('\n')[0]})`;
    return { pieces: [], problems: [{ entity: 'file', reason }], units: 'unknown', unitsFrom: 'none' };
  } finally {
    console.log = log;
  }
  problems.push(...skippedEntityTypes(text));
  if (!parsed || !parsed.entities) return { pieces: [], problems: [{ entity: 'file', reason: 'not a DXF file: no ENTITIES section' }], units: 'unknown', unitsFrom: 'none' };
  const entities = parsed.entities;
  const blocks = parsed.blocks ?? {};

  let units: PatternUnit | undefined = INSUNITS[Number(parsed.header?.$INSUNITS)];
  let unitsFrom: PatternImportResult['unitsFrom'] = units ? 'file' : 'none';
  if (!units) {
    const allTexts = [...entities, ...Object.values(blocks).flatMap((b) => b.entities ?? [])].filter((e) => e.type === 'TEXT' || e.type === 'MTEXT');
    // Style system text `Units: ENGLISH|METRIC` (§4.2 [from memory]); METRIC is taken as millimetres.
    const u = allTexts.map((e) => /^\s*Units\s*:\s*(ENGLISH|METRIC)/i.exec(e.text ?? '')?.[1]?.toUpperCase()).find(Boolean);
    if (u) { units = u === 'ENGLISH' ? 'in' : 'mm'; unitsFrom = 'file'; }
  }
  if (!units && options.units) { units = options.units; unitsFrom = 'caller'; }
  if (!units) {
    return { pieces: [], problems: [{ entity: 'file', reason: 'the file does not say its units ($INSUNITS); give them as mm, cm or in' }], units: 'unknown', unitsFrom: 'none' };
  }
  const tolMm = options.chordToleranceMm ?? IMPORT_CHORD_TOLERANCE_MM;
  const base: M = [MM_PER_UNIT[units], 0, 0, MM_PER_UNIT[units], 0, 0];

  const loose: Group = { items: [] };
  const groups: Group[] = [loose];
  for (const e of entities) {
    if (e.type === 'INSERT') {
      const g: Group = { blockName: e.name, items: [] };
      insert(e, base, g.items, 0);
      groups.push(g);
    } else read(e, base, loose.items, '');
  }

  function insert(e: DxfEntity, m: M, into: Item[], depth: number): void {
    const block = e.name ? blocks[e.name] : undefined;
    if (!block) { problems.push({ entity: label(e, ''), reason: `INSERT of a block "${e.name ?? ''}" that the file does not define` }); return; }
    if (depth > 8) { problems.push({ entity: label(e, ''), reason: 'blocks nested more than 8 deep' }); return; }
    const r = ((e.rotation ?? 0) * Math.PI) / 180;
    const sx = e.xScale ?? 1, sy = e.yScale ?? 1;
    const bx = block.position?.x ?? 0, by = block.position?.y ?? 0;
    const px = e.position?.x ?? 0, py = e.position?.y ?? 0;
    const local: M = mul([Math.cos(r), Math.sin(r), -Math.sin(r), Math.cos(r), px, py], [sx, 0, 0, sy, -sx * bx, -sy * by]);
    const mm = mul(m, local);
    for (const child of block.entities ?? []) {
      if (child.type === 'INSERT') insert(child, mm, into, depth + 1);
      else read(child, mm, into, `block "${block.name}" `);
    }
  }

  function read(e: DxfEntity, m: M, into: Item[], where: string): void {
    const layer = (e.layer ?? '0').trim().toUpperCase();
    const tol = tolMm / maxScale(m);
    const what = label(e, where);
    const path = (pts: V[], closed: boolean) => into.push({ kind: 'path', points: pts.map((p) => apply(m, p)), closed, layer, what });
    switch (e.type) {
      case 'LINE':
        if (e.vertices && e.vertices.length >= 2) path(e.vertices.slice(0, 2), false);
        else problems.push({ entity: what, reason: 'LINE without two end points' });
        return;
      case 'LWPOLYLINE':
      case 'POLYLINE': {
        const vs = e.vertices ?? [];
        if (vs.length < 2) { problems.push({ entity: what, reason: `${e.type} with fewer than two vertices` }); return; }
        path(bulgePolyline(vs, !!e.shape, tol), !!e.shape);
        return;
      }
      case 'ARC': {
        if (!e.center || !(e.radius! > 0)) { problems.push({ entity: what, reason: 'ARC without centre or radius' }); return; }
        let sweep = (e.endAngle ?? 0) - (e.startAngle ?? 0);
        while (sweep <= 0) sweep += 2 * Math.PI;
        path(arcPoints(e.center, e.radius!, e.startAngle ?? 0, sweep, tol), false);
        return;
      }
      case 'CIRCLE':
        if (!e.center || !(e.radius! > 0)) { problems.push({ entity: what, reason: 'CIRCLE without centre or radius' }); return; }
        if (LAYERS.drill.has(layer) || (e.radius! * maxScale(m) < 5 && !LAYERS.boundary.has(layer))) into.push({ kind: 'point', p: apply(m, e.center), layer, what });
        else path(arcPoints(e.center, e.radius!, 0, 2 * Math.PI, tol).slice(0, -1), true);
        return;
      case 'ELLIPSE': {
        const c = e.center, a = e.majorAxisEndPoint, k = e.axisRatio ?? 1;
        if (!c || !a) { problems.push({ entity: what, reason: 'ELLIPSE without centre or axis' }); return; }
        const t0 = e.startAngle ?? 0;
        let t1 = e.endAngle ?? 2 * Math.PI;
        while (t1 <= t0) t1 += 2 * Math.PI;
        const ra = Math.hypot(a.x, a.y);
        const n = Math.max(8, Math.ceil((t1 - t0) / (2 * Math.acos(1 - Math.min(1, tol / ra)))));
        const pts: V[] = [];
        for (let i = 0; i <= n; i++) {
          const t = t0 + ((t1 - t0) * i) / n;
          pts.push({ x: c.x + a.x * Math.cos(t) - k * a.y * Math.sin(t), y: c.y + a.y * Math.cos(t) + k * a.x * Math.sin(t) });
        }
        const full = Math.abs(t1 - t0 - 2 * Math.PI) < 1e-9;
        path(full ? pts.slice(0, -1) : pts, full);
        return;
      }
      case 'SPLINE': {
        if (e.rational) { problems.push({ entity: what, reason: 'rational SPLINE (weights) is not read' }); return; }
        const cps = e.controlPoints ?? [];
        const p = e.degreeOfSplineCurve ?? 3;
        const knots = e.knotValues ?? [];
        if (cps.length <= p || knots.length !== cps.length + p + 1) {
          problems.push({ entity: what, reason: cps.length ? 'SPLINE knots do not match its control points' : 'SPLINE given only by fit points is not read' });
          return;
        }
        path(flattenSpline(cps, knots, p, tol), !!e.closed);
        return;
      }
      case 'POINT':
        if (e.position && LAYERS.drill.has(layer)) into.push({ kind: 'point', p: apply(m, e.position), layer, what });
        return; // turn and curve points (layers 2, 3) repeat the boundary's vertices
      case 'TEXT':
      case 'MTEXT':
      case 'ATTDEF':
        if (e.text) into.push({ kind: 'text', text: e.text, p: apply(m, e.startPoint ?? e.position ?? { x: 0, y: 0 }), layer });
        return;
      default:
        problems.push({ entity: what, reason: `${e.type} entities are not read` });
    }
  }

  const anyBoundaryLayer = groups.some((g) => g.items.some((i) => i.kind === 'path' && LAYERS.boundary.has(i.layer)));
  const isMark = (l: string) => LAYERS.skip.has(l) || LAYERS.notch.has(l) || LAYERS.grain.has(l) || LAYERS.internal.has(l) || LAYERS.drill.has(l);
  const isBoundary = (l: string) => (anyBoundaryLayer ? LAYERS.boundary.has(l) : !isMark(l));
  const pieces: ImportedPiece[] = [];
  for (const g of groups) {
    const bounds = g.items.filter((i): i is Extract<Item, { kind: 'path' }> => i.kind === 'path' && isBoundary(i.layer));
    const rings = bounds.filter((b) => b.closed).map((b) => cleanRing(b.points));
    const chained = chainPaths(bounds.filter((b) => !b.closed).map((b) => b.points), IMPORT_ENDPOINT_TOLERANCE_MM);
    rings.push(...chained.closed.map((r) => cleanRing(r)));
    for (const o of chained.open) {
      const gap = Math.hypot(o[0].x - o[o.length - 1].x, o[0].y - o[o.length - 1].y);
      const from = bounds.find((b) => b.points.includes(o[0]) || b.points[b.points.length - 1] === o[0]);
      problems.push({ entity: from?.what ?? 'outline', reason: `outline does not close: its ends are ${gap.toFixed(2)} mm apart, near x = ${o[0].x.toFixed(1)} mm, y = ${o[0].y.toFixed(1)} mm` });
    }
    const good = rings.filter((r) => r.length >= 3);
    const marks = g.items.filter((i) => !(i.kind === 'path' && isBoundary(i.layer)));
    good.forEach((ring) => {
      const owns = (p: Point) => good.length === 1 || polygonContainsPoint(ring, p) || distanceToRing(ring, p) < 1;
      const mine = marks.filter((i) => owns(i.kind === 'path' ? i.points[0] : i.p));
      const texts = mine.filter((i): i is Extract<Item, { kind: 'text' }> => i.kind === 'text').map((t) => t.text);
      const seamrun = texts.map((t) => t.split('|')).find((t) => t.length >= 5);
      const ann = readAnnotations(texts);
      const paths = mine.filter((i): i is Extract<Item, { kind: 'path' }> => i.kind === 'path');
      const grain = paths.find((i) => LAYERS.grain.has(i.layer));
      const notches = paths.filter((i) => LAYERS.notch.has(i.layer)).map((i) => {
        const a = i.points[0], b = i.points[i.points.length - 1];
        return distanceToRing(ring, a) <= distanceToRing(ring, b) ? a : b;
      });
      const blockName = g.blockName && !g.blockName.startsWith('*') ? g.blockName : undefined;
      const size = ann.size ?? (seamrun?.[2] || undefined);
      const quantity = ann.quantity ?? (seamrun && Number(seamrun[4]) > 0 ? Number(seamrun[4]) : undefined);
      pieces.push(finishPiece({
        name: ann.name ?? seamrun?.[0] ?? blockName ?? `Piece ${pieces.length + 1}`,
        ...(size ? { size } : {}),
        ...(quantity ? { quantity } : {}),
        ...(ann.material ? { material: ann.material } : {}),
        outline: ring,
        ...(grain ? { grainLine: { from: grain.points[0], to: grain.points[grain.points.length - 1] } } : {}),
        ...(notches.length ? { notches } : {}),
        drillHoles: mine.filter((i): i is Extract<Item, { kind: 'point' }> => i.kind === 'point').map((i) => i.p),
        internalLines: paths.filter((i) => LAYERS.internal.has(i.layer)).map((i) => i.points),
      }));
    });
  }
  if (pieces.length === 0 && problems.length === 0) problems.push({ entity: 'file', reason: 'no closed piece outline found' });
  return { pieces, problems, units, unitsFrom };
}

/** Entity types dxf-parser reads; others it drops without a word, so they are counted from the text here. */
const PARSED_TYPES = new Set(['3DFACE', 'ARC', 'ATTDEF', 'CIRCLE', 'DIMENSION', 'ELLIPSE', 'INSERT', 'LINE', 'LWPOLYLINE', 'MTEXT', 'POINT', 'POLYLINE', 'SOLID', 'SPLINE', 'TEXT']);

function skippedEntityTypes(text: string): ImportProblem[] {
  const lines = text.split(/\r\n|\r|\n/);
  const counts = new Map<string, number>();
  let section = '';
  for (let i = 0; i + 1 < lines.length; i += 2) {
    const code = lines[i].trim(), value = lines[i + 1].trim();
    if (code === '2' && lines[i - 1]?.trim() === 'SECTION') section = value;
    if (code !== '0' || (section !== 'ENTITIES' && section !== 'BLOCKS')) continue;
    if (['SECTION', 'ENDSEC', 'EOF', 'BLOCK', 'ENDBLK', 'VERTEX', 'SEQEND', 'ATTRIB'].includes(value) || PARSED_TYPES.has(value)) continue;
    counts.set(value, (counts.get(value) ?? 0) + 1);
  }
  return [...counts].map(([type, n]) => ({ entity: `${n} ${type} entit${n === 1 ? 'y' : 'ies'}`, reason: `${type} entities are not read` }));
}

function label(e: DxfEntity, where: string): string {
  return `${where}${e.type}${e.handle ? ` #${e.handle}` : ''} on layer ${e.layer ?? '0'}`;
}

function distanceToRing(ring: Point[], p: Point): number {
  let best = Infinity;
  for (let i = 0; i < ring.length; i++) best = Math.min(best, segmentDistance(p, ring[i], ring[(i + 1) % ring.length]));
  return best;
}

/**
 * Polyline vertices with bulges (bulge = tan(θ/4), θ the arc's included angle, positive counter-clockwise;
 * AutoCAD DXF reference, LWPOLYLINE group 42) to points, each arc within `tol`.
 */
export function bulgePolyline(vs: V[], closed: boolean, tol: number): Point[] {
  const out: Point[] = [];
  const n = vs.length;
  const last = closed ? n : n - 1;
  for (let i = 0; i < last; i++) {
    const a = vs[i], b = vs[(i + 1) % n];
    out.push({ x: a.x, y: a.y });
    const bulge = a.bulge ?? 0;
    if (Math.abs(bulge) < 1e-12) continue;
    const c = Math.hypot(b.x - a.x, b.y - a.y);
    if (c === 0) continue;
    const theta = 4 * Math.atan(bulge);
    const r = c / (2 * Math.abs(Math.sin(theta / 2)));
    const ux = (b.x - a.x) / c, uy = (b.y - a.y) / c;
    const off = (c / 2) * (Math.cos(theta / 2) / Math.sin(theta / 2));
    const centre = { x: (a.x + b.x) / 2 - uy * off, y: (a.y + b.y) / 2 + ux * off };
    const a0 = Math.atan2(a.y - centre.y, a.x - centre.x);
    out.push(...arcPoints(centre, r, a0, theta, tol).slice(1, -1));
  }
  if (!closed) out.push({ x: vs[n - 1].x, y: vs[n - 1].y });
  return out;
}

/** Point of a B-spline (de Boor's algorithm) at parameter t in knot span k. */
function deBoor(k: number, t: number, knots: number[], cps: V[], p: number): Point {
  const d = Array.from({ length: p + 1 }, (_, j) => ({ x: cps[j + k - p].x, y: cps[j + k - p].y }));
  for (let r = 1; r <= p; r++) {
    for (let j = p; j >= r; j--) {
      const den = knots[j + 1 + k - r] - knots[j + k - p];
      const alpha = den === 0 ? 0 : (t - knots[j + k - p]) / den;
      d[j] = { x: (1 - alpha) * d[j - 1].x + alpha * d[j].x, y: (1 - alpha) * d[j - 1].y + alpha * d[j].y };
    }
  }
  return d[p];
}

/**
 * A non-rational B-spline flattened so that at the midpoint and quarter points of every chord the curve lies
 * within `tol` of the chord (recursive halving per knot span, at least 4 pieces a span).
 */
export function flattenSpline(cps: V[], knots: number[], p: number, tol: number): Point[] {
  const out: Point[] = [];
  const n = cps.length;
  for (let k = p; k < n; k++) {
    const t0 = knots[k], t1 = knots[k + 1];
    if (t1 <= t0) continue;
    const at = (t: number) => deBoor(k, t, knots, cps, p);
    if (out.length === 0) out.push(at(t0));
    const rec = (a: number, pa: Point, b: number, pb: Point, depth: number) => {
      const mids = [0.25, 0.5, 0.75].map((f) => a + (b - a) * f);
      const pm = mids.map(at);
      const far = pm.some((q) => segmentDistance(q, pa, pb) > tol);
      if (depth < 2 || (far && depth < 18)) {
        rec(a, pa, mids[1], pm[1], depth + 1);
        rec(mids[1], pm[1], b, pb, depth + 1);
      } else out.push(pb);
    };
    rec(t0, at(t0), t1, at(t1), 0);
  }
  return out;
}
