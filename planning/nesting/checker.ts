import polygonClipping, { type MultiPolygon, type Ring } from 'polygon-clipping';
import { polygonArea, polygonBBox, polygonMirrorX, polygonRotate, polygonSignedArea, polygonTranslate } from '@shared/geometry/polygon';
import type { BBox, Polygon } from '@shared/geometry/types';
import { openRing } from './clipper-path';
import type { NestingInput, NestingPlacement } from './types';

/** Outcome of `checkLayout`: valid when `errors` is empty. */
export interface LayoutCheck {
  valid: boolean;
  errors: string[];
  /** Largest pairwise overlap area ÷ the smaller piece area (0 when nothing overlaps). */
  maxOverlapRatio: number;
}

/** Tolerances of `checkLayout`. */
export interface LayoutCheckOptions {
  /** A pair fails when overlap area ≥ this × the smaller piece's area. Default 1e-6. */
  overlapRatio?: number;
  /** Allowed overshoot past the strip edges, default 1e-6 × max(width, length). */
  boundaryTolerance?: number;
}

function normalise(deg: number): number {
  return ((deg % 360) + 360) % 360;
}

function ringArea(ring: Ring): number {
  return Math.abs(polygonSignedArea(ring.map(([x, y]) => ({ x, y }))));
}

function multiArea(mp: MultiPolygon): number {
  let a = 0;
  for (const poly of mp) poly.forEach((ring, k) => (a += k === 0 ? ringArea(ring) : -ringArea(ring)));
  return a;
}

/** Placed outline: mirror (x → −x) if asked, rotate about the piece origin, translate. */
function placedOutline(ring: Polygon, p: NestingPlacement): Polygon {
  const base = p.mirrored ? polygonMirrorX(ring) : ring;
  return polygonTranslate(polygonRotate(base, p.rotation), p.x, p.y);
}

function boxesOverlap(a: BBox, b: BBox): boolean {
  return a.minX < b.maxX && b.minX < a.maxX && a.minY < b.maxY && b.minY < a.maxY;
}

/**
 * Independent validity check of a marker, sharing no code with the engine's collision search:
 * overlap areas come from polygon-clipping (Martinez–Rueda sweep on floats). Checks that every
 * copy (mirrored pieces: 2 × quantity, odd copies mirrored) is placed exactly once, with an allowed
 * rotation (1e-9° tolerance), inside [0, length] × [0, stripWidth] within `boundaryTolerance`,
 * and that no two placed outlines overlap by `overlapRatio` × the smaller area or more.
 * Touching outlines are valid. Messages name the piece id and copy.
 */
export function checkLayout(
  input: NestingInput,
  layout: { placements: NestingPlacement[]; length: number },
  options: LayoutCheckOptions = {},
): LayoutCheck {
  const errors: string[] = [];
  const width = input.stripWidth as number;
  const tol = options.boundaryTolerance ?? 1e-6 * Math.max(width, layout.length);
  const ratio = options.overlapRatio ?? 1e-6;
  const byId = new Map(input.pieces.map((p) => [p.id, p]));
  const seen = new Set<string>();
  const shapes: { label: string; ring: Polygon; box: BBox; area: number }[] = [];
  for (const pl of layout.placements) {
    const label = `${pl.pieceId}#${pl.copy}`;
    const piece = byId.get(pl.pieceId);
    const copies = piece ? (piece.mirrored ? 2 * piece.quantity : piece.quantity) : 0;
    if (!piece || !Number.isInteger(pl.copy) || pl.copy < 0 || pl.copy >= copies) {
      errors.push(`${label}: no such copy`);
      continue;
    }
    if (seen.has(label)) errors.push(`${label}: placed more than once`);
    seen.add(label);
    const mustMirror = piece.mirrored ? pl.copy % 2 === 1 : false;
    if (pl.mirrored !== mustMirror) errors.push(`${label}: mirrored must be ${mustMirror}`);
    const allowed = (piece.orientations ?? [0, 180]).map(normalise);
    const rot = normalise(pl.rotation);
    if (!allowed.some((a) => Math.min(Math.abs(a - rot), 360 - Math.abs(a - rot)) < 1e-9)) errors.push(`${label}: rotation ${pl.rotation} not allowed`);
    const ring = placedOutline(openRing(piece.polygon), pl);
    const box = polygonBBox(ring);
    if (box.minX < -tol || box.minY < -tol || box.maxX > layout.length + tol || box.maxY > width + tol) {
      errors.push(`${label}: outside the strip [0, ${layout.length}] × [0, ${width}]`);
    }
    shapes.push({ label, ring, box, area: polygonArea(ring) });
  }
  for (const piece of input.pieces) {
    const copies = piece.mirrored ? 2 * piece.quantity : piece.quantity;
    for (let c = 0; c < copies; c++) if (!seen.has(`${piece.id}#${c}`)) errors.push(`${piece.id}#${c}: not placed`);
  }
  let maxOverlapRatio = 0;
  const sorted = [...shapes].sort((a, b) => a.box.minX - b.box.minX);
  for (let i = 0; i < sorted.length; i++) {
    const a = sorted[i];
    for (let j = i + 1; j < sorted.length && sorted[j].box.minX < a.box.maxX; j++) {
      const b = sorted[j];
      if (!boxesOverlap(a.box, b.box)) continue;
      const inter = polygonClipping.intersection([a.ring.map((p) => [p.x, p.y] as [number, number])], [b.ring.map((p) => [p.x, p.y] as [number, number])]);
      const r = multiArea(inter) / Math.min(a.area, b.area);
      maxOverlapRatio = Math.max(maxOverlapRatio, r);
      if (r >= ratio) errors.push(`${a.label} overlaps ${b.label} (${(r * 100).toPrecision(3)} % of the smaller piece)`);
    }
  }
  return { valid: errors.length === 0, errors, maxOverlapRatio };
}
