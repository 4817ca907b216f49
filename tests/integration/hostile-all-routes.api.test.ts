import fc from 'fast-check';
import type { Express } from 'express';
import type { DataSource } from 'typeorm';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';
import { listApiRoutes } from '../fixtures/route-list';

/** Hostile values: SQL fragments, markup, traversal, control and bidi characters, huge and non-numbers. */
const hostile = fc.oneof(
  fc.constantFrom(
    "'; DROP TABLE work_logs; --", '<svg onload=alert(1)>', '../../etc/passwd', '\u0000', '\u202E', 'x'.repeat(20_000),
    NaN, Infinity, -1, -1e308, 1e308, 2 ** 53 + 1, 0.5, null, true, [], {},
  ),
  fc.string({ maxLength: 60 }),
  fc.integer(),
  fc.double(),
);
const FIELDS = ['name', 'code', 'quantity', 'lengthMm', 'widthMm', 'plies', 'ratio', 'rolls', 'unitPriceMinor', 'sizes', 'email', 'status', 'operationId', 'bundleNumber', 'fromDay', 'toDay', 'seconds', 'lines', 'rules', 'values'];
const body = fc.dictionary(fc.constantFrom(...FIELDS), hostile, { maxKeys: 4 });

const SKIP = new Set(['post /api/auth/logout', 'post /api/auth/password', 'post /api/auth/studios', 'post /api/auth/login', 'post /api/auth/pin']);

let app: Express;
let ds: DataSource;
let owner: Awaited<ReturnType<typeof signIn>>;
let tables: string[];

/**
 * Every table but sessions and the sign-in attempt counters (which count every attempt, refused or not, so
 * guessing is throttled across processes), as text: a 4xx must leave it exactly as it was.
 */
async function snapshot() {
  const parts: string[] = [];
  for (const t of tables) parts.push(JSON.stringify(await ds.query(`SELECT * FROM "${t}" ORDER BY 1`)));
  return parts.join('\n');
}

beforeAll(async () => {
  ({ app, ds } = await buildTestApp());
  owner = await signIn(app, DEMO.owner);
  tables = ds.entityMetadatas.map((m) => m.tableName).filter((t) => t !== 'sessions' && t !== 'sign_in_throttles');
}, 120_000);

describe('hostile input to every write route', () => {
  it('answers 4xx (with the failing fields on 400) or 2xx, never 5xx, and a refusal changes nothing', async () => {
    const routes = listApiRoutes(app).filter((r) => ['post', 'put', 'patch'].includes(r.method) && !SKIP.has(`${r.method} ${r.path}`));
    expect(routes.length).toBeGreaterThan(30);
    let tried = 0;
    const bad: string[] = [];
    for (const r of routes) {
      const path = r.path.replace(/:[A-Za-z]+/g, '1');
      await fc.assert(
        fc.asyncProperty(body, async (payload) => {
          tried++;
          const before = await snapshot();
          const res = await (owner as unknown as Record<string, (p: string) => { send(b: unknown): Promise<{ status: number; body: { error?: { fields?: object } } }> }>)[r.method](path).send(payload);
          if (res.status >= 500) bad.push(`${r.method} ${r.path} → ${res.status} for ${JSON.stringify(payload).slice(0, 120)}`);
          if (res.status === 400 && !Object.keys(res.body.error?.fields ?? {}).length) bad.push(`${r.method} ${r.path} → 400 without fields`);
          if (res.status >= 400 && (await snapshot()) !== before) bad.push(`${r.method} ${r.path} → ${res.status} but the database changed`);
        }),
        { numRuns: 12, seed: 42 },
      );
    }
    console.log(JSON.stringify({ writeRoutes: routes.length, hostileRequests: tried, failures: bad.length }));
    expect(bad.slice(0, 20)).toEqual([]);
  }, 600_000);
});
