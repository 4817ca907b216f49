import type { Request, RequestHandler, Response } from 'express';
import type { z, ZodType } from 'zod';
import { AppError, type Spoken } from '../errors';
import { fieldLabel, issueMessage, lowerFirst, type Speaker } from '../../shared/i18n/speak';

type Schemas = { body?: ZodType; query?: ZodType; params?: ZodType };

/**
 * Parses body, query and params with the shared zod schemas and replaces them with the parsed
 * values. Every failing field path is reported, so a form can mark each one.
 */
export function validate(schemas: Schemas): RequestHandler {
  return (req, _res, next) => {
    const fields: Record<string, string> = {};
    const refused: { issue: z.core.$ZodIssue; input: unknown; key: string }[] = [];
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const input = req[part] ?? {};
      const result = schema.safeParse(input);
      if (!result.success) {
        for (const issue of result.error.issues) {
          const key = issue.path.length ? issue.path.join('.') : part;
          if (fields[key] !== undefined) continue;
          fields[key] = issue.message;
          refused.push({ issue, input, key });
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
      return next(new AppError(400, 'validation', `${first}: ${fields[first]}`, fields, (who) => spokenRefusal(refused, who)));
    }
    next();
  };
}

/** A refused request in another language: each field by its name, the first one in the sentence. */
function spokenRefusal(refused: { issue: z.core.$ZodIssue; input: unknown; key: string }[], who: Speaker): Spoken {
  const fields = Object.fromEntries(refused.map(({ issue, input, key }) => [key, issueMessage(issue, input, who)]));
  const first = refused[0];
  return { message: `${fieldLabel(first.key)}\u202f: ${lowerFirst(fields[first.key])}`, fields };
}

type Out<T> = T extends ZodType ? z.output<T> : undefined;

/** What a route's handler receives from {@link validated}: params, query and body as its schemas parsed them. */
export interface Validated<S extends Schemas> {
  params: Out<S['params']>;
  query: Out<S['query']>;
  body: Out<S['body']>;
}

/**
 * {@link validate} and the handler in one: the handler gets the parsed params, query and body typed from the
 * same shared schemas (an id is a number, a flag a boolean), so a route never converts `req.params` by hand
 * nor casts `req.query`. Spread it after the route's guards: `r.get('/:id', guard, ...validated({ params: idParam }, handler))`.
 */
export function validated<S extends Schemas>(
  schemas: S,
  handler: (input: Validated<S>, req: Request, res: Response) => unknown,
): [RequestHandler, RequestHandler] {
  return [
    validate(schemas),
    // The one place the parsed values meet Express's untyped request: validate() has just replaced them.
    (req, res) => handler({ params: req.params, query: req.query, body: req.body } as Validated<S>, req, res) as void,
  ];
}
