import { cubicBezierFlatten } from '@shared/geometry/bezier';
import type { Point } from '@shared/geometry/types';
import {
  IMPORT_CHORD_TOLERANCE_MM, IMPORT_ENDPOINT_TOLERANCE_MM, MM_PER_UNIT, finishPiece,
  type ImportProblem, type ImportedPiece, type PatternImportResult, type PatternReadOptions, type PatternUnit,
} from './imported-pattern';

/** Affine map [a b c d e f] as in SVG's matrix(): x' = a x + c y + e, y' = b x + d y + f. */
export type Affine = [number, number, number, number, number, number];
const I: Affine = [1, 0, 0, 1, 0, 0];
const mul = (m: Affine, n: Affine): Affine => [
  m[0] * n[0] + m[2] * n[1], m[1] * n[0] + m[3] * n[1], m[0] * n[2] + m[2] * n[3], m[1] * n[2] + m[3] * n[3],
  m[0] * n[4] + m[2] * n[5] + m[4], m[1] * n[4] + m[3] * n[5] + m[5],
];
const apply = (m: Affine, p: Point): Point => ({ x: m[0] * p.x + m[2] * p.y + m[4], y: m[1] * p.x + m[3] * p.y + m[5] });
const maxScale = (m: Affine) => Math.max(Math.hypot(m[0], m[1]), Math.hypot(m[2], m[3]));

/** Parse an SVG transform list (matrix, translate, scale, rotate, skewX, skewY; SVG 1.1 §7.6). Throws on anything else. */
export function parseTransform(s: string): Affine {
  let m = I;
  const re = /([a-zA-Z]+)\s*\(([^)]*)\)/g;
  let rest = s.trim();
  for (let g = re.exec(s); g; g = re.exec(s)) {
    rest = rest.replace(g[0], '');
    const v = (g[2].match(/[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/g) ?? []).map(Number);
    const rad = (d: number) => (d * Math.PI) / 180;
    let t: Affine;
    switch (g[1]) {
      case 'matrix': if (v.length !== 6) throw new Error(`matrix needs 6 numbers: "${g[0]}"`); t = v as Affine; break;
      case 'translate': t = [1, 0, 0, 1, v[0] ?? 0, v[1] ?? 0]; break;
      case 'scale': t = [v[0] ?? 1, 0, 0, v[1] ?? v[0] ?? 1, 0, 0]; break;
      case 'rotate': {
        const a = rad(v[0] ?? 0), cx = v[1] ?? 0, cy = v[2] ?? 0;
        t = mul(mul([1, 0, 0, 1, cx, cy], [Math.cos(a), Math.sin(a), -Math.sin(a), Math.cos(a), 0, 0]), [1, 0, 0, 1, -cx, -cy]);
        break;
      }
      case 'skewX': t = [1, 0, Math.tan(rad(v[0] ?? 0)), 1, 0, 0]; break;
      case 'skewY': t = [1, Math.tan(rad(v[0] ?? 0)), 0, 1, 0, 0]; break;
      default: throw new Error(`unknown transform "${g[1]}"`);
    }
    m = mul(m, t);
  }
  if (rest.replace(/[\s,]/g, '')) throw new Error(`unreadable transform "${s}"`);
  return m;
}

/** A flattened subpath in the caller's frame. */
interface Sub { points: Point[]; closed: boolean }

/**
 * Flatten SVG path data (every command of SVG 1.1 §8.3: M L H V C S Q T A Z, absolute and relative) through
 * `m`, curves within `tolMm` measured after the transform (`m` maps to millimetres). Throws on bad data.
 */
