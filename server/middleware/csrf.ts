import type { RequestHandler } from 'express';
import { AppError } from '../errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);
const SIMPLE_TYPES = ['application/x-www-form-urlencoded', 'multipart/form-data', 'text/plain'];

/**
 * Cross-site request forgery defence for a same-origin JSON API (OWASP CSRF cheat sheet:
 * Fetch Metadata, Origin verification, custom request headers). A browser marks cross-site
 * requests with Sec-Fetch-Site and Origin; bodies a cross-site form can send (form, multipart,
 * text) must also carry the X-Seamrun-Csrf header, which cross-site pages cannot set without CORS.
 */
export const csrfGuard: RequestHandler = (req, _res, next) => {
  if (SAFE.has(req.method)) return next();
  const site = req.get('sec-fetch-site');
  if (site === 'cross-site') return next(new AppError(403, 'csrf', 'Cross-site request refused'));
  const origin = req.get('origin');
  if (origin && origin !== 'null') {
    let host = '';
    try {
      host = new URL(origin).host;
    } catch {
      return next(new AppError(403, 'csrf', 'Bad Origin header'));
    }
    if (host !== req.get('host')) return next(new AppError(403, 'csrf', 'Cross-origin request refused'));
  }
  const type = (req.get('content-type') ?? '').toLowerCase();
  if (SIMPLE_TYPES.some((t) => type.startsWith(t)) && req.get('x-seamrun-csrf') !== '1') {
    return next(new AppError(403, 'csrf', 'Missing X-Seamrun-Csrf header'));
  }
  next();
};
