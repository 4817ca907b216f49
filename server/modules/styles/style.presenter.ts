import type { StyleComposition } from '../../../shared/schemas/style-composition';
import type { StyleDto } from '../../../shared/schemas/styles';
import type { StyleEntity } from '../../entities';

export const presentStyle = (s: StyleEntity): StyleDto => ({
  id: s.id,
  code: s.code,
  name: s.name,
  description: s.description,
  sizeRun: s.sizeRun,
  baseSize: s.baseSize,
  status: s.status,
  composition: (s.composition as StyleComposition | null) ?? null,
  materialFabrics: s.materialFabrics ?? {},
  updatedAt: new Date(s.updatedAt).toISOString(),
});
