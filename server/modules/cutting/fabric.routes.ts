import { format } from 'date-fns';
import { Router, type Request, type Response } from 'express';
import { can } from '../../../shared/auth/permissions';
import { fabricColumns, setsPrice } from './fabric-fields';
import { createFabricInput, createRollsInput, updateFabricInput, type RollInput } from '../../../shared/schemas/cutting';
import { idParam } from '../../../shared/schemas/common';
import { actorOf, requirePermission, type Actor } from '../../auth/require';
import { badRequest, conflict, forbidden, notFound } from '../../errors';
import { translate } from '../../../shared/i18n/speak';
import { validate } from '../../middleware/validate';
import type { AuditRepository } from '../audit/audit.repository';
import type { FabricRepository } from './fabric.repository';
import { presentFabric, presentRoll } from './fabric.presenter';
import { parsePackingList } from './packing-list';
import { uploadFile } from '../../middleware/upload';
import { LISTED_ERRORS } from '../uploads/table-limits';

/**
 * The 400 of a refused packing list: the first {@link LISTED_ERRORS} problems as `rows` (row, column, why)
 * and as the envelope's `fields` the client lists; the message gives the total. A 400,000-row file with a
 * bad cell in each answers with 20, not 800,000 entries.
 */
async function refuseImport(req: Request, res: Response, problems: { key: string; row: number; column: string; message: string }[]) {
  const listed = problems.slice(0, LISTED_ERRORS);
  const n = problems.length;
  const message = `${n} problem${n > 1 ? 's' : ''} in the packing list${n > LISTED_ERRORS ? ` (the first ${LISTED_ERRORS} are listed)` : ''}; nothing was imported`;
  // The person's language (English as ever): each sentence by its English wording in the server's dictionary.
  const who = await req.speaker?.();
  const say = (text: string) => (who ? (translate(text, who) ?? text) : text);
  res.status(400).json({
    error: { code: 'validation', message: say(message), fields: Object.fromEntries(listed.map((p) => [p.key, say(p.message)])) },
    rows: listed.map(({ row, column, message: m }) => ({ row, column, message: say(m) })),
  });
}

