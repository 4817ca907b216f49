import multer from 'multer';

/**
 * The multer instance every upload route uses: files in memory within `limits`, and part names read as
 * UTF-8. Browsers send a file's name as raw UTF-8 bytes; multer's default reads them as Latin-1, so
 * "Ткань.csv" arrived as "Ð¢ÐºÐ°Ð½Ñ\u008c.csv". A name sent as RFC 8187 `filename*=` is decoded as it says.
 */
export function memoryUpload(limits: multer.Options['limits']) {
  return multer({ storage: multer.memoryStorage(), limits, defParamCharset: 'utf8' } as multer.Options);
}
