/** The error envelope every API error uses. */
export interface ApiErrorBody {
  error: { code: string; message: string; fields?: Record<string, string> };
}

export const ERROR_CODES = [
  'validation',
  'unauthenticated',
  'forbidden',
  'not_found',
  'conflict',
  'too_large',
  'rate_limited',
  'csrf',
  'locked',
  'password_change_required',
  'internal',
] as const;
export type ErrorCode = (typeof ERROR_CODES)[number];