export function flattenPathData(d: string, m: Affine, tolMm: number): Sub[] {
  const tokens = d.match(/[MmLlHhVvCcSsQqTtAaZz]|[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/g) ?? [];
  if (d.replace(/[MmLlHhVvCcSsQqTtAaZz\s,]|[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/g, '').length) throw new Error('path data holds characters that are not commands or numbers');
  const subs: Sub[] = [];
  let cur: Sub | null = null;
  let i = 0;
  let cmd = '';
  let p = { x: 0, y: 0 }, start = { x: 0, y: 0 };
  let lastC: Point | null = null, lastQ: Point | null = null;
  const isCmd = (t: string) => /^[A-Za-z]$/.test(t);
  const num = () => {
    const t = tokens[i++];
    if (t === undefined || isCmd(t)) throw new Error(`command ${cmd} is missing a number`);
    return Number(t);
  };
  const flag = () => {
    // Arc flags may be written without separators ("011"): take one digit.
    const t = tokens[i];
    if (t === undefined || isCmd(t)) throw new Error('arc is missing a flag');
    if (t.length > 1 && (t[0] === '0' || t[0] === '1') && !t.startsWith('0.') ) { tokens[i] = t.slice(1); return t[0] === '1'; }
    i++;
    if (t !== '0' && t !== '1') throw new Error(`arc flag must be 0 or 1, not ${t}`);
    return t === '1';
  };
  const push = (q: Point) => cur!.points.push(apply(m, q));
  const cubic = (c1: Point, c2: Point, q: Point) => {
    const pts = cubicBezierFlatten(apply(m, p), apply(m, c1), apply(m, c2), apply(m, q), tolMm);
    cur!.points.push(...pts.slice(1));
  };
  while (i < tokens.length) {
    if (isCmd(tokens[i])) cmd = tokens[i++];
    else if (!cmd) throw new Error('path data must start with M');
    const rel = cmd === cmd.toLowerCase();
    const o = rel ? p : { x: 0, y: 0 };
    const C = cmd.toUpperCase();
    if (C !== 'M' && !cur) throw new Error('path data must start with M');
    switch (C) {
      case 'M': {
        p = { x: o.x + num(), y: o.y + num() };
        start = p;
        cur = { points: [apply(m, p)], closed: false };
        subs.push(cur);
        cmd = rel ? 'l' : 'L';
        lastC = lastQ = null;
        continue;
      }
      case 'Z':
        cur!.closed = true;
        p = start;
        lastC = lastQ = null;
        cur = { points: [apply(m, p)], closed: false };
        subs.push(cur);
        cmd = '';
        continue;
      case 'L': p = { x: o.x + num(), y: o.y + num() }; push(p); lastC = lastQ = null; break;
      case 'H': p = { x: o.x + num(), y: p.y }; push(p); lastC = lastQ = null; break;
      case 'V': p = { x: p.x, y: o.y + num() }; push(p); lastC = lastQ = null; break;
      case 'C': case 'S': {
        const c1 = C === 'C' ? { x: o.x + num(), y: o.y + num() } : lastC ? { x: 2 * p.x - lastC.x, y: 2 * p.y - lastC.y } : p;
        const c2 = { x: o.x + num(), y: o.y + num() };
        const q = { x: o.x + num(), y: o.y + num() };
        cubic(c1, c2, q);
        p = q; lastC = c2; lastQ = null;
        break;
      }
      case 'Q': case 'T': {
        const c: Point = C === 'Q' ? { x: o.x + num(), y: o.y + num() } : lastQ ? { x: 2 * p.x - lastQ.x, y: 2 * p.y - lastQ.y } : p;
        const q = { x: o.x + num(), y: o.y + num() };
        cubic({ x: p.x + (2 / 3) * (c.x - p.x), y: p.y + (2 / 3) * (c.y - p.y) }, { x: q.x + (2 / 3) * (c.x - q.x), y: q.y + (2 / 3) * (c.y - q.y) }, q);
        p = q; lastQ = c; lastC = null;
        break;
      }
      case 'A': {
        const rx = num(), ry = num(), phi = num(), large = flag(), sweep = flag();
        const q = { x: o.x + num(), y: o.y + num() };
        for (const pt of arcToPoints(p, q, rx, ry, phi, large, sweep, tolMm / maxScale(m)).slice(1)) push(pt);
        p = q; lastC = lastQ = null;
        break;
      }
      default: throw new Error(`unknown path command ${cmd}`);
    }
  }
  return subs.filter((s) => s.points.length >= 2);
}

/**
 * Elliptical arc from endpoint to centre parameters (SVG 1.1 Implementation Notes F.6.5, with radii scaled up
 * per F.6.6), sampled on the ellipse so every chord is within `tol` (user units) of the arc.
 */
export function arcToPoints(p1: Point, p2: Point, rxIn: number, ryIn: number, phiDeg: number, large: boolean, sweep: boolean, tol: number): Point[] {
  let rx = Math.abs(rxIn), ry = Math.abs(ryIn);
  if (rx === 0 || ry === 0 || (p1.x === p2.x && p1.y === p2.y)) return [p1, p2];
  const phi = (phiDeg * Math.PI) / 180, cs = Math.cos(phi), sn = Math.sin(phi);
  const dx = (p1.x - p2.x) / 2, dy = (p1.y - p2.y) / 2;
  const x1 = cs * dx + sn * dy, y1 = -sn * dx + cs * dy;
  const lambda = (x1 * x1) / (rx * rx) + (y1 * y1) / (ry * ry);
  if (lambda > 1) { rx *= Math.sqrt(lambda); ry *= Math.sqrt(lambda); }
  const num = rx * rx * ry * ry - rx * rx * y1 * y1 - ry * ry * x1 * x1;
  const den = rx * rx * y1 * y1 + ry * ry * x1 * x1;
  const k = (large === sweep ? -1 : 1) * Math.sqrt(Math.max(0, num / den));
  const cx1 = (k * rx * y1) / ry, cy1 = (-k * ry * x1) / rx;
  const cx = cs * cx1 - sn * cy1 + (p1.x + p2.x) / 2, cy = sn * cx1 + cs * cy1 + (p1.y + p2.y) / 2;
  const ang = (ux: number, uy: number, vx: number, vy: number) => Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
  const t1 = ang(1, 0, (x1 - cx1) / rx, (y1 - cy1) / ry);
  let dt = ang((x1 - cx1) / rx, (y1 - cy1) / ry, (-x1 - cx1) / rx, (-y1 - cy1) / ry);
  if (!sweep && dt > 0) dt -= 2 * Math.PI;
  if (sweep && dt < 0) dt += 2 * Math.PI;
  const r = Math.max(rx, ry);
  const step = r > tol ? 2 * Math.acos(1 - tol / r) : Math.PI / 2;
  const n = Math.max(1, Math.ceil(Math.abs(dt) / step));
  const out: Point[] = [];
  for (let j = 0; j <= n; j++) {
    const t = t1 + (dt * j) / n;
    out.push(j === n ? p2 : { x: cx + rx * Math.cos(t) * cs - ry * Math.sin(t) * sn, y: cy + rx * Math.cos(t) * sn + ry * Math.sin(t) * cs });
  }
  return out;
}

/** A length with its unit (SVG 1.1 §7.10) in mm; px at 96 per inch. Undefined for %, em or nothing. */
function lengthMm(v: string | undefined): number | undefined {
  const m = v ? /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(mm|cm|in|px|pt|pc)?\s*$/.exec(v) : null;
  if (!m) return undefined;
  const f = { mm: 1, cm: 10, in: 25.4, px: 25.4 / 96, pt: 25.4 / 72, pc: 25.4 / 6 }[m[2] ?? 'px']!;
  return Number(m[1]) * f;
}

function attrs(s: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const m of s.matchAll(/([\w:-]+)\s*=\s*(?:"([^"]*)"|'([^']*)')/g)) out[m[1]] = m[2] ?? m[3] ?? '';
  return out;
}

const nums = (s: string) => (s.match(/[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/g) ?? []).map(Number);

/**
 * Read pattern pieces from SVG text: every closed subpath of `<path>`, `<polygon>`, `<rect>`, `<circle>` and
 * `<ellipse>` is a piece (if any path has class "sew", as Seamrun writes, only those are pieces and class "grain"
 * paths are grain lines). Group and element transforms apply. Scale to mm from the root width/height and
 * viewBox (mm, cm, in, pt, pc, px at 96/in); with no width or height the view box units are unknown and
 * `options.units` must give them. Output is y up (SVG's y is flipped). Open subpaths that do not return to their
 * start within {@link IMPORT_ENDPOINT_TOLERANCE_MM} are problems, as are unreadable elements.
 */
export function readSvgPattern(text: string, options: PatternReadOptions = {}): PatternImportResult {
  const problems: ImportProblem[] = [];
  const src = text.replace(/<!--[\s\S]*?-->/g, '').replace(/<!\[CDATA\[[\s\S]*?\]\]>/g, '').replace(/<\?[\s\S]*?\?>/g, '').replace(/<!DOCTYPE[^>]*>/gi, '');
  const rootTag = /<svg\b([^>]*)>/i.exec(src);
  if (!rootTag) return { pieces: [], problems: [{ entity: 'file', reason: 'not an SVG file: no <svg> element' }], units: 'unknown', unitsFrom: 'none' };
  const root = attrs(rootTag[1]);
  const vb = root.viewBox ? nums(root.viewBox) : [];
  const wMm = lengthMm(root.width), hMm = lengthMm(root.height);
  let scale: number | undefined;
  let units: PatternImportResult['units'] = 'unknown';
  let unitsFrom: PatternImportResult['unitsFrom'] = 'none';
  if (wMm !== undefined || hMm !== undefined) {
    const sx = wMm !== undefined && vb.length === 4 && vb[2] > 0 ? wMm / vb[2] : undefined;
    const sy = hMm !== undefined && vb.length === 4 && vb[3] > 0 ? hMm / vb[3] : undefined;
    // preserveAspectRatio's default (xMidYMid meet) scales both axes by the smaller factor.
    scale = vb.length === 4 ? Math.min(sx ?? Infinity, sy ?? Infinity) : /px|^\s*[\d.]+\s*$/.test(root.width ?? root.height ?? '') ? 25.4 / 96 : lengthMm('1' + (/(mm|cm|in|pt|pc)\s*$/.exec(root.width ?? root.height ?? '')?.[1] ?? 'px'));
    units = /in\s*$/.test(root.width ?? '') ? 'in' : /cm\s*$/.test(root.width ?? '') ? 'cm' : 'mm';
    unitsFrom = 'file';
  }
  if (scale === undefined || !Number.isFinite(scale)) {
    if (!options.units) return { pieces: [], problems: [{ entity: 'file', reason: 'the file does not say its size (width/height with units); give the view box units as mm, cm or in' }], units: 'unknown', unitsFrom: 'none' };
    scale = MM_PER_UNIT[options.units as PatternUnit];
    units = options.units;
    unitsFrom = 'caller';
  }
  const origin = root['data-seamrun-origin'] ? nums(root['data-seamrun-origin']) : [];
  // View box to mm, then flip y (SVG is y down; pieces are y up). Seamrun's own files carry their origin.
  const vx = vb.length === 4 ? vb[0] : 0, vy = vb.length === 4 ? vb[1] : 0;
  const toMm: Affine = origin.length === 2
    ? [scale, 0, 0, -scale, origin[0] - scale * vx, origin[1] + scale * vy]
    : [scale, 0, 0, -scale, -scale * vx, scale * vy];
  const tolMm = options.chordToleranceMm ?? IMPORT_CHORD_TOLERANCE_MM;

  const stack: Affine[] = [toMm];
  const shapes: { subs: Sub[]; cls: string; name?: string; size?: string; what: string }[] = [];
  let count = 0;
  for (const t of src.matchAll(/<(\/?)([\w:-]+)([^>]*?)(\/?)>/g)) {
    const [, close, tagRaw, rest, selfClose] = t;
    const tag = tagRaw.replace(/^svg:/, '');
    if (close) { if (tag === 'g' || tag === 'svg' || tag === 'a') stack.pop(); continue; }
    const a = attrs(rest);
    const what = `<${tag}>${a.id ? ` id="${a.id}"` : ''} #${++count}`;
    let m = stack[stack.length - 1];
    try {
      if (a.transform && tag !== 'svg') m = mul(m, parseTransform(a.transform));
    } catch (e) {
      problems.push({ entity: what, reason: (e as Error).message });
      if ((tag === 'g' || tag === 'a') && !selfClose) stack.push(m);
      continue;
    }
    if ((tag === 'g' || tag === 'a') && !selfClose) { stack.push(m); continue; }
    if (tag === 'svg') { if (!selfClose && t.index !== rootTag.index) stack.push(m); continue; }
    const tol = tolMm;
    let subs: Sub[] = [];
    try {
      switch (tag) {
        case 'path': subs = flattenPathData(a.d ?? '', m, tol); break;
        case 'polygon': case 'polyline': {
          const v = nums(a.points ?? '');
          if (v.length < 4 || v.length % 2) throw new Error('points must be pairs of numbers');
          subs = [{ points: Array.from({ length: v.length / 2 }, (_, k) => apply(m, { x: v[2 * k], y: v[2 * k + 1] })), closed: tag === 'polygon' }];
          break;
        }
        case 'line':
          subs = [{ points: [apply(m, { x: +(a.x1 ?? 0), y: +(a.y1 ?? 0) }), apply(m, { x: +(a.x2 ?? 0), y: +(a.y2 ?? 0) })], closed: false }];
          break;
        case 'rect': {
          const x = +(a.x ?? 0), y = +(a.y ?? 0), w = +(a.width ?? NaN), h = +(a.height ?? NaN);
          if (!(w > 0 && h > 0)) throw new Error('rect needs a positive width and height');
          if (a.rx || a.ry) throw new Error('rounded rect corners are not read');
          subs = [{ points: [{ x, y }, { x: x + w, y }, { x: x + w, y: y + h }, { x, y: y + h }].map((q) => apply(m, q)), closed: true }];
          break;
        }
        case 'circle': case 'ellipse': {
          const cx = +(a.cx ?? 0), cy = +(a.cy ?? 0);
          const rx = tag === 'circle' ? +(a.r ?? NaN) : +(a.rx ?? NaN), ry = tag === 'circle' ? rx : +(a.ry ?? NaN);
          if (!(rx > 0 && ry > 0)) throw new Error(`${tag} needs a positive radius`);
          const pts = [
            ...arcToPoints({ x: cx + rx, y: cy }, { x: cx - rx, y: cy }, rx, ry, 0, false, true, tol / maxScale(m)),
            ...arcToPoints({ x: cx - rx, y: cy }, { x: cx + rx, y: cy }, rx, ry, 0, false, true, tol / maxScale(m)).slice(1, -1),
          ];
          subs = [{ points: pts.map((q) => apply(m, q)), closed: true }];
          break;
        }
        case 'use': case 'image':
          throw new Error(`<${tag}> elements are not read; draw the piece as a path`);
        default:
          continue;
      }
    } catch (e) {
      problems.push({ entity: what, reason: (e as Error).message });
      continue;
    }
    shapes.push({ subs, cls: a.class ?? '', name: a['data-piece-id'] ?? a['inkscape:label'] ?? a.id, size: a['data-size'] || undefined, what });
  }
  const hasSew = shapes.some((s) => /\bsew\b/.test(s.cls));
  const grains = shapes.filter((s) => /\bgrain\b/.test(s.cls));
  const pieces: ImportedPiece[] = [];
  for (const s of shapes) {
    if (hasSew ? !/\bsew\b/.test(s.cls) : /\bmark\b/.test(s.cls)) continue;
    for (const sub of s.subs) {
      const first = sub.points[0], last = sub.points[sub.points.length - 1];
      const closes = sub.closed || (sub.points.length > 2 && Math.hypot(first.x - last.x, first.y - last.y) <= IMPORT_ENDPOINT_TOLERANCE_MM);
      if (!closes) {
        if (!hasSew) problems.push({ entity: s.what, reason: `an open line, its ends ${Math.hypot(first.x - last.x, first.y - last.y).toFixed(2)} mm apart, is not a piece outline` });
        continue;
      }
      if (sub.points.length < 3) continue;
      const piece = finishPiece({ name: s.name ?? `Piece ${pieces.length + 1}`, ...(s.size ? { size: s.size } : {}), outline: sub.points });
      const g = grains.find((gr) => gr.subs[0] && inside(piece.outline, gr.subs[0].points[0]));
      if (g) piece.grainLine = { from: g.subs[0].points[0], to: g.subs[0].points[g.subs[0].points.length - 1] };
      pieces.push(piece);
    }
  }
  if (pieces.length === 0 && problems.length === 0) problems.push({ entity: 'file', reason: 'no closed piece outline found' });
  return { pieces, problems, units, unitsFrom };
}

function inside(ring: Point[], p: Point): boolean {
  let c = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const a = ring[i], b = ring[j];
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) c = !c;
  }
  return c;
}
