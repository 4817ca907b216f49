import { documentSettings } from '../studios/document-settings';
import { z } from 'zod';
import type { MaterialCutTicketInput } from '@exports/pdf/material-cut-ticket.pdf';
import { piecesPerGarment } from '@grading';
import type { BatchEntity, StudioEntity } from '../../entities';
import { badRequest, notFound } from '../../errors';
import { batchCode } from '../../../shared/schemas/batches';
import type { GradingSetRepository } from '../grading/grading-set.repository';
import type { FabricRepository } from './fabric.repository';

/** Query of a material's cut ticket: the style's material by name. */
export const materialTicketQuery = z.object({ material: z.string({ error: 'Name the material' }).trim().min(1, 'Name the material').max(40, 'At most 40 characters') });

/**
 * A batch's cut ticket for one material of its style: the stored pieces of that material with their copies per
 * garment, the batch's garments per size and the fabric linked to the material. A material the style cuts no
 * piece from is a 400 naming the materials it does cut; a style without pieces yet is a 404.
 */
export async function materialCutTicketInput(sets: Pick<GradingSetRepository, 'byStyle'>, fabrics: Pick<FabricRepository, 'get'>, studio: StudioEntity, batch: BatchEntity, material: string, today: Date): Promise<MaterialCutTicketInput> {
  const style = batch.style;
  if (!style) throw notFound('Style');
  const set = await sets.byStyle(studio.id, style.id);
  if (!set?.pieces.length) throw notFound('Pattern pieces');
  const materialOf = (p: { material?: string }) => p.material ?? 'self';
  const used = [...new Set(set.pieces.map(materialOf))];
  if (!used.includes(material)) throw badRequest(`material: this style cuts no pieces from "${material}" (it uses ${used.join(', ')})`, { material: `Choose one of: ${used.join(', ')}` });
  const fabricId = style.materialFabrics?.[material];
  const fabric = fabricId ? await fabrics.get(studio.id, fabricId) : null;
  return {
    studioName: studio.name, dateIso: today.toISOString(), ...documentSettings(studio), unitSystem: studio.unitSystem,
    style: { code: style.code, name: style.name }, batch: { code: batchCode(batch) }, material,
    fabric: fabric ? { description: `${fabric.name}${fabric.composition ? `, ${fabric.composition}` : ''}`, widthMm: fabric.widthMm } : null,
    sizes: style.sizeRun.map((size) => ({ size, quantity: batch.quantities[size] ?? 0 })),
    pieces: set.pieces.filter((p) => materialOf(p) === material).map((p) => ({ name: p.name, copiesPerGarment: piecesPerGarment(p), mirrored: p.cut === 'pair' })),
  };
}
