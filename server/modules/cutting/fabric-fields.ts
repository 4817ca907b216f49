import { pricePerMetreMinor, type PriceUnit } from '@shared/units';
import type { CreateFabricInput } from '../../../shared/schemas/cutting';
import type { FabricEntity } from '../../entities';

type FabricBody = Partial<CreateFabricInput>;
type Current = Pick<FabricEntity, 'shrinkageLengthPercent' | 'shrinkageWidthPercent' | 'priceMinor' | 'priceUnit'>;

/**
 * The fabric columns a create or edit sets. The price is kept as quoted (`priceMinor` per `priceUnit`);
 * `pricePerMetreMinor` follows it, rounded, for readers that weigh fabric per metre. A body with only the
 * older `pricePerMetreMinor` is a price per metre. Shrinkage is kept per direction; an older body's single
 * `shrinkagePercent` stands for both, and `shrinkagePercent` stays the larger of the two.
 */
export function fabricColumns(body: FabricBody, current?: Current): Partial<FabricEntity> {
  const out: Partial<FabricEntity> = {};
  for (const k of ['name', 'composition', 'widthMm', 'isDirectional', 'supplierId', 'maxPlies'] as const) {
    if (body[k] !== undefined) (out as Record<string, unknown>)[k] = body[k];
  }
  const single = body.shrinkagePercent;
  const length = body.shrinkageLengthPercent ?? (body.shrinkageWidthPercent === undefined ? single : undefined) ?? current?.shrinkageLengthPercent ?? 0;
  const width = body.shrinkageWidthPercent ?? (body.shrinkageLengthPercent === undefined ? single : undefined) ?? current?.shrinkageWidthPercent ?? 0;
  if (single !== undefined || body.shrinkageLengthPercent !== undefined || body.shrinkageWidthPercent !== undefined || !current) {
    Object.assign(out, { shrinkageLengthPercent: length, shrinkageWidthPercent: width, shrinkagePercent: Math.max(length, width) });
  }
  let price: { amountMinor: number; per: PriceUnit } | null = null;
  if (body.priceMinor !== undefined) price = { amountMinor: body.priceMinor, per: body.priceUnit ?? current?.priceUnit ?? 'metre' };
  else if (body.pricePerMetreMinor !== undefined) price = { amountMinor: body.pricePerMetreMinor, per: 'metre' };
  else if (body.priceUnit !== undefined && current) price = { amountMinor: current.priceMinor, per: body.priceUnit };
  else if (!current) price = { amountMinor: 0, per: 'metre' };
  if (price) Object.assign(out, { priceMinor: price.amountMinor, priceUnit: price.per, pricePerMetreMinor: Math.round(pricePerMetreMinor(price)) });
  return out;
}

/** True when the body sets a price in any of its forms. */
export const setsPrice = (body: FabricBody) => body.pricePerMetreMinor !== undefined || body.priceMinor !== undefined || body.priceUnit !== undefined;
