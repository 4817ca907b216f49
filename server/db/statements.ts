import { createHash } from 'node:crypto';
import { QueryFailedError, type DataSource, type EntityTarget, type ObjectLiteral } from 'typeorm';
type ColumnMetadata = ReturnType<DataSource['getMetadata']>['columns'][number];

/**
 * Hand-written SQL for the few queries on the hottest paths (a floor log, a session read), written once
 * for both drivers: `?` placeholders (numbered `$n` for PostgreSQL) and double-quoted identifiers.
 *
 * Why not the find API there: TypeORM 1.x writes numeric where-values into the SQL text itself
 * (`"studioId" = 1`), so every bundle, user and session gave a new statement, the driver's prepared
 * statement cache (first in, first out) never hit, and preparing plus building the query took over half of
 * the CPU time of a log. Here each statement's text is constant, so the driver prepares it once.
 *
 * Values still go through the driver's own conversions (`prepareHydratedValue` /
 * `preparePersistentValue`), so dates, JSON and booleans come back as the entities give them.
 */
export type Statements = ReturnType<typeof createStatements>;

export function createStatements(ds: DataSource) {
  const postgres = ds.options.type === 'postgres';
  const texts = new Map<string, string>();
  /** INSERT text per table and column list, built once. */
  const inserts = new Map<string, string>();
  const columnsOf = new Map<unknown, Map<string, ColumnMetadata>>();

  /** The driver's text for a `?`-placeholder statement; computed once per statement. */
  function text(sql: string) {
    let t = texts.get(sql);
    if (t === undefined) {
      let n = 0;
      t = postgres ? sql.replace(/\?/g, () => `$${++n}`) : sql;
      texts.set(sql, t);
    }
    return t;
  }

  /**
   * Run a statement. On SQLite straight through better-sqlite3 with the statement prepared once (it is
   * synchronous, so nothing interleaves); on PostgreSQL through the data source's own pool as a named
   * prepared statement, so the server parses and plans it once per connection.
   */
  type Sqlite = { prepare: (sql: string) => { reader: boolean; all: (...p: unknown[]) => unknown[]; run: (...p: unknown[]) => unknown } };
  type Pool = { query: (q: { name: string; text: string; values: unknown[] }) => Promise<{ rows: Record<string, unknown>[] }> };
  const driver = ds.driver as unknown as { databaseConnection?: Sqlite; master?: Pool };
  const prepared = new Map<string, ReturnType<Sqlite['prepare']>>();
  const names = new Map<string, string>();
  async function query(sql: string, params: unknown[]): Promise<Record<string, unknown>[]> {
    if (postgres) {
      if (!driver.master) return (await ds.query(text(sql), params)) as Record<string, unknown>[];
      // One name per statement text for every pool user: PostgreSQL keys prepared statements by name.
      let name = names.get(sql);
      if (!name) names.set(sql, (name = `seamrun_${createHash('sha1').update(text(sql)).digest('hex').slice(0, 20)}`));
      try {
        return (await driver.master.query({ name, text: text(sql), values: params })).rows;
      } catch (e) {
        throw new QueryFailedError(text(sql), params, e as Error);
      }
    }
    const sqlite = driver.databaseConnection;
    if (!sqlite) return (await ds.query(text(sql), params)) as Record<string, unknown>[];
    let stmt = prepared.get(sql);
    if (!stmt) {
      stmt = sqlite.prepare(sql);
      prepared.set(sql, stmt);
    }
    const values = params.map((p) => (typeof p === 'boolean' ? Number(p) : p));
    try {
      if (stmt.reader) return stmt.all(...values) as Record<string, unknown>[];
      stmt.run(...values);
      return [];
    } catch (e) {
      throw new QueryFailedError(sql, values, e as Error);
    }
  }

  function columns(entity: EntityTarget<ObjectLiteral>) {
    let m = columnsOf.get(entity);
    if (!m) {
      m = new Map(ds.getMetadata(entity).columns.map((c) => [c.databaseName, c]));
      columnsOf.set(entity, m);
    }
    return m;
  }

  function hydrate<T extends ObjectLiteral>(entity: EntityTarget<T>, row: Record<string, unknown>): T {
    const cols = columns(entity);
    const out: Record<string, unknown> = {};
    for (const key in row) {
      const c = cols.get(key);
      if (c) out[c.propertyName] = ds.driver.prepareHydratedValue(row[key], c);
    }
    return out as T;
  }

  return {
    /** Rows of one entity's table, hydrated as the entity. Select the entity's columns (`SELECT * …`). */
    async all<T extends ObjectLiteral>(entity: EntityTarget<T>, sql: string, params: unknown[]): Promise<T[]> {
      const rows = await query(sql, params);
      return rows.map((r) => hydrate(entity, r));
    },

    async first<T extends ObjectLiteral>(entity: EntityTarget<T>, sql: string, params: unknown[]): Promise<T | null> {
      const rows = await query(sql, params);
      return rows.length ? hydrate(entity, rows[0]) : null;
    },

    /** One scalar column of the first row, raw from the driver. */
    async value(sql: string, params: unknown[]): Promise<unknown> {
      const rows = await query(sql, params);
      return rows.length ? Object.values(rows[0])[0] : undefined;
    },

    /**
     * INSERT one row of the entity and return its generated id. Columns left out take their defaults.
     * The column list is fixed per call site, so the statement text is constant.
     */
    async insert<T extends ObjectLiteral>(entity: EntityTarget<T>, values: Partial<T>): Promise<number> {
      const meta = ds.getMetadata(entity);
      const cols = meta.columns.filter((c) => values[c.propertyName as keyof T] !== undefined);
      const key = `${meta.tableName}|${cols.map((c) => c.databaseName).join(',')}`;
      let sql = inserts.get(key);
      if (!sql) {
        sql = `INSERT INTO "${meta.tableName}" (${cols.map((c) => `"${c.databaseName}"`).join(', ')}) VALUES (${cols.map(() => '?').join(', ')}) RETURNING "id"`;
        inserts.set(key, sql);
      }
      const params = cols.map((c) => ds.driver.preparePersistentValue(values[c.propertyName as keyof T], c));
      const rows = (await query(sql, params)) as { id: number | string }[];
      return Number(rows[0].id);
    },
  };
}
