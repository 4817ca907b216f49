import type { DataSource } from 'typeorm';
import { createStatements } from '../../db/statements';
import { SignInThrottleEntity } from '../../entities';

export type SignInThrottleRepository = ReturnType<typeof createSignInThrottleRepository>;

/** Fixed-window sign-in counters in the database, shared by every process that uses it. */
export function createSignInThrottleRepository(ds: DataSource) {
  const sql = createStatements(ds);
  const t = '"sign_in_throttles"';
  return {
    /**
     * Count one attempt in a single statement (INSERT … ON CONFLICT … RETURNING, SQLite ≥ 3.35 and
     * PostgreSQL): a window that has ended starts again at 1. Parallel attempts from several processes
     * each get their own count.
     */
    async hit(key: string, nowMs: number, windowMs: number): Promise<{ hits: number; resetAtMs: number }> {
      const rows = await sql.all(
        SignInThrottleEntity,
        `INSERT INTO ${t} ("key", "hits", "resetAtMs") VALUES (?, 1, ?) ON CONFLICT ("key") DO UPDATE SET ` +
          `"hits" = CASE WHEN ${t}."resetAtMs" <= ? THEN 1 ELSE ${t}."hits" + 1 END, ` +
          `"resetAtMs" = CASE WHEN ${t}."resetAtMs" <= ? THEN excluded."resetAtMs" ELSE ${t}."resetAtMs" END ` +
          `RETURNING "hits", "resetAtMs"`,
        [key, nowMs + windowMs, nowMs, nowMs],
      );
      const row = rows[0];
      return { hits: Number(row.hits), resetAtMs: Number(row.resetAtMs) };
    },
    async peek(key: string, nowMs: number): Promise<{ hits: number; resetAtMs: number } | null> {
      const rows = await sql.all(SignInThrottleEntity, `SELECT "hits", "resetAtMs" FROM ${t} WHERE "key" = ? AND "resetAtMs" > ?`, [key, nowMs]);
      const row = rows[0];
      return row ? { hits: Number(row.hits), resetAtMs: Number(row.resetAtMs) } : null;
    },
    async undo(key: string) {
      await sql.value(`UPDATE ${t} SET "hits" = "hits" - 1 WHERE "key" = ? AND "hits" > 0`, [key]);
    },
    async reset(key: string) {
      await sql.value(`DELETE FROM ${t} WHERE "key" = ?`, [key]);
    },
    /** Drop ended windows (called now and then, so the table holds only live counters). */
    async purge(nowMs: number) {
      await sql.value(`DELETE FROM ${t} WHERE "resetAtMs" <= ?`, [nowMs]);
    },
  };
}
