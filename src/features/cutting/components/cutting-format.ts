import { ratioText } from '@shared/schemas/markers';
import { studioFormat } from '@shared/format/studio-format';
import { MM_PER_INCH, MM_PER_YARD } from '@shared/units/units';
import { fmt } from '@/lib/format';

/** A fabric, marker or roll length in the studio's units (metres, or yards and inches). */
export const metres = (mm: number) => fmt().fabricLength(mm);

export { MM_PER_INCH, MM_PER_YARD };

/** Fabric lengths and widths in the studio's units and language: metres and centimetres, or yards and inches (to 1/8). */
export function fabricUnits(imperial: boolean) {
  const f = studioFormat({ ...fmt().settings, unitSystem: imperial ? 'imperial' : 'metric' });
  return imperial
    ? { length: f.fabricLength, width: f.fabricWidth, lengthUnit: f.fabricLengthUnit, widthUnit: f.fabricWidthUnit, mmPerLength: MM_PER_YARD, mmPerWidth: MM_PER_INCH, pricePer: 'yard' }
    : { length: f.fabricLength, width: f.fabricWidth, lengthUnit: f.fabricLengthUnit, widthUnit: f.fabricWidthUnit, mmPerLength: 1000, mmPerWidth: 10, pricePer: 'metre' };
}
export const SIZE_ORDER = ['XS', 'S', 'M', 'L', 'XL'];
export const ratioLabel = (r: Record<string, number>) => ratioText(r, [...SIZE_ORDER, ...Object.keys(r).filter((s) => !SIZE_ORDER.includes(s))]);
export const SPREADING_LABELS: Record<string, string> = {
  'face-up-one-way': 'Face up, one way',
  'face-up-both-ways': 'Face up, both ways',
  'face-to-face-one-way': 'Face to face, one way',
  'face-to-face-zigzag': 'Face to face, zigzag',
};

/**
 * The fabric the cut plan form shows before the owner picks one: the fabric of the plan on screen, else the
 * style's self fabric, else the first fabric. A batch holds one cut plan, so a form that opened on another
 * fabric (the alphabetical first, often the lining) would replace the self fabric's plan at one press.
 */
export function cutPlanFabricId(planFabricId: number | undefined, selfFabricId: number | undefined, fabricIds: readonly number[]): number | undefined {
  if (planFabricId !== undefined && fabricIds.includes(planFabricId)) return planFabricId;
  if (selfFabricId !== undefined && fabricIds.includes(selfFabricId)) return selfFabricId;
  return fabricIds[0];
}
