import { importedPieceJson, type ImportedPiece, type PatternImportResult, type PatternUnit } from '@exports/import/index';
import { polygonArea, polygonBBox, polygonSignedArea } from '@shared/geometry/polygon';
import { polygonIsSimple } from '@shared/geometry/polyline';
import type { Point } from '@shared/geometry/types';
import { clipperOffset } from '../../../grading/pieces/clipper-adapter';
import type { Piece } from '@grading';
import type { PatternAcceptInput, PatternImportInput } from '../../../shared/schemas/grading';
import { badRequest } from '../../errors';

/** Largest pattern file accepted (DXF of a graded style with many sizes runs to a few MB). */
export const PATTERN_UPLOAD_LIMIT_BYTES = 20 * 1024 * 1024;

type XY = [number, number];
const r3 = (v: number) => Math.round(v * 1000) / 1000;
const pt = ([x, y]: XY): Point => ({ x, y });

/** One previewed piece: to-scale data for drawing and the figures the owner checks. */
export interface PatternPreviewPiece {
  name: string;
  size?: string;
  quantity?: number;
  material?: string;
  outline: XY[];
  grainLine?: { from: XY; to: XY };
  notches?: XY[];
  drillHoles?: XY[];
  areaMm2: number;
  perimeterMm: number;
  widthMm: number;
  heightMm: number;
}

export interface PatternPreview {
  units: string;
  outlineIs: 'sewing' | 'cutting';
  pieces: PatternPreviewPiece[];
}

function present(p: ImportedPiece): PatternPreviewPiece {
  const box = polygonBBox(p.outline);
  return { ...importedPieceJson(p), widthMm: r3(box.maxX - box.minX), heightMm: r3(box.maxY - box.minY) };
}

/**
 * Read an uploaded pattern file into a preview with `read` (the CPU pool's 'pattern-file' task in the server).
 * Any entity that could not be read, or unknown units, is a 400 listing each one (entity: reason); nothing is
 * kept on the server.
 */
export async function previewPatternFile(
  file: { buffer: Buffer; originalname: string } | undefined,
  input: PatternImportInput,
  read: (text: string, units?: PatternUnit) => Promise<PatternImportResult>,
): Promise<PatternPreview> {
  if (!file) throw badRequest('file: attach a DXF or SVG file', { file: 'Attach a DXF or SVG file' });
  const text = file.buffer.toString('utf8');
  if (text.includes('\u0000')) throw badRequest('file: binary DXF is not read; save the pattern as ASCII DXF or SVG', { file: 'Save the pattern as ASCII DXF or SVG' });
  const res = await read(text, input.units);
  if (res.units === 'unknown' && !res.pieces.length && res.problems.some((p) => /units|size/.test(p.reason))) {
    throw badRequest('units: the file does not say its units; choose mm, cm or in', { units: 'The file does not say its units: choose mm, cm or in' });
  }
  if (res.problems.length) {
    const fields = Object.fromEntries(res.problems.slice(0, 50).map((p) => [p.entity, p.reason]));
    const n = res.problems.length;
    throw badRequest(`${res.problems[0].entity}: ${res.problems[0].reason} (${n} problem${n > 1 ? 's' : ''}; nothing imported)`, fields);
  }
  return { units: res.units, outlineIs: input.outlineIs, pieces: res.pieces.map(present) };
}

const slug = (s: string) => s.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 40) || 'piece';

/**
 * Pieces to store from the accepted preview: counter-clockwise sewing lines (a cutting line given in the file is
 * offset inwards by the seam allowance), one outline edge with that allowance, notches on the nearest vertex,
 * the grain line from the file or, when the file has none, along the file's y axis through the piece's centre.
 * Every bad piece is a 400 naming it; nothing is built half. Ids avoid `takenIds` (pieces the style keeps).
 */
export function acceptedPieces(input: PatternAcceptInput, takenIds: readonly string[] = []): Piece[] {
  const fields: Record<string, string> = {};
  const used = new Set<string>(takenIds);
  const pieces = input.pieces.map((p, i): Piece | null => {
    let ring = p.outline.map(pt);
    if (polygonSignedArea(ring) < 0) ring = ring.reverse();
    if (!polygonIsSimple(ring) || polygonArea(ring) <= 0) { fields[`pieces.${i}.outline`] = 'The outline crosses itself or has no area'; return null; }
    if (input.outlineIs === 'cutting' && p.seamAllowanceMm > 0) {
      const inner = clipperOffset(ring, -p.seamAllowanceMm);
      if (inner.length !== 1) { fields[`pieces.${i}.seamAllowanceMm`] = 'The seam allowance is too wide for this piece'; return null; }
      ring = polygonSignedArea(inner[0]) < 0 ? inner[0].reverse() : inner[0];
    }
    let id = slug(p.name);
    for (let k = 2; used.has(id); k++) id = `${slug(p.name)}-${k}`;
    used.add(id);
    const box = polygonBBox(ring);
    const cx = (box.minX + box.maxX) / 2, h = box.maxY - box.minY;
    const nearest = (q: Point) => ring.reduce((best, v, k) => (Math.hypot(v.x - q.x, v.y - q.y) < Math.hypot(ring[best].x - q.x, ring[best].y - q.y) ? k : best), 0);
    return {
      id, role: 'imported', name: p.name, outline: ring,
      edges: [{ name: 'outline', from: 0, to: 0, allowanceMm: p.seamAllowanceMm }],
      grainLine: p.grainLine ? { from: pt(p.grainLine.from), to: pt(p.grainLine.to) } : { from: { x: cx, y: box.minY + 0.1 * h }, to: { x: cx, y: box.maxY - 0.1 * h } },
      notches: [...new Set((p.notches ?? []).map((n) => nearest(pt(n))))].sort((a, b) => a - b),
      drillHoles: (p.drillHoles ?? []).map(pt),
      internalLines: [], cut: p.cut, quantity: p.copies, ...(p.material ? { material: p.material } : {}),
      landmarks: {}, curveToleranceMm: 0.05,
    };
  });
  const keys = Object.keys(fields);
  if (keys.length) throw badRequest(`${keys[0]}: ${fields[keys[0]]} (nothing imported)`, fields);
  return pieces as Piece[];
}
