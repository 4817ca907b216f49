import { Router } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { createMarkerInput, markerListQuery, ratioText } from '../../../shared/schemas/markers';
import { actorOf, requirePermission } from '../../auth/require';
import { conflict } from '../../errors';
import { validate } from '../../middleware/validate';
import { createStyleRepository } from '../styles/style.repository';
import type { DataSource } from 'typeorm';
import { markerSvg } from './marker-svg';
import { markerToDxf } from '@exports/dxf/marker-dxf';
import { batchCode } from '../batches/batch.routes';
import type { MarkerService } from './marker.service';
import { sendDownload } from '../../middleware/download';

export function markerRoutes(ds: DataSource, service: MarkerService) {
  const r = Router();
  const styles = createStyleRepository(ds);
  r.get('/', requirePermission('markers:read'), validate({ query: markerListQuery }), async (req, res) => {
    const q = req.query as { styleId?: number; batchId?: number };
    res.json({ markers: await service.list(actorOf(req).studioId, q) });
  });
  r.post('/', requirePermission('markers:write'), validate({ body: createMarkerInput }), async (req, res) => {
    const { marker, reused } = await service.create(actorOf(req), req.body);
    res.status(reused ? 200 : 202).json({ marker, reused });
  });
  r.get('/:id', requirePermission('markers:read'), validate({ params: idParam }), async (req, res) => {
    const withDrawing = req.query.drawing !== 'false';
    res.json({ marker: (await service.get(actorOf(req).studioId, Number(req.params.id), withDrawing)).dto });
  });
  r.post('/:id/cancel', requirePermission('markers:write'), validate({ params: idParam }), async (req, res) => {
    res.json({ marker: await service.cancel(actorOf(req), Number(req.params.id)) });
  });
  r.get('/:id/svg', requirePermission('markers:read'), validate({ params: idParam }), async (req, res) => {
    const studioId = actorOf(req).studioId;
    const { dto } = await service.get(studioId, Number(req.params.id));
    if (!dto.drawing || dto.lengthMm === null) throw conflict('This marker has no finished layout yet');
    const style = await styles.get(studioId, dto.styleId);
    const sizes = style?.sizeRun ?? Object.keys(dto.ratio);
    const title = `${style?.code ?? 'Marker'} ${ratioText(dto.ratio, sizes)} · ${Math.round(dto.lengthMm)} mm × ${Math.round(dto.widthMm)} mm`;
    sendDownload(res, { body: markerSvg(dto.drawing, { lengthMm: dto.lengthMm, widthMm: dto.widthMm, sizes, title }), type: 'image/svg+xml', filename: `marker-${dto.id}.svg` });
  });
  /** The whole marker at 1:1 for a plotter or cutting table (DXF, millimetres), the batch in its name. */
  r.get('/:id/dxf', requirePermission('markers:read'), validate({ params: idParam }), async (req, res) => {
    const studioId = actorOf(req).studioId;
    const { dto } = await service.get(studioId, Number(req.params.id));
    if (!dto.drawing || dto.lengthMm === null) throw conflict('This marker has no finished layout yet');
    const style = await styles.get(studioId, dto.styleId);
    const sizes = style?.sizeRun ?? Object.keys(dto.ratio);
    const batch = dto.batchId ? batchCode(dto.batchId) : null;
    const title = [batch, style?.code ?? 'Marker', ratioText(dto.ratio, sizes), `${Math.round(dto.lengthMm)} mm × ${Math.round(dto.widthMm)} mm`].filter(Boolean).join(' · ');
    const body = markerToDxf({ outlines: dto.drawing.outlines, placements: dto.drawing.placements, lengthMm: dto.lengthMm, widthMm: dto.widthMm, title });
    const filename = `marker-${[batch, style?.code, dto.id].filter(Boolean).join('-')}.dxf`;
    sendDownload(res, { body, type: 'application/dxf', filename });
  });
  return r;
}
