import { cubicBezierFlatten, quadraticBezierFlatten } from '@shared/geometry/bezier';
import { polygonBBox, polygonSignedArea } from '@shared/geometry/polygon';
import type { Point, Polygon } from '@shared/geometry/types';
import type { GradedPiece, Piece } from '@grading';

/** Options for {@link pieceToSvg}. `cutting` supplies each piece's cutting line (e.g. grading's cuttingOutline). */
export interface PieceSvgOptions {
  cutting?: (piece: Piece) => Polygon;
  marginMm?: number;
  /** Size label per piece (graded sets label each size). */
  label?: boolean;
}

const f = (n: number) => String(Math.round(n * 1000) / 1000);
const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/**
 * SVG of a piece, or of a graded set (every size's sewing line nested, base size labelled), at 1:1 in mm:
 * `width="…mm" height="…mm"` with a viewBox in mm. The piece frame is y-up, SVG is y-down: an SVG point is
 * (x − minX + margin, maxY + margin − y), and the root carries `data-seamrun-origin` so {@link svgToPiece} can
 * undo it exactly. Sewing lines are dashed paths with class "sew" and data-piece-id/data-size; cutting lines
 * solid (class "cut"). Coordinates are rounded to 0.001 mm. Pieces with empty outlines are skipped.
 */
export function pieceToSvg(subject: Piece | GradedPiece, options: PieceSvgOptions = {}): string {
  const items = 'bySize' in subject ? subject.sizes.map((s) => ({ size: s, piece: subject.bySize[s] })) : [{ size: '', piece: subject }];
  const baseSize = 'bySize' in subject ? subject.baseSize : '';
  const margin = options.marginMm ?? 10;
  const rings = items.flatMap(({ piece }) => [piece.outline, options.cutting?.(piece) ?? []]).filter((r) => r.length);
  const box = polygonBBox(rings.flat());
  if (!Number.isFinite(box.minX)) return '<svg xmlns="http://www.w3.org/2000/svg" width="0mm" height="0mm" viewBox="0 0 0 0"></svg>';
  const ox = box.minX - margin, oy = box.maxY + margin;
  const T = (p: Point) => `${f(p.x - ox)},${f(oy - p.y)}`;
  const w = box.maxX - box.minX + 2 * margin, h = box.maxY - box.minY + 2 * margin;
  const body = items.map(({ size, piece }) => pieceGroup(piece, size, size === baseSize || !baseSize, T, options));
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(w)}mm" height="${f(h)}mm" viewBox="0 0 ${f(w)} ${f(h)}" data-seamrun-origin="${f(ox)} ${f(oy)}">`,
    '<style>.cut{fill:none;stroke:#000;stroke-width:0.3}.sew{fill:none;stroke:#555;stroke-width:0.25;stroke-dasharray:2 1}',
    '.mark{fill:none;stroke:#000;stroke-width:0.3}.label{font:4px sans-serif}</style>',
    ...body,
    '</svg>',
  ].join('\n');
}

function pieceGroup(piece: Piece, size: string, isLabelled: boolean, T: (p: Point) => string, o: PieceSvgOptions): string {
  const ring = (r: Polygon) => `M${r.map(T).join(' L')} Z`;
  const out = [`<g data-piece-id="${esc(piece.id)}"${size ? ` data-size="${esc(size)}"` : ''}>`];
  const cut = o.cutting?.(piece) ?? [];
  if (cut.length) out.push(`<path class="cut" d="${ring(cut)}"/>`);
  out.push(`<path class="sew" data-piece-id="${esc(piece.id)}" data-size="${esc(size)}" d="${ring(piece.outline)}"/>`);
  if (isLabelled) {
    out.push(`<path class="mark grain" d="M${T(piece.grainLine.from)} L${T(piece.grainLine.to)}"/>`);
    for (const i of piece.notches) out.push(`<path class="mark notch" d="${notchPath(piece.outline, i, T)}"/>`);
    for (const d of piece.drillHoles) {
      const [x, y] = T(d).split(',');
      out.push(`<circle class="mark drill" cx="${x}" cy="${y}" r="1.5"/>`);
    }
    for (const l of piece.internalLines) out.push(`<path class="mark ${l.kind}" data-name="${esc(l.name)}" d="M${l.points.map(T).join(' L')}"/>`);
    const mid = { x: (piece.grainLine.from.x + piece.grainLine.to.x) / 2 + 5, y: (piece.grainLine.from.y + piece.grainLine.to.y) / 2 };
    const [x, y] = T(mid).split(',');
    const text = `${piece.name}${size ? ` ${size}` : ''} — ${piece.cut === 'pair' ? 'cut pair' : piece.cut === 'fold' ? 'cut on fold' : 'cut 1'} ×${piece.quantity}`;
    if (o.label !== false) out.push(`<text class="label" x="${x}" y="${y}">${esc(text)}</text>`);
  }
  out.push('</g>');
  return out.join('\n');
}

/** A 5 mm notch pointing out of the outline at vertex i (outward normal of the averaged neighbours). */
function notchPath(ring: Polygon, i: number, T: (p: Point) => string): string {
  const n = ring.length;
  const a = ring[(i - 1 + n) % n], b = ring[(i + 1) % n], p = ring[i];
  const dx = b.x - a.x, dy = b.y - a.y, l = Math.hypot(dx, dy) || 1;
  return `M${T(p)} L${T({ x: p.x + (dy / l) * 5, y: p.y - (dx / l) * 5 })}`;
}

