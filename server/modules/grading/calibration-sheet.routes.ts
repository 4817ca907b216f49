import type { RequestHandler, Router } from 'express';
import { calibrationSheetPdf } from '@exports/pdf/calibration-sheet.pdf';
import { calibrationSheetQuery, type CalibrationSheetQuery } from '../../../shared/schemas/photo-trace';
import { gradingParams } from '../../../shared/schemas/grading';
import { sendDownload } from '../../middleware/download';
import { validate } from '../../middleware/validate';
import { actorOf } from '../../auth/require';
import type { GradingService } from './grading.service';
import type { Language } from '../../../shared/format/studio-format';
import type { UnitSystem } from '@exports/types';

/** The studio's language and units, which the sheet's words and check bar follow. */
export type StudioSettingsOf = (studioId: number) => Promise<{ language: Language; unitSystem: UnitSystem }>;

/**
 * The calibration sheets hold no studio data but its language and units, and never change, so each (kind,
 * paper, language, units) is built once per process and kept: a few kB each, the first request builds it,
 * every later one is a copy from memory.
 */
const built = new Map<string, Promise<Buffer>>();
const sheetBytes = (q: CalibrationSheetQuery, language: Language, unitSystem: UnitSystem) => {
  const key = `${q.kind}-${q.paper}-${language}-${unitSystem}`;
  let p = built.get(key);
  if (!p) {
    p = calibrationSheetPdf({ kind: q.kind, paper: q.paper, language, unitSystem });
    p.catch(() => built.delete(key));
    built.set(key, p);
  }
  return p;
};

/** GET /api/styles/:id/pattern/calibration-sheet?kind=sheet|border&paper=A4|Letter|whole: the PDF to print. */
export function addCalibrationSheetRoute(r: Router, read: RequestHandler, service: GradingService, studioOf: StudioSettingsOf): void {
  r.get('/:id/pattern/calibration-sheet', read, validate({ params: gradingParams, query: calibrationSheetQuery }), async (req, res) => {
    // The sheet holds no style data, but another studio's style id is still a 404, as on every style route.
    const actor = actorOf(req);
    await service.checkStyle(actor, Number((req.params as { id: string }).id));
    const { language, unitSystem } = await studioOf(actor.studioId);
    const q = req.query as unknown as CalibrationSheetQuery;
    const name = q.kind === 'sheet' ? `seamrun-calibration-sheet-${q.paper}.pdf` : `seamrun-border-frame-${q.paper}.pdf`;
    sendDownload(res, { body: await sheetBytes(q, language, unitSystem), type: 'application/pdf', filename: name });
  });
}
