import { ratioText } from '@shared/schemas/markers';

export const metres = (mm: number) => `${(mm / 1000).toFixed(2)} m`;

/** One yard is exactly 0.9144 m and one inch 25.4 mm (international yard and pound, 1959). */
export const MM_PER_YARD = 914.4;
export const MM_PER_INCH = 25.4;

/** Fabric lengths and widths in the studio's units: metres and centimetres, or yards and inches. */
export function fabricUnits(imperial: boolean) {
  return imperial
    ? { length: (mm: number) => `${(mm / MM_PER_YARD).toFixed(2)} yd`, width: (mm: number) => `${Math.round((mm / MM_PER_INCH) * 8) / 8} in`, lengthUnit: 'yd', widthUnit: 'in', mmPerLength: MM_PER_YARD, mmPerWidth: MM_PER_INCH, pricePer: 'yard' }
    : { length: metres, width: (mm: number) => `${Math.round(mm / 10)} cm`, lengthUnit: 'm', widthUnit: 'cm', mmPerLength: 1000, mmPerWidth: 10, pricePer: 'metre' };
}
export const SIZE_ORDER = ['XS', 'S', 'M', 'L', 'XL'];
export const ratioLabel = (r: Record<string, number>) => ratioText(r, [...SIZE_ORDER, ...Object.keys(r).filter((s) => !SIZE_ORDER.includes(s))]);
export const SPREADING_LABELS: Record<string, string> = {
  'face-up-one-way': 'Face up, one way',
  'face-up-both-ways': 'Face up, both ways',
  'face-to-face-one-way': 'Face to face, one way',
  'face-to-face-zigzag': 'Face to face, zigzag',
};
