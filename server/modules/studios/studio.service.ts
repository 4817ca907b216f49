import type { UpdateStudioInput } from '../../../shared/schemas/studio';
import type { Actor } from '../../auth/require';
import type { AuditRepository } from '../audit/audit.repository';
import { presentStudio } from './studio.presenter';
import type { StudioRepository } from './studio.repository';

export type StudioService = ReturnType<typeof createStudioService>;

/** The signed-in person's studio: its name, currency, units, working day and machines. */
export function createStudioService(deps: { studios: StudioRepository; audit: AuditRepository }) {
  const { studios, audit } = deps;
  return {
    get: async (studioId: number) => presentStudio(await studios.get(studioId)),
    async update(actor: Actor, input: UpdateStudioInput) {
      const before = await studios.get(actor.studioId);
      await studios.update(actor.studioId, input);
      const after = await studios.get(actor.studioId);
      await audit.record(actor, 'update', 'studio', actor.studioId, presentStudio(before), presentStudio(after));
      return presentStudio(after);
    },
  };
}
