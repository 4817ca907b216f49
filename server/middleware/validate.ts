import type { RequestHandler } from 'express';
import type { ZodType } from 'zod';
import { badRequest } from '../errors';

type Schemas = { body?: ZodType; query?: ZodType; params?: ZodType };

/**
 * Parses body, query and params with the shared zod schemas and replaces them with the parsed
 * values. Every failing field path is reported, so a form can mark each one.
 */
export function validate(schemas: Schemas): RequestHandler {
  return (req, _res, next) => {
    const fields: Record<string, string> = {};
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const result = schema.safeParse(req[part] ?? {});
      if (!result.success) {
        for (const issue of result.error.issues) {
          const key = issue.path.length ? issue.path.join('.') : part;
          fields[key] ??= issue.message;
        }
      } else if (part === 'query') {
        Object.defineProperty(req, 'query', { value: result.data, writable: true });
      } else {
        (req as unknown as Record<string, unknown>)[part] = result.data;
      }
    }
    const keys = Object.keys(fields);
    if (keys.length) {
      const first = keys[0];
      return next(badRequest(`${first}: ${fields[first]}`, fields));
    }
    next();
  };
}
