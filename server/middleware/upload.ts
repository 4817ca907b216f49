import type { RequestHandler } from 'express';
import multer from 'multer';
import { AppError, badRequest } from '../errors';

export interface UploadOptions {
  /** Largest file accepted, bytes. */
  maxBytes: number;
  /** Form fields accepted beside the file (multer's `fields` limit); multer's default when absent. */
  maxFields?: number;
  /**
   * How a file past `maxBytes` is refused: `payload` (default) is the 413 `too_large` a client shows as a
   * whole-request problem; `field` is a 400 on `file`, for forms that show it beside the file input.
   */
  tooLarge?: 'payload' | 'field';
}

/** 4 KB, 1 MB, 2.5 MB: the limit as a studio reads it. */
export const sizeText = (n: number) => {
  if (n < 1024 * 1024) return `${Math.round(n / 1024)} KB`;
  const mb = n / (1024 * 1024);
  return `${Number.isInteger(mb) ? mb : mb.toFixed(1)} MB`;
};

/**
 * The one upload middleware: a single file in form field `file`, held in memory within the route's limits,
 * part names read as UTF-8. Browsers send a file's name as raw UTF-8 bytes; multer's default reads them as
 * Latin-1, so "Ткань.csv" arrived as "Ð¢ÐºÐ°Ð½Ñ\u008c.csv"; a name sent as RFC 8187 `filename*=` is decoded as
 * it says. A file past the limit is refused as `tooLarge` says; any other problem with the form is a 400 on `file`.
 */
export function uploadFile(opts: UploadOptions): RequestHandler {
  const single = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: opts.maxBytes, files: 1, ...(opts.maxFields === undefined ? {} : { fields: opts.maxFields }) },
    defParamCharset: 'utf8',
  } as multer.Options).single('file');
  return (req, res, next) =>
    single(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
        if (opts.tooLarge === 'field') {
          const m = `The file is larger than ${sizeText(opts.maxBytes)}`;
          return next(badRequest(`file: ${m}`, { file: m }));
        }
        return next(new AppError(413, 'too_large', `The file is larger than the ${sizeText(opts.maxBytes)} limit; make it smaller and try again`));
      }
      // More than one file, or a file under another field name: say what the form should send.
      const m = err instanceof multer.MulterError && (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT')
        ? 'Attach one file, in the field named file'
        : (err as Error).message;
      next(badRequest(`file: ${m}`, { file: m }));
    });
}
