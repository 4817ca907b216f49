import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import {
  chartExportQuery, gradingParams, gradingPieceParams, patternAcceptInput, patternImportInput, pieceDownloadQuery, putGradeRuleInput, putSizeChartInput, sizeMixInput,
} from '../../../shared/schemas/grading';
import { actorOf, requirePermission } from '../../auth/require';
import { badRequest } from '../../errors';
import { validate } from '../../middleware/validate';
import type { Download, GradingService } from './grading.service';
import { sendDownload } from '../../middleware/download';
import { memoryUpload } from '../uploads/memory-upload';
import { PATTERN_UPLOAD_LIMIT_BYTES } from './pattern-import';
import { addCalibrationSheetRoute } from './calibration-sheet.routes';

/** Largest upload accepted for charts and customer measurements. */
export const GRADING_UPLOAD_LIMIT_BYTES = 2 * 1024 * 1024;

const upload = memoryUpload({ fileSize: GRADING_UPLOAD_LIMIT_BYTES, files: 1 });

/** One file field `file`; multer's own errors become 400s naming the field. */
const singleFile: RequestHandler = (req, res, next) =>
  upload.single('file')(req, res, (err: unknown) => {
    if (!err) return next();
    const m = err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE'
      ? `The file is larger than ${GRADING_UPLOAD_LIMIT_BYTES / 1024 / 1024} MB`
      : (err as Error).message;
    next(badRequest(`file: ${m}`, { file: m }));
  });

const patternUpload = memoryUpload({ fileSize: PATTERN_UPLOAD_LIMIT_BYTES, files: 1, fields: 10 });

/** One pattern file in field `file` (DXF or SVG, at most PATTERN_UPLOAD_LIMIT_BYTES). */
const patternFile: RequestHandler = (req, res, next) =>
  patternUpload.single('file')(req, res, (err: unknown) => {
    if (!err) return next();
    const m = err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE'
      ? `The file is larger than ${PATTERN_UPLOAD_LIMIT_BYTES / 1024 / 1024} MB`
      : (err as Error).message;
    next(badRequest(`file: ${m}`, { file: m }));
  });

const send = (res: Parameters<RequestHandler>[1], d: Download) => sendDownload(res, d);

/** Routes under /api/styles/:id/grading. */
export function gradingRoutes(service: GradingService) {
  const r = Router();
  const read = requirePermission('grading:read');
  const write = requirePermission('grading:write');
  const id = (p: unknown) => Number((p as { id: string }).id);

  r.get('/:id/grading', read, validate({ params: gradingParams }), async (req, res) => {
    res.json({ grading: await service.get(actorOf(req), id(req.params)) });
  });
  r.put('/:id/grading/chart', write, validate({ params: gradingParams, body: putSizeChartInput }), async (req, res) => {
    res.json({ grading: await service.putChart(actorOf(req), id(req.params), req.body) });
  });
  r.post('/:id/grading/chart/import', write, singleFile, validate({ params: gradingParams }), async (req, res) => {
    res.json({ grading: await service.importChart(actorOf(req), id(req.params), req.file) });
  });
  r.get('/:id/grading/chart/export', read, validate({ params: gradingParams, query: chartExportQuery }), async (req, res) => {
    const q = req.query as unknown as { format: 'csv' | 'xlsx'; unit: 'mm' | 'in' };
    send(res, await service.exportChart(actorOf(req), id(req.params), q.format, q.unit));
  });
  r.post('/:id/grading/propose', write, validate({ params: gradingParams }), async (req, res) => {
    res.json({ grading: await service.proposeRules(actorOf(req), id(req.params)) });
  });
  r.put('/:id/grading/pieces/:pieceId/rules', write, validate({ params: gradingPieceParams, body: putGradeRuleInput }), async (req, res) => {
    res.json({ grading: await service.putRule(actorOf(req), id(req.params), String(req.params.pieceId), req.body) });
  });
  for (const kind of ['svg', 'dxf', 'pdf'] as const) {
    r.get(`/:id/grading/pieces/:pieceId/${kind}`, read, validate({ params: gradingPieceParams, query: pieceDownloadQuery }), async (req, res) => {
      const q = req.query as unknown as { size?: string; paper: 'A4' | 'Letter' };
      send(res, await service.pieceFile(actorOf(req), id(req.params), String(req.params.pieceId), kind, q));
    });
  }
  addCalibrationSheetRoute(r, read, service);
  r.post('/:id/pattern/import', write, patternFile, validate({ params: gradingParams, body: patternImportInput }), async (req, res) => {
    res.json({ preview: await service.previewPattern(actorOf(req), id(req.params), req.file, req.body) });
  });
  r.post('/:id/pattern/accept', write, validate({ params: gradingParams, body: patternAcceptInput }), async (req, res) => {
    res.json({ grading: await service.acceptPattern(actorOf(req), id(req.params), req.body) });
  });
  r.post('/:id/grading/size-mix', write, singleFile, validate({ params: gradingParams, body: sizeMixInput }), async (req, res) => {
    res.json({ sizeMix: await service.sizeMix(actorOf(req), id(req.params), req.file, req.body) });
  });
  return r;
}
