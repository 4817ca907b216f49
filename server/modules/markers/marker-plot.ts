import { placedOutline } from '@exports/dxf/marker-dxf';
import type { MarkerPlotInput } from '@exports/types';
import { DEFAULT_SPLICE_OVERLAP_MM, markerSpliceZones } from '@planning';
import { mm } from '@shared/units/units';
import type { MarkerDrawingDto } from '../../../shared/schemas/markers';

/**
 * What the 1:1 plotter PDF needs from a finished marker: its drawing, the notches its job carried, the
 * splice zones its pieces leave for a join with the cutter's overlap (planning's `markerSpliceZones`,
 * 150 mm: the middle of the 10–20 cm Vilumsone-Nemes gives), and the heading with the batch.
 */
export function markerPlotInput(
  m: { lengthMm: number; widthMm: number; ratio: Record<string, number>; drawing: MarkerDrawingDto; notches?: Record<string, { x: number; y: number }[]> },
  heading: { studioName: string; dateIso: string; styleCode: string; styleName: string; batchCode: string; sizes: string[] },
  settings: Pick<MarkerPlotInput, 'locale' | 'language' | 'timeZone' | 'unitSystem'> = { locale: 'en-GB' },
): MarkerPlotInput {
  const placed = m.drawing.placements.map((p) => placedOutline(m.drawing.outlines[p.pieceKey] ?? [], p));
  return {
    studioName: heading.studioName,
    dateIso: heading.dateIso,
    ...settings,
    style: { code: heading.styleCode, name: heading.styleName },
    batch: { code: heading.batchCode },
    ratio: heading.sizes.filter((s) => (m.ratio[s] ?? 0) > 0).map((s) => ({ size: s, count: m.ratio[s] })),
    lengthMm: m.lengthMm,
    widthMm: m.widthMm,
    outlines: m.drawing.outlines,
    notches: m.notches,
    placements: m.drawing.placements.map((p) => ({ pieceKey: p.pieceKey, size: p.size, pieceName: p.pieceName, rotation: p.rotation, mirrored: p.mirrored, x: p.x, y: p.y })),
    spliceZones: markerSpliceZones(placed, mm(m.lengthMm), DEFAULT_SPLICE_OVERLAP_MM).map((z) => ({ near: z.near, far: z.far })),
  };
}

/**
 * Splice zones of a stored marker from its job input and result (every placed copy's cutting line),
 * with the cutter's overlap; none when the marker has no stored layout.
 */
export function storedMarkerSpliceZones(
  input: { engine: { pieces: { id: string; polygon: { x: number; y: number }[] }[] } } | null,
  result: { placements: { pieceId: string; rotation: number; mirrored: boolean; x: number; y: number }[] } | null,
  lengthMm: number,
): { near: number; far: number }[] {
  if (!input || !result) return [];
  const polygons = new Map(input.engine.pieces.map((p) => [p.id, p.polygon]));
  const placed = result.placements.map((p) => placedOutline(polygons.get(p.pieceId) ?? [], p));
  return markerSpliceZones(placed, mm(lengthMm), DEFAULT_SPLICE_OVERLAP_MM).map((z) => ({ near: z.near, far: z.far }));
}
