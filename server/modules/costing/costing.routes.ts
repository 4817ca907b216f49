import { Router } from 'express';
import { costingQuery, createTrimInput, updateCostingSettingsInput, updateTrimInput, type LabourBasis, type TrimDto } from '../../../shared/schemas/costing';
import { idParam } from '../../../shared/schemas/common';
import type { SupplierEntity, TrimEntity } from '../../entities';
import { actorOf, requirePermission } from '../../auth/require';
import { badRequest, notFound } from '../../errors';
import { validate } from '../../middleware/validate';
import type { RouteContext } from '../module';
import type { CostingRepository } from './costing.repository';
import { presentSettings, type CostingService } from './costing.service';
import { sendDownload } from '../../middleware/download';

export const presentTrim = (t: TrimEntity, suppliers: SupplierEntity[]): TrimDto => ({
  id: t.id,
  styleId: t.styleId,
  name: t.name,
  unit: t.unit,
  quantityPerGarment: t.quantityPerGarment,
  unitPriceMinor: t.unitPriceMinor,
  supplierId: t.supplierId,
  supplierName: suppliers.find((s) => s.id === t.supplierId)?.name ?? '',
  inStock: t.inStock,
});

/** GET /api/batches/:id/costing and /costing.xlsx — owner only (costs:read). */
export function batchCostingRoutes(service: CostingService, ctx: RouteContext) {
  const r = Router();
  r.get('/:id/costing', requirePermission('costs:read'), validate({ params: idParam, query: costingQuery }), async (req, res) => {
    const basis = (req.query as { labourBasis: LabourBasis }).labourBasis;
    res.json({ costing: (await service.build(actorOf(req).studioId, Number(req.params.id), basis, ctx.now())).dto });
  });
  r.get('/:id/costing.xlsx', requirePermission('costs:read'), validate({ params: idParam, query: costingQuery }), async (req, res) => {
    const basis = (req.query as { labourBasis: LabourBasis }).labourBasis;
    const { dto, input } = await service.build(actorOf(req).studioId, Number(req.params.id), basis, ctx.now());
    const buffer = await ctx.jobs.run('costing-sheet.xlsx', input);
    sendDownload(res, { body: buffer, type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', filename: `costing-${dto.batch.code}.xlsx` });
  });
  return r;
}

/** /api/costing: the bill of materials (trims) and costing settings of a style. */
export function costingRoutes(repo: CostingRepository, ctx: RouteContext) {
  const r = Router();
  const styleOr404 = async (studioId: number, styleId: number) => {
    if (!(await repo.styleExists(studioId, styleId))) throw notFound('Style');
  };
  const checkSupplier = async (studioId: number, supplierId: number | null | undefined) => {
    if (supplierId && !(await repo.supplier(studioId, supplierId))) throw badRequest('supplierId: no such supplier', { supplierId: 'No such supplier' });
  };

  r.get('/styles/:id/trims', requirePermission('costs:read'), validate({ params: idParam }), async (req, res) => {
    const { studioId } = actorOf(req);
    await styleOr404(studioId, Number(req.params.id));
    const suppliers = await repo.suppliers(studioId);
    res.json({ trims: (await repo.trims(studioId, Number(req.params.id))).map((t) => presentTrim(t, suppliers)) });
  });
  r.post('/styles/:id/trims', requirePermission('costs:write'), validate({ params: idParam, body: createTrimInput }), async (req, res) => {
    const actor = actorOf(req);
    const styleId = Number(req.params.id);
    await styleOr404(actor.studioId, styleId);
    await checkSupplier(actor.studioId, req.body.supplierId);
    const t = await repo.insertTrim({ ...req.body, studioId: actor.studioId, styleId });
    const dto = presentTrim(t, await repo.suppliers(actor.studioId));
    await ctx.audit.record(actor, 'create', 'trim', t.id, undefined, dto);
    res.status(201).json({ trim: dto });
  });
  r.put('/trims/:id', requirePermission('costs:write'), validate({ params: idParam, body: updateTrimInput }), async (req, res) => {
    const actor = actorOf(req);
    const id = Number(req.params.id);
    const before = await repo.trim(actor.studioId, id);
    if (!before) throw notFound('Trim');
    await checkSupplier(actor.studioId, req.body.supplierId);
    const suppliers = await repo.suppliers(actor.studioId);
    const after = await repo.updateTrim(actor.studioId, id, req.body);
    await ctx.audit.record(actor, 'update', 'trim', id, presentTrim(before, suppliers), presentTrim(after, suppliers));
    res.json({ trim: presentTrim(after, suppliers) });
  });
  r.delete('/trims/:id', requirePermission('costs:write'), validate({ params: idParam }), async (req, res) => {
    const actor = actorOf(req);
    const id = Number(req.params.id);
    const before = await repo.trim(actor.studioId, id);
    if (!before) throw notFound('Trim');
    await repo.deleteTrim(actor.studioId, id);
    await ctx.audit.record(actor, 'delete', 'trim', id, presentTrim(before, []), undefined);
    res.status(204).end();
  });
  r.get('/styles/:id/settings', requirePermission('costs:read'), validate({ params: idParam }), async (req, res) => {
    const { studioId } = actorOf(req);
    const styleId = Number(req.params.id);
    await styleOr404(studioId, styleId);
    res.json({ settings: presentSettings(styleId, await repo.settings(studioId, styleId)) });
  });
  r.put('/styles/:id/settings', requirePermission('costs:write'), validate({ params: idParam, body: updateCostingSettingsInput }), async (req, res) => {
    const actor = actorOf(req);
    const styleId = Number(req.params.id);
    await styleOr404(actor.studioId, styleId);
    const before = presentSettings(styleId, await repo.settings(actor.studioId, styleId));
    const { isDefault: _d, styleId: _s, ...base } = before;
    const after = presentSettings(styleId, await repo.saveSettings(actor.studioId, styleId, { ...base, ...req.body }));
    await ctx.audit.record(actor, 'update', 'costing_settings', styleId, before, after);
    res.json({ settings: after });
  });
  return r;
}