/** Options for {@link svgToPiece}. */
export interface SvgImportOptions {
  id?: string;
  name?: string;
  seamAllowanceMm?: number;
  toleranceMm?: number;
}

const UNIT_MM: Record<string, number> = { mm: 1, cm: 10, in: 25.4, px: 25.4 / 96, pt: 25.4 / 72 };

/**
 * Import a piece outline from SVG: the first `<path class="sew">`, else the first `<polygon>`, else the first
 * `<path>`. Supports M L H V C Q Z (absolute and relative); curves are flattened within `toleranceMm`. Units: the
 * root's width and viewBox give the scale to mm (unitless width = px at 96 dpi; no width = viewBox units are mm).
 * SVG y-down becomes y-up (using data-seamrun-origin when present). The outline is made counter-clockwise with one
 * edge 'outline'. Returns null when no usable shape (fewer than 3 points) is found.
 */
export function svgToPiece(svg: string, options: SvgImportOptions = {}): Piece | null {
  const scale = svgScale(svg);
  const d = /<path[^>]*class="sew"[^>]*\sd="([^"]+)"/.exec(svg)?.[1];
  const poly = /<polygon[^>]*\spoints="([^"]+)"/.exec(svg)?.[1];
  const anyPath = /<path[^>]*\sd="([^"]+)"/.exec(svg)?.[1];
  let pts: Point[] = d ? parsePathD(d, options.toleranceMm ?? 0.25) : poly ? parseNumbers(poly).reduce<Point[]>((acc, v, i, arr) => (i % 2 ? acc : [...acc, { x: v, y: arr[i + 1] }]), []) : anyPath ? parsePathD(anyPath, options.toleranceMm ?? 0.25) : [];
  if (pts.length > 1 && Math.hypot(pts[0].x - pts[pts.length - 1].x, pts[0].y - pts[pts.length - 1].y) < 1e-9) pts = pts.slice(0, -1);
  if (pts.length < 3) return null;
  const origin = /data-seamrun-origin="([^"]+)"/.exec(svg)?.[1];
  const [ox, oy] = origin ? parseNumbers(origin) : [0, 0];
  let outline = pts.map((p) => ({ x: p.x * scale + ox, y: oy - p.y * scale }));
  if (polygonSignedArea(outline) < 0) outline = outline.reverse();
  const box = polygonBBox(outline);
  const cx = (box.minX + box.maxX) / 2;
  return {
    id: options.id ?? /data-piece-id="([^"]+)"/.exec(svg)?.[1] ?? 'imported', name: options.name ?? 'Imported piece', role: 'imported',
    outline, edges: [{ name: 'outline', from: 0, to: 0, allowanceMm: options.seamAllowanceMm ?? 10 }],
    grainLine: { from: { x: cx, y: box.minY + (box.maxY - box.minY) * 0.2 }, to: { x: cx, y: box.minY + (box.maxY - box.minY) * 0.8 } },
    notches: [], drillHoles: [], internalLines: [], cut: 'cut1', quantity: 1, landmarks: {}, curveToleranceMm: options.toleranceMm ?? 0.25,
  };
}

function svgScale(svg: string): number {
  const root = /<svg[^>]*>/.exec(svg)?.[0] ?? '';
  const width = /\swidth="([\d.]+)([a-z]*)"/.exec(root);
  const vb = /viewBox="([^"]+)"/.exec(root);
  if (!width || !vb) return 1;
  const vbw = parseNumbers(vb[1])[2];
  return vbw > 0 ? (Number(width[1]) * (UNIT_MM[width[2] || 'px'] ?? 1)) / vbw : 1;
}

function parseNumbers(s: string): number[] {
  return (s.match(/-?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?/gi) ?? []).map(Number);
}

function parsePathD(d: string, tol: number): Point[] {
  const tokens = d.match(/[a-zA-Z]|-?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?/g) ?? [];
  const pts: Point[] = [];
  let cur = { x: 0, y: 0 }, start = cur, cmd = '', i = 0;
  const num = () => Number(tokens[i++]);
  while (i < tokens.length) {
    if (/[a-zA-Z]/.test(tokens[i])) cmd = tokens[i++];
    const rel = cmd === cmd.toLowerCase();
    const pt = (): Point => { const x = num(), y = num(); return rel ? { x: cur.x + x, y: cur.y + y } : { x, y }; };
    switch (cmd.toUpperCase()) {
      case 'M': cur = pt(); start = cur; pts.push(cur); cmd = rel ? 'l' : 'L'; break;
      case 'L': cur = pt(); pts.push(cur); break;
      case 'H': cur = { x: rel ? cur.x + num() : num(), y: cur.y }; pts.push(cur); break;
      case 'V': cur = { x: cur.x, y: rel ? cur.y + num() : num() }; pts.push(cur); break;
      case 'C': { const c1 = pt(), c2 = pt(), e = pt(); pts.push(...cubicBezierFlatten(cur, c1, c2, e, tol).slice(1)); cur = e; break; }
      case 'Q': { const c = pt(), e = pt(); pts.push(...quadraticBezierFlatten(cur, c, e, tol).slice(1)); cur = e; break; }
      case 'Z': cur = start; if (i < tokens.length && !/[a-zA-Z]/.test(tokens[i])) i++; return pts;
      default: return pts;
    }
  }
  return pts;
}
