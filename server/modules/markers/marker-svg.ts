import { polygonMirrorX, polygonRotate, polygonTranslate } from '@shared/geometry/polygon';
import type { MarkerDrawingDto } from '../../../shared/schemas/markers';

/** Seamrun palette, one colour per size in run order (thread teal, madder, saffron, indigo, calico-ink…). */
export const SIZE_COLOURS = ['#0F766E', '#B4413C', '#C98A16', '#3F51A3', '#6B5B45', '#2F855A', '#8E3B7A', '#4A5568'];

const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const f = (n: number) => (Math.round(n * 100) / 100).toString();

/**
 * The marker as an SVG document in millimetres (1 user unit = 1 mm, so it prints to scale): the fabric
 * strip, then every placed piece as a closed path coloured by size and labelled "size piece-name".
 * The y axis is flipped so the drawing matches the engine's y-up frame.
 */
export function markerSvg(drawing: MarkerDrawingDto, opts: { lengthMm: number; widthMm: number; sizes: string[]; title: string }): string {
  const { lengthMm: L, widthMm: W } = opts;
  const parts: string[] = [];
  parts.push(`<?xml version="1.0" encoding="UTF-8"?>`);
  parts.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(L)}mm" height="${f(W)}mm" viewBox="0 0 ${f(L)} ${f(W)}">`,
    `<title>${esc(opts.title)}</title>`,
    `<rect x="0" y="0" width="${f(L)}" height="${f(W)}" fill="#FBF8F2" stroke="#1A1A1A" stroke-width="1"/>`,
    `<g transform="matrix(1 0 0 -1 0 ${f(W)})">`,
  );
  for (const p of drawing.placements) {
    const base = drawing.outlines[p.pieceKey] ?? [];
    const ring = polygonTranslate(polygonRotate(p.mirrored ? polygonMirrorX(base) : base, p.rotation), p.x, p.y);
    if (ring.length < 3) continue;
    const colour = SIZE_COLOURS[Math.max(0, opts.sizes.indexOf(p.size)) % SIZE_COLOURS.length];
    const d = `M${ring.map((q) => `${f(q.x)} ${f(q.y)}`).join(' L')} Z`;
    const cx = ring.reduce((a, q) => a + q.x, 0) / ring.length;
    const cy = ring.reduce((a, q) => a + q.y, 0) / ring.length;
    const label = `${p.size} ${p.pieceName}`;
    parts.push(
      `<g class="piece" data-size="${esc(p.size)}" data-piece="${esc(p.pieceKey)}" data-copy="${p.copy}">`,
      `<path d="${d}" fill="${colour}" fill-opacity="0.25" stroke="${colour}" stroke-width="1.2"/>`,
      `<text transform="matrix(1 0 0 -1 ${f(cx)} ${f(cy)})" font-family="sans-serif" font-size="18" text-anchor="middle" fill="#1A1A1A">${esc(label)}</text>`,
      `</g>`,
    );
  }
  parts.push(`</g>`, `</svg>`);
  return parts.join('\n');
}
