import { z } from 'zod';

/** GET /styles/:id/pattern/calibration-sheet: which sheet, on which paper. */
export const calibrationSheetQuery = z.object({
  kind: z.enum(['sheet', 'border'], { error: 'Choose the sheet or the border frame' }).default('sheet'),
  paper: z.enum(['A4', 'Letter', 'whole'], { error: 'Choose A4, Letter or whole' }).default('A4'),
}).refine((q) => !(q.kind === 'sheet' && q.paper === 'whole'), { path: ['paper'], message: 'The sheet prints on A4 or Letter' });
export type CalibrationSheetQuery = z.infer<typeof calibrationSheetQuery>;
