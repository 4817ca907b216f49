import { updateIfChanged } from '../../db/update-if-changed';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { updateStudioInput, type StudioDto } from '../../../shared/schemas/studio';
import { StudioEntity } from '../../entities';
import { actorOf, requireAuth, requirePermission } from '../../auth/require';
import { validate } from '../../middleware/validate';
import type { AuditRepository } from '../audit/audit.repository';

const present = (s: StudioEntity): StudioDto => ({
  id: s.id,
  name: s.name,
  currency: s.currency,
  unitSystem: s.unitSystem,
  language: s.language,
  timeZone: s.timeZone,
  workingDayHours: s.workingDayHours,
  machines: s.machines ?? {},
});

export function createStudioRepository(ds: DataSource) {
  const repo = ds.getRepository(StudioEntity);
  return {
    get: (id: number) => repo.findOneByOrFail({ id }),
    update: async (id: number, patch: Partial<StudioEntity>) => {
      await updateIfChanged(repo, { id }, patch);
    },
  };
}
export type StudioRepository = ReturnType<typeof createStudioRepository>;

export function studioRoutes(studios: StudioRepository, audit: AuditRepository) {
  const r = Router();
  r.get('/', requireAuth, async (req, res) => {
    res.json({ studio: present(await studios.get(actorOf(req).studioId)) });
  });
  r.patch('/', requirePermission('studio:manage'), validate({ body: updateStudioInput }), async (req, res) => {
    const actor = actorOf(req);
    const before = await studios.get(actor.studioId);
    await studios.update(actor.studioId, req.body);
    const after = await studios.get(actor.studioId);
    await audit.record(actor, 'update', 'studio', actor.studioId, present(before), present(after));
    res.json({ studio: present(after) });
  });
  return r;
}
