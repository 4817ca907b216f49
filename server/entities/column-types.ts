/**
 * Column types that differ by driver. The driver is known before any entity module loads
 * (DATABASE_URL), so the same entity classes serve SQLite and PostgreSQL.
 */
export const isPostgres = /^postgres(ql)?:\/\//.test(process.env.DATABASE_URL ?? '');

/** A UTC timestamp: `datetime` on SQLite, `timestamptz` on PostgreSQL. */
export const TIMESTAMP = isPostgres ? 'timestamptz' : 'datetime';
