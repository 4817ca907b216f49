import type { LayShortageDto } from '../../../shared/schemas/cutting';
import type { LayEntity, RollEntity } from '../../entities';

/** Lengths within half a millimetre are equal: holds are real millimetres. */
const HALF_MM = 0.5;
const metres = (mm: number) => `${(mm / 1000).toFixed(2)} m`;

/**
 * The shortage of each planned lay, before anyone spreads: plies the plan found no roll for, and rolls
 * that now hold less than the lays waiting on them need (a remnant measured shorter than planned, or
 * stock used elsewhere). Lays with neither are left out of the map.
 */
export function layShortages(lays: Pick<LayEntity, 'id' | 'status' | 'plies' | 'rolls'>[], rolls: RollEntity[]): Map<number, LayShortageDto> {
  const byId = new Map(rolls.map((r) => [r.id, r]));
  const out = new Map<number, LayShortageDto>();
  for (const lay of lays) {
    if (lay.status !== 'planned') continue;
    const pliesWithoutFabric = Math.max(0, lay.plies - lay.rolls.reduce((a, r) => a + r.plies, 0));
    const short = lay.rolls
      .map((l) => byId.get(l.rollId))
      .filter((r): r is RollEntity => !!r && r.reservedMm > r.remainingMm + HALF_MM)
      .map((r) => ({ rollId: r.id, label: r.label, onHandMm: r.remainingMm, heldMm: r.reservedMm }));
    if (!pliesWithoutFabric && !short.length) continue;
    const parts = [
      ...(pliesWithoutFabric ? [`${pliesWithoutFabric} of ${lay.plies} plies have no roll to come from`] : []),
      ...short.map((r) => `roll ${r.label} has ${metres(r.onHandMm)} but the lays waiting on it need ${metres(r.heldMm)}`),
    ];
    out.set(lay.id, { pliesWithoutFabric, rolls: short, message: `Not enough fabric: ${parts.join('; ')}.` });
  }
  return out;
}
