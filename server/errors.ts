import type { ErrorCode } from '../shared/types/api';

/** An error with a stable snake_case code the client switches on. */
export class AppError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: ErrorCode,
    message: string,
    public readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export const badRequest = (message: string, fields?: Record<string, string>) =>
  new AppError(400, 'validation', message, fields);
export const unauthenticated = (message = 'Sign in first') => new AppError(401, 'unauthenticated', message);
export const forbidden = (message = 'Your role cannot do this') => new AppError(403, 'forbidden', message);
export const notFound = (what = 'Record') => new AppError(404, 'not_found', `${what} not found`);
export const conflict = (message: string, fields?: Record<string, string>) =>
  new AppError(409, 'conflict', message, fields);
