// eslint-disable-next-line no-restricted-imports -- the shared update step of every repository
import type { FindOptionsWhere, ObjectLiteral, QueryDeepPartialEntity, Repository } from 'typeorm';

/**
 * UPDATE the rows matching `where` with `patch`; an empty patch (every field optional and none sent)
 * is a no-op rather than TypeORM's UpdateValuesMissingError, so an empty PATCH answers 200, not 500.
 */
export async function updateIfChanged<T extends ObjectLiteral>(
  repo: Repository<T>,
  where: FindOptionsWhere<T>,
  patch: Partial<T>,
): Promise<void> {
  if (Object.keys(patch).length === 0) return;
  await repo.update(where, patch as QueryDeepPartialEntity<T>);
}
