import type { z } from 'zod';
import type { putCompositionInput } from '../../../shared/schemas/style-composition';
import type { createStyleInput, updateStyleInput } from '../../../shared/schemas/styles';
import type { Actor } from '../../auth/require';
import { badRequest, conflict, notFound } from '../../errors';
import type { AuditRepository } from '../audit/audit.repository';
import { presentStyle } from './style.presenter';
import type { StyleRepository } from './style.repository';

export type StyleService = ReturnType<typeof createStyleService>;
type CreateStyleInput = z.output<typeof createStyleInput>;
type UpdateStyleInput = z.output<typeof updateStyleInput>;
type PutCompositionInput = z.output<typeof putCompositionInput>;

const CODE_TAKEN = () => conflict('A style with that code exists', { code: 'Already used in this studio' });

/** A studio's styles: codes unique per studio, each change in the audit trail. */
export function createStyleService(deps: { styles: StyleRepository; audit: AuditRepository }) {
  const { styles, audit } = deps;
  const load = async (studioId: number, id: number) => {
    const s = await styles.get(studioId, id);
    if (!s) throw notFound('Style');
    return s;
  };
  return {
    list: async (studioId: number) => (await styles.list(studioId)).map(presentStyle),
    get: async (studioId: number, id: number) => presentStyle(await load(studioId, id)),
    async create(actor: Actor, input: CreateStyleInput) {
      if (await styles.byCode(actor.studioId, input.code)) throw CODE_TAKEN();
      const s = await styles.insert({ ...input, studioId: actor.studioId });
      await audit.record(actor, 'create', 'style', s.id, undefined, presentStyle(s));
      return presentStyle(s);
    },
    async update(actor: Actor, id: number, input: UpdateStyleInput) {
      const before = await load(actor.studioId, id);
      const clash = await styles.byCode(actor.studioId, input.code);
      if (clash && clash.id !== id) throw CODE_TAKEN();
      const after = await styles.update(actor.studioId, id, input);
      await audit.record(actor, 'update', 'style', id, presentStyle(before), presentStyle(after));
      return presentStyle(after);
    },
    /** Choose the blocks (or a preset) the pieces are drafted from and the fabric each material is cut from. */
    async putComposition(actor: Actor, id: number, input: PutCompositionInput) {
      const before = await load(actor.studioId, id);
      const links: Record<string, number> = input.materialFabrics;
      const known = await styles.fabricIds(actor.studioId);
      const fields: Record<string, string> = {};
      for (const [material, fabricId] of Object.entries(links)) if (!known.has(fabricId)) fields[`materialFabrics.${material}`] = 'No such fabric in this studio';
      if (Object.keys(fields).length) throw badRequest(`${Object.keys(fields)[0]}: no such fabric in this studio`, fields);
      const after = await styles.update(actor.studioId, id, { composition: input.composition, materialFabrics: Object.keys(links).length ? links : null });
      await audit.record(actor, 'update_composition', 'style', id, { composition: before.composition, materialFabrics: before.materialFabrics }, { composition: after.composition, materialFabrics: after.materialFabrics });
      return presentStyle(after);
    },
  };
}
