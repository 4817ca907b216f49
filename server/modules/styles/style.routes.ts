import { Router } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { putCompositionInput, type StyleComposition } from '../../../shared/schemas/style-composition';
import { createStyleInput, updateStyleInput, type StyleDto } from '../../../shared/schemas/styles';
import type { StyleEntity } from '../../entities';
import { actorOf, requirePermission } from '../../auth/require';
import { badRequest, conflict, notFound } from '../../errors';
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
  composition: (s.composition as StyleComposition | null) ?? null,
  materialFabrics: s.materialFabrics ?? {},
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
  /** Choose the blocks (or a preset) the pieces are drafted from and the fabric each material is cut from. */
  r.put('/:id/composition', requirePermission('styles:write'), validate({ params: idParam, body: putCompositionInput }), async (req, res) => {
    const actor = actorOf(req);
    const id = Number(req.params.id);
    const before = await styles.get(actor.studioId, id);
    if (!before) throw notFound('Style');
    const links: Record<string, number> = req.body.materialFabrics;
    const known = await styles.fabricIds(actor.studioId);
    const fields: Record<string, string> = {};
    for (const [material, fabricId] of Object.entries(links)) if (!known.has(fabricId)) fields[`materialFabrics.${material}`] = 'No such fabric in this studio';
    if (Object.keys(fields).length) throw badRequest(`${Object.keys(fields)[0]}: no such fabric in this studio`, fields);
    const after = await styles.update(actor.studioId, id, { composition: req.body.composition, materialFabrics: Object.keys(links).length ? links : null });
    await audit.record(actor, 'update_composition', 'style', id, { composition: before.composition, materialFabrics: before.materialFabrics }, { composition: after.composition, materialFabrics: after.materialFabrics });
    res.json({ style: presentStyle(after) });
  });
  return r;
}
