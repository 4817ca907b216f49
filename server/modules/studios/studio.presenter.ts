import type { StudioDto } from '../../../shared/schemas/studio';
import type { StudioEntity } from '../../entities';

export const presentStudio = (s: StudioEntity): StudioDto => ({
  id: s.id,
  name: s.name,
  currency: s.currency,
  unitSystem: s.unitSystem,
  language: s.language,
  timeZone: s.timeZone,
  workingDayHours: s.workingDayHours,
  machines: s.machines ?? {},
});
