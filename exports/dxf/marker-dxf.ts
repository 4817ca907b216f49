import Drawing from 'dxf-writer';
import { polygonMirrorX, polygonRotate, polygonTranslate } from '@shared/geometry/polygon';
import type { Point } from '@shared/geometry/types';
import type { MarkerPlacementPlan } from '../types';

/** Layers of a whole-marker DXF for a plotter or cutting table. */
export const MARKER_DXF_LAYERS = { border: 'MARKER-EDGE', cut: 'CUT', grain: 'GRAIN', label: 'LABEL' } as const;

/** One placed copy of a piece in a finished marker: the same shape the plotter PDF draws. */
export type MarkerDxfPlacement = MarkerPlacementPlan;

export interface MarkerDxfInput {
  /** Cutting outlines per piece key in mm, turned so the grain runs along x (the fabric length). */
  outlines: Record<string, Point[]>;
  placements: MarkerDxfPlacement[];
  lengthMm: number;
  widthMm: number;
  /** Printed in the corner: batch, style, ratio, length × width. */
  title: string;
}

/** A placed copy's cutting outline in marker coordinates (mirror, then turn, then move: the engine's order). */
export function placedOutline(outline: Point[], p: Pick<MarkerDxfPlacement, 'rotation' | 'mirrored' | 'x' | 'y'>): Point[] {
  return polygonTranslate(polygonRotate(p.mirrored ? polygonMirrorX(outline) : outline, p.rotation), p.x, p.y);
}

/**
 * The whole marker as one DXF at 1:1 in millimetres ($INSUNITS = 4), for a plotter or a cutting table: the
 * fabric edge (length × cuttable width) on MARKER-EDGE, every placed piece's cutting line as a closed
 * LWPOLYLINE on CUT, a grain line through each piece along the fabric length on GRAIN (outlines come turned
 * so the grain runs along x; a half turn keeps it there), and "size piece-name" inside each piece on LABEL.
 * Text height scales with the piece so labels stay readable on small pieces.
 */
export function markerToDxf(input: MarkerDxfInput): string {
  const d = new Drawing();
  d.setUnits('Millimeters');
  d.addLayer(MARKER_DXF_LAYERS.border, Drawing.ACI.WHITE, 'CONTINUOUS');
  d.addLayer(MARKER_DXF_LAYERS.cut, Drawing.ACI.RED, 'CONTINUOUS');
  d.addLayer(MARKER_DXF_LAYERS.grain, Drawing.ACI.GREEN, 'CONTINUOUS');
  d.addLayer(MARKER_DXF_LAYERS.label, Drawing.ACI.CYAN, 'CONTINUOUS');
  const { lengthMm: L, widthMm: W } = input;
  d.setActiveLayer(MARKER_DXF_LAYERS.border).drawPolyline([[0, 0], [L, 0], [L, W], [0, W]], true);
  d.setActiveLayer(MARKER_DXF_LAYERS.label).drawText(10, -30, 20, 0, input.title);
  for (const p of input.placements) {
    const ring = placedOutline(input.outlines[p.pieceKey] ?? [], p);
    if (ring.length < 3) continue;
    d.setActiveLayer(MARKER_DXF_LAYERS.cut).drawPolyline(ring.map((q) => [q.x, q.y] as [number, number]), true);
    const xs = ring.map((q) => q.x), ys = ring.map((q) => q.y);
    const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
    const cy = (y0 + y1) / 2, cx = (x0 + x1) / 2, span = x1 - x0;
    d.setActiveLayer(MARKER_DXF_LAYERS.grain).drawLine(cx - span * 0.3, cy, cx + span * 0.3, cy);
    const height = Math.max(6, Math.min(25, (y1 - y0) / 8));
    d.setActiveLayer(MARKER_DXF_LAYERS.label).drawText(cx - span * 0.3, cy + height * 0.6, height, 0, `${p.size} ${p.pieceName}`);
  }
  return d.toDxfString();
}
