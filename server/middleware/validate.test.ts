import type { NextFunction, Request, Response } from 'express';
import { describe, expect, it } from 'vitest';
import { idParam } from '../../shared/schemas/common';
import { markerQuery } from '../../shared/schemas/markers';
import { validated } from './validate';

const run = async (handlers: ReturnType<typeof validated>, req: Partial<Request>) => {
  let failed: unknown;
  const next: NextFunction = (err?: unknown) => void (failed = err);
  handlers[0](req as Request, {} as Response, next);
  if (failed) return { failed };
  await handlers[1](req as Request, {} as Response, next);
  return { failed };
};

describe('validated', () => {
  it('hands the handler the id as a number and the flag as a boolean when the URL carries them as text', async () => {
    let seen: unknown;
    const handlers = validated({ params: idParam, query: markerQuery }, ({ params, query }) => {
      seen = { id: params.id, drawing: query.drawing };
    });
    await run(handlers, { params: { id: '42' }, query: { drawing: 'false' } });
    expect(seen).toEqual({ id: 42, drawing: false });
  });

  it('reads a flag the query leaves out as its default when the URL has no query', async () => {
    let seen: unknown;
    await run(validated({ query: markerQuery }, ({ query }) => void (seen = query.drawing)), { query: {} });
    expect(seen).toBe(true);
  });

  it('never calls the handler and answers a 400 naming the field when a param does not parse', async () => {
    let called = false;
    const handlers = validated({ params: idParam }, () => void (called = true));
    const { failed } = await run(handlers, { params: { id: 'x' } });
    expect(called).toBe(false);
    expect(failed).toMatchObject({ status: 400, fields: { id: expect.any(String) } });
  });
});
