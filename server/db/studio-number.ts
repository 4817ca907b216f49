import type { DataSource, EntityTarget, ObjectLiteral, QueryDeepPartialEntity } from 'typeorm';
import { isUniqueViolation } from './data-source';

/** Creates at once in one studio each need a try more than the last; past this many something else is wrong. */
const ATTEMPTS = 20;

/**
 * INSERT a studio's row (batch, purchase order, pay period) with the studio's next `number`, 1 + its highest,
 * worked out inside the INSERT itself: the number and the row are one statement, so one transaction on either
 * driver. Two creates at once (PostgreSQL, or two processes on one SQLite file) can read the same highest number;
 * the unique index on (studioId, number) refuses the later one, which tries again and takes the next. Those rows
 * are never deleted, so the highest number is never handed out twice.
 *
 * Takes the DataSource, not a transaction's manager: on PostgreSQL a refused INSERT aborts the transaction around
 * it, so the retry must run on its own. Returns the new row's id.
 */
export async function insertWithStudioNumber<T extends ObjectLiteral & { studioId: number; number: number }>(
  ds: DataSource,
  entity: EntityTarget<T>,
  row: Partial<T> & { studioId: number },
): Promise<number> {
  const table = ds.getMetadata(entity).tableName;
  const next = () => `(SELECT COALESCE(MAX("number"), 0) + 1 FROM "${table}" WHERE "studioId" = :numberStudioId)`;
  for (let attempt = 1; ; attempt += 1) {
    try {
      const result = await ds
        .createQueryBuilder()
        .insert()
        .into(entity)
        .values({ ...row, number: next } as QueryDeepPartialEntity<T>)
        .setParameter('numberStudioId', row.studioId)
        .execute();
      return Number(result.identifiers[0].id);
    } catch (e) {
      if (!isUniqueViolation(e) || attempt >= ATTEMPTS) throw e;
    }
  }
}
