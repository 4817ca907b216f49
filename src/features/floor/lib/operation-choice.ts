import type { BundleDto } from '@shared/schemas/floor';

/**
 * The operation a bundle's log screen offers as chosen: the machinist's own, only when exactly one of theirs
 * is still open on the bundle. Pay follows the operation logged, so with two or more open (or none of
 * theirs) nothing is chosen for them.
 */
export function onlyOpenOfMine(bundle: Pick<BundleDto, 'operations' | 'states'>): number | undefined {
  const open = bundle.operations.filter((o) => o.isMine && !bundle.states.find((s) => s.operationId === o.id)?.done);
  return open.length === 1 ? open[0].id : undefined;
}
