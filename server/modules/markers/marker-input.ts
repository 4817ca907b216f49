import { createHash } from 'node:crypto';
import { prepareMarkerPieces, type NestingInput, type Shrinkage } from '@planning';
import { polygonArea } from '@shared/geometry/polygon';
import { mm } from '@shared/units/units';
import { badRequest } from '../../errors';
import type { CuttingPiece } from '../grading/graded-pieces';

/** Clear distance kept between pieces (mm): room for the knife between neighbours (common practice). */
export const MARKER_GAP_MM = 2;
/** Seed of every product marker: same inputs, same marker. */
export const MARKER_SEED = 1;

/**
 * Utilisation assumed when a ratio has no stored marker: length ≈ piece area ÷ (width × 0.75). Common
 * practice for a first estimate of a mixed-size garment marker (no published figure is used); the owner
 * sees which lays rest on it and can build the real marker.
 */
export const ASSUMED_UTILISATION = 0.75;
/** Bounds on a utilisation learnt from stored markers, so one odd marker cannot make estimates absurd. */
const LEARNT_UTILISATION_RANGE = [0.4, 0.95] as const;

/**
 * The utilisation marker-length estimates assume: that of the style's own finished markers on this fabric
 * (their utilisations weighted by length, within 40–95 %), else `ASSUMED_UTILISATION`. A studio's real
 * markers of one garment are the best guide to its markers not built yet (common practice: a cutting room
 * estimates new markers from the efficiency of past markers of the same style).
 */
export function utilisationForEstimates(markers: readonly { lengthMm: number | null; utilisation: number | null }[]): { utilisation: number; markers: number } {
  let weight = 0, sum = 0, count = 0;
  for (const m of markers) {
    if (!m.lengthMm || !(m.lengthMm > 0) || !m.utilisation || !(m.utilisation > 0)) continue;
    weight += m.lengthMm;
    sum += m.utilisation * m.lengthMm;
    count++;
  }
  if (count === 0) return { utilisation: ASSUMED_UTILISATION, markers: 0 };
  const [lo, hi] = LEARNT_UTILISATION_RANGE;
  return { utilisation: Math.min(hi, Math.max(lo, sum / weight)), markers: count };
}

/** What the engine gets and what the marker view needs to draw and label each piece. */
export interface MarkerJobInput {
  engine: NestingInput;
  seed: number;
  seconds: number;
  /** Piece key ("M:front", "M:sleeve:pair") → size and piece name. */
  labels: Record<string, { size: string; name: string }>;
  /** Notches per piece key, in the engine's frame (jobs stored before notches were kept have none). */
  notches?: Record<string, { x: number; y: number }[]>;
}

/**
 * Engine input for a size ratio through planning's `prepareMarkerPieces`: outlines turned so the grain
 * runs along the fabric length (x), grown for the fabric's shrinkage along and across the grain,
 * quantities multiplied by the ratio (mirrored pieces count pairs), rotations 0° and 180° (0° only on
 * one-way or napped fabric, where a pair's other half is mirrored across the grain so it keeps the
 * fabric's direction), the fabric's cuttable width and a 2 mm gap.
 */
export function buildMarkerInput(
  pieces: Record<string, CuttingPiece[]>,
  ratio: Record<string, number>,
  opts: { widthMm: number; isDirectional: boolean; seconds: number; gapMm?: number; shrinkage?: Shrinkage },
): MarkerJobInput {
  const prepared = prepareMarkerPieces(pieces, ratio, { isDirectional: opts.isDirectional, shrinkage: opts.shrinkage });
  return {
    engine: { pieces: prepared.pieces, stripWidth: mm(opts.widthMm), gap: mm(opts.gapMm ?? MARKER_GAP_MM) },
    seed: MARKER_SEED,
    seconds: opts.seconds,
    labels: Object.fromEntries(Object.entries(prepared.labels).map(([k, l]) => [k, { size: l.size, name: l.name }])),
    ...(Object.keys(prepared.notches).length ? { notches: prepared.notches } : {}),
  };
}

/** A fabric's shrinkage per direction, as the marker core takes it. */
export const fabricShrinkage = (f: { shrinkageLengthPercent: number; shrinkageWidthPercent: number }): Shrinkage => ({
  lengthwisePercent: f.shrinkageLengthPercent,
  widthwisePercent: f.shrinkageWidthPercent,
});

/** SHA-256 of everything that decides the marker: pieces, quantities, width, orientations, gap, budget, seed. */
export function markerInputHash(job: MarkerJobInput): string {
  const canonical = JSON.stringify({
    pieces: job.engine.pieces.map((p) => [p.id, p.polygon.map((q) => [q.x, q.y]), p.quantity, p.orientations, p.mirrored]),
    width: job.engine.stripWidth,
    gap: job.engine.gap,
    seconds: job.seconds,
    seed: job.seed,
  });
  return createHash('sha256').update(canonical).digest('hex');
}

/** Area of one garment of each size (mm²), from its cutting pieces and their copies. */
export function garmentAreas(pieces: Record<string, CuttingPiece[]>): Record<string, number> {
  return Object.fromEntries(
    Object.entries(pieces).map(([size, list]) => [size, list.reduce((a, p) => a + polygonArea(p.outline) * p.quantity, 0)]),
  );
}

/**
 * The pieces cut from one fabric: those whose material the style links to it. A style that links no material
 * cuts every piece from any fabric (styles made before materials existed). A fabric no material links to is a
 * 400 on `fabricId` naming the fabrics the style does use.
 */
export function piecesOnFabric(
  pieces: Record<string, CuttingPiece[]>,
  materialFabrics: Record<string, number> | null,
  fabric: { id: number; name?: string },
): Record<string, CuttingPiece[]> {
  const links = Object.entries(materialFabrics ?? {});
  if (!links.length) return pieces;
  const materials = new Set(links.filter(([, id]) => id === fabric.id).map(([m]) => m));
  if (!materials.size) {
    const used = links.map(([m]) => m).join(', ');
    throw badRequest(`fabricId: no material of this style is cut from ${fabric.name ?? 'this fabric'} (link one on the style page; the style uses ${used})`, {
      fabricId: 'No material of this style is cut from this fabric',
    });
  }
  return Object.fromEntries(Object.entries(pieces).map(([size, list]) => [size, list.filter((p) => materials.has(p.material))]));
}
