import type { Response } from 'express';

/** A file answered to a download request. */
export interface Download {
  body: Buffer | string;
  /** Content-Type, e.g. `application/pdf` or `text/csv; charset=utf-8`. */
  type: string;
  /** The name the browser saves it under; any script (Cyrillic, Devanagari…) is fine. */
  filename: string;
  /** Shown in the browser (images) rather than saved. */
  inline?: boolean;
  /** A file someone uploaded: served in a sandbox, so a crafted file can run nothing on our origin. */
  untrusted?: boolean;
}

/**
 * The one way a route answers with a file. The name goes through Express's own `res.attachment`, which
 * writes the RFC 6266 header: an ASCII `filename="…"` fallback and `filename*=UTF-8''…` (RFC 8187) for
 * the real name, so a non-Latin-1 name is kept and never makes Node refuse the header (a 500). Every file
 * is built for one signed-in person (costs, pay, a studio's patterns): `private, no-store` keeps it out of
 * shared and disk caches, the usual rule for personal documents (RFC 9111 §5.2.2.5 and §5.2.2.7).
 */
export function sendDownload(res: Response, d: Download): void {
  res.attachment(d.filename);
  if (d.inline) res.set('Content-Disposition', String(res.get('Content-Disposition')).replace(/^attachment/, 'inline'));
  res.set('Cache-Control', 'private, no-store');
  if (d.untrusted) {
    res.set('X-Content-Type-Options', 'nosniff');
    res.set('Content-Security-Policy', "default-src 'none'; style-src 'unsafe-inline'; sandbox");
  }
  res.type(d.type).send(d.body);
}
