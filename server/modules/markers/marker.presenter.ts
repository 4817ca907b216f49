import type { MarkerDrawingDto, MarkerDto } from '../../../shared/schemas/markers';
import type { MarkerEntity } from '../../entities';
import type { MarkerJobInput } from './marker-input';
import type { LiveProgress, StoredMarkerResult } from './marker-job';

const garmentsOf = (ratio: Record<string, number>) => Object.values(ratio).reduce((a, b) => a + b, 0);

/** Marker → DTO; a running job shows its live best length and elapsed time; `withDrawing` adds the geometry. */
export function presentMarker(m: MarkerEntity, live?: LiveProgress, withDrawing = false): MarkerDto {
  const input = m.input as MarkerJobInput | null;
  const result = m.result as StoredMarkerResult | null;
  const lengthMm = live?.bestLength ?? m.lengthMm;
  const garments = garmentsOf(m.ratio);
  const dto: MarkerDto = {
    id: m.id,
    styleId: m.styleId,
    batchId: m.batchId,
    fabricId: m.fabricId,
    ratio: m.ratio,
    garments,
    widthMm: m.widthMm,
    status: m.status,
    lengthMm,
    utilisation: m.utilisation,
    lengthPerGarmentMm: lengthMm && garments ? lengthMm / garments : null,
    elapsedMs: live?.elapsedMs ?? m.elapsedMs,
    budgetSeconds: input?.seconds ?? 0,
    complete: result ? result.complete : null,
    error: m.error,
    pieceCount: input ? input.engine.pieces.reduce((a, p) => a + p.quantity * (p.mirrored ? 2 : 1), 0) : 0,
    cores: live?.lanes ?? 0,
    progress: live?.history ?? result?.progress ?? [],
    createdAt: new Date(m.createdAt).toISOString(),
  };
  if (withDrawing && input && result) dto.drawing = markerDrawing(input, result);
  return dto;
}

/** Outlines per piece key and every placement with its size and piece name. */
export function markerDrawing(input: MarkerJobInput, result: StoredMarkerResult): MarkerDrawingDto {
  return {
    outlines: Object.fromEntries(input.engine.pieces.map((p) => [p.id, p.polygon])),
    placements: result.placements.map((p) => ({
      pieceKey: p.pieceId,
      size: input.labels[p.pieceId]?.size ?? '',
      pieceName: input.labels[p.pieceId]?.name ?? p.pieceId,
      copy: p.copy,
      rotation: p.rotation,
      mirrored: p.mirrored,
      x: p.x,
      y: p.y,
    })),
  };
}