export function fabricRoutes(fabrics: FabricRepository, audit: AuditRepository, opts: { maxUploadBytes: number; now: () => Date }) {
  const r = Router();
  const packingList = uploadFile({ maxBytes: opts.maxUploadBytes });
  const load = async (actor: Actor, id: number) => {
    const f = await fabrics.get(actor.studioId, id);
    if (!f) throw notFound('Fabric');
    return f;
  };
  const noPriceForCutter = (actor: Actor, body: Parameters<typeof setsPrice>[0]) => {
    if (setsPrice(body) && !can(actor.role, 'costs:write')) throw forbidden('Your role cannot set prices');
  };
  /** A fabric's supplier must be one of the studio's own (the same answer whether it is another studio's or none). */
  const checkSupplier = async (actor: Actor, supplierId: number | null | undefined) => {
    if (supplierId && !(await fabrics.hasSupplier(actor.studioId, supplierId))) throw badRequest('supplierId: no such supplier', { supplierId: 'No such supplier' });
  };

  r.get('/', requirePermission('fabric:read'), async (req, res) => {
    const actor = actorOf(req);
    const rolls = await fabrics.allRolls(actor.studioId);
    res.json({ fabrics: (await fabrics.list(actor.studioId)).map((f) => presentFabric(f, actor.role, rolls)) });
  });
  r.get('/:id', requirePermission('fabric:read'), validate({ params: idParam }), async (req, res) => {
    const actor = actorOf(req);
    const f = await load(actor, Number(req.params.id));
    const rolls = await fabrics.rolls(actor.studioId, f.id);
    res.json({ fabric: presentFabric(f, actor.role, rolls), rolls: rolls.map(presentRoll) });
  });
  r.post('/', requirePermission('fabric:write'), validate({ body: createFabricInput }), async (req, res) => {
    const actor = actorOf(req);
    noPriceForCutter(actor, req.body);
    await checkSupplier(actor, req.body.supplierId);
    const f = await fabrics.insert({ ...fabricColumns(req.body), studioId: actor.studioId });
    await audit.record(actor, 'create', 'fabric', f.id, undefined, presentFabric(f, 'owner'));
    res.status(201).json({ fabric: presentFabric(f, actor.role) });
  });
  r.put('/:id', requirePermission('fabric:write'), validate({ params: idParam, body: updateFabricInput }), async (req, res) => {
    const actor = actorOf(req);
    noPriceForCutter(actor, req.body);
    const before = await load(actor, Number(req.params.id));
    await checkSupplier(actor, req.body.supplierId);
    const after = await fabrics.update(actor.studioId, before.id, fabricColumns(req.body, before));
    await audit.record(actor, 'update', 'fabric', before.id, presentFabric(before, 'owner'), presentFabric(after, 'owner'));
    res.json({ fabric: presentFabric(after, actor.role, await fabrics.rolls(actor.studioId, after.id)) });
  });
  r.delete('/:id', requirePermission('fabric:write'), validate({ params: idParam }), async (req, res) => {
    const actor = actorOf(req);
    const f = await load(actor, Number(req.params.id));
    if ((await fabrics.rolls(actor.studioId, f.id)).length) throw conflict('This fabric still has rolls; it cannot be deleted');
    await fabrics.remove(actor.studioId, f.id);
    await audit.record(actor, 'delete', 'fabric', f.id, presentFabric(f, 'owner'), undefined);
    res.status(204).end();
  });

  r.get('/:id/rolls', requirePermission('fabric:read'), validate({ params: idParam }), async (req, res) => {
    const actor = actorOf(req);
    const f = await load(actor, Number(req.params.id));
    res.json({ rolls: (await fabrics.rolls(actor.studioId, f.id)).map(presentRoll) });
  });

  /** Save rolls after checking labels are new; all or none. */
  const saveRolls = async (actor: Actor, fabricId: number, list: RollInput[], fieldOf: (i: number) => string, fromPackingList = false) => {
    const fields: Record<string, string> = {};
    const seen = new Map<string, number>();
    list.forEach((roll, i) => {
      const prev = seen.get(roll.label);
      if (prev !== undefined) fields[fieldOf(i)] = `Roll ${roll.label} is entered twice (also ${fieldOf(prev)})`;
      else seen.set(roll.label, i);
    });
    const taken = new Set(await fabrics.labelsTaken(actor.studioId, list.map((x) => x.label)));
    list.forEach((roll, i) => {
      if (taken.has(roll.label)) fields[fieldOf(i)] ??= `Roll ${roll.label} is already in stock`;
    });
    if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
    const saved = await fabrics.insertRolls(
      // A packing list gives the supplier's ticket length: plans take the short-length and flaw allowances off it until the roll is measured.
      list.map((roll) => ({ ...roll, studioId: actor.studioId, fabricId, remainingMm: roll.lengthMm, isRemnant: false, ticketLengthMm: fromPackingList ? roll.lengthMm : null })),
    );
    await audit.record(actor, 'create', 'rolls', fabricId, undefined, { labels: saved.map((s) => s.label) });
    return saved;
  };

  r.post('/:id/rolls', requirePermission('fabric:write'), validate({ params: idParam, body: createRollsInput }), async (req, res) => {
    const actor = actorOf(req);
    const f = await load(actor, Number(req.params.id));
    const saved = await saveRolls(actor, f.id, req.body.rolls, (i) => `rolls.${i}.label`);
    res.status(201).json({ rolls: saved.map(presentRoll) });
  });

  r.post('/:id/rolls/import', requirePermission('fabric:write'), validate({ params: idParam }), packingList, async (req, res) => {
    const actor = actorOf(req);
    const f = await load(actor, Number(req.params.id));
    if (!req.file) throw badRequest('file: attach the packing list (CSV or XLSX)', { file: 'Attach the packing list' });
    const { rolls, errors } = await parsePackingList(req.file, { widthMm: f.widthMm, receivedDate: format(opts.now(), 'yyyy-MM-dd') });
    if (errors.length) {
      await refuseImport(req, res, errors.map((e) => ({ ...e, key: `row ${e.row}${e.column ? ` · ${e.column}` : ''}` })));
      return;
    }
    try {
      const saved = await saveRolls(actor, f.id, rolls, (i) => `row ${i + 2}`, true);
      res.status(201).json({ rolls: saved.map(presentRoll) });
    } catch (err) {
      const fields = (err as { fields?: Record<string, string> }).fields;
      if (!fields) throw err;
      await refuseImport(req, res, Object.entries(fields).map(([key, message]) => ({ key, row: Number(key.replace('row ', '')), column: 'roll', message })));
    }
  });
  return r;
}
