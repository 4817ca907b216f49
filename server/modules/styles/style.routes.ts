import { Router } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { createStyleInput, updateStyleInput, type StyleDto } from '../../../shared/schemas/styles';
import type { StyleEntity } from '../../entities';
import { actorOf, requirePermission } from '../../auth/require';
import { conflict, notFound } from '../../errors';
import { validate } from '../../middleware/validate';
import type { AuditRepository } from '../audit/audit.repository';
import type { StyleRepository } from './style.repository';

export const presentStyle = (s: StyleEntity): StyleDto => ({
  id: s.id,
  code: s.code,
  name: s.name,
  description: s.description,
  sizeRun: s.sizeRun,
  baseSize: s.baseSize,
  status: s.status,
  updatedAt: new Date(s.updatedAt).toISOString(),
});

export function styleRoutes(styles: StyleRepository, audit: AuditRepository) {
  const r = Router();
  r.get('/', requirePermission('styles:read'), async (req, res) => {
    res.json({ styles: (await styles.list(actorOf(req).studioId)).map(presentStyle) });
  });
  r.get('/:id', requirePermission('styles:read'), validate({ params: idParam }), async (req, res) => {
    const s = await styles.get(actorOf(req).studioId, Number(req.params.id));
    if (!s) throw notFound('Style');
    res.json({ style: presentStyle(s) });
  });
  r.post('/', requirePermission('styles:write'), validate({ body: createStyleInput }), async (req, res) => {
    const actor = actorOf(req);
    if (await styles.byCode(actor.studioId, req.body.code)) {
      throw conflict('A style with that code exists', { code: 'Already used in this studio' });
    }
    const s = await styles.insert({ ...req.body, studioId: actor.studioId });
    await audit.record(actor, 'create', 'style', s.id, undefined, presentStyle(s));
    res.status(201).json({ style: presentStyle(s) });
  });
  r.put('/:id', requirePermission('styles:write'), validate({ params: idParam, body: updateStyleInput }), async (req, res) => {
    const actor = actorOf(req);
    const id = Number(req.params.id);
    const before = await styles.get(actor.studioId, id);
    if (!before) throw notFound('Style');
    const clash = await styles.byCode(actor.studioId, req.body.code);
    if (clash && clash.id !== id) throw conflict('A style with that code exists', { code: 'Already used in this studio' });
    const after = await styles.update(actor.studioId, id, req.body);
    await audit.record(actor, 'update', 'style', id, presentStyle(before), presentStyle(after));
    res.json({ style: presentStyle(after) });
  });
  return r;
}
