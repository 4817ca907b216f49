import { Router } from 'express';
import {
  chartExportQuery, gradingParams, gradingPieceParams, patternAcceptInput, patternImportInput, pieceDownloadQuery, putGradeRuleInput, putSizeChartInput, sizeMixInput,
} from '../../../shared/schemas/grading';
import { actorOf, requirePermission } from '../../auth/require';
import { validated } from '../../middleware/validate';
import type { GradingService } from './grading.service';
import { sendDownload } from '../../middleware/download';
import { uploadFile } from '../../middleware/upload';
import { PATTERN_UPLOAD_LIMIT_BYTES } from './pattern-import';
import { addCalibrationSheetRoute, type StudioSettingsOf } from './calibration-sheet.routes';

/** Largest upload accepted for charts and customer measurements. */
export const GRADING_UPLOAD_LIMIT_BYTES = 2 * 1024 * 1024;

/** One table file in field `file`; too large is a 400 beside the file input. */
const singleFile = uploadFile({ maxBytes: GRADING_UPLOAD_LIMIT_BYTES, tooLarge: 'field' });

/** One pattern file in field `file` (DXF or SVG, at most PATTERN_UPLOAD_LIMIT_BYTES). */
const patternFile = uploadFile({ maxBytes: PATTERN_UPLOAD_LIMIT_BYTES, maxFields: 10, tooLarge: 'field' });

/** Routes under /api/styles/:id/grading. */
export function gradingRoutes(service: GradingService, studioOf: StudioSettingsOf) {
  const r = Router();
  const read = requirePermission('grading:read');
  const write = requirePermission('grading:write');

  r.get('/:id/grading', read, ...validated({ params: gradingParams }, async ({ params }, req, res) => {
    res.json({ grading: await service.get(actorOf(req), params.id) });
  }));
  r.put('/:id/grading/chart', write, ...validated({ params: gradingParams, body: putSizeChartInput }, async ({ params, body }, req, res) => {
    res.json({ grading: await service.putChart(actorOf(req), params.id, body) });
  }));
  r.post('/:id/grading/chart/import', write, singleFile, ...validated({ params: gradingParams }, async ({ params }, req, res) => {
    res.json({ grading: await service.importChart(actorOf(req), params.id, req.file) });
  }));
  r.get('/:id/grading/chart/export', read, ...validated({ params: gradingParams, query: chartExportQuery }, async ({ params, query }, req, res) => {
    sendDownload(res, await service.exportChart(actorOf(req), params.id, query.format, query.unit));
  }));
  r.post('/:id/grading/propose', write, ...validated({ params: gradingParams }, async ({ params }, req, res) => {
    res.json({ grading: await service.proposeRules(actorOf(req), params.id) });
  }));
  r.put('/:id/grading/pieces/:pieceId/rules', write, ...validated({ params: gradingPieceParams, body: putGradeRuleInput }, async ({ params, body }, req, res) => {
    res.json({ grading: await service.putRule(actorOf(req), params.id, params.pieceId, body) });
  }));
  for (const kind of ['svg', 'dxf', 'pdf'] as const) {
    r.get(`/:id/grading/pieces/:pieceId/${kind}`, read, ...validated({ params: gradingPieceParams, query: pieceDownloadQuery }, async ({ params, query }, req, res) => {
      sendDownload(res, await service.pieceFile(actorOf(req), params.id, params.pieceId, kind, query));
    }));
  }
  addCalibrationSheetRoute(r, read, service, studioOf);
  r.post('/:id/pattern/import', write, patternFile, ...validated({ params: gradingParams, body: patternImportInput }, async ({ params, body }, req, res) => {
    res.json({ preview: await service.previewPattern(actorOf(req), params.id, req.file, body) });
  }));
  r.post('/:id/pattern/accept', write, ...validated({ params: gradingParams, body: patternAcceptInput }, async ({ params, body }, req, res) => {
    res.json({ grading: await service.acceptPattern(actorOf(req), params.id, body) });
  }));
  r.post('/:id/grading/size-mix', write, singleFile, ...validated({ params: gradingParams, body: sizeMixInput }, async ({ params, body }, req, res) => {
    res.json({ sizeMix: await service.sizeMix(actorOf(req), params.id, req.file, body) });
  }));
  return r;
}
