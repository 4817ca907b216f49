import { ratioText } from '@shared/schemas/markers';

export const metres = (mm: number) => `${(mm / 1000).toFixed(2)} m`;
export const SIZE_ORDER = ['XS', 'S', 'M', 'L', 'XL'];
export const ratioLabel = (r: Record<string, number>) => ratioText(r, [...SIZE_ORDER, ...Object.keys(r).filter((s) => !SIZE_ORDER.includes(s))]);
export const SPREADING_LABELS: Record<string, string> = {
  'face-up-one-way': 'Face up, one way',
  'face-up-both-ways': 'Face up, both ways',
  'face-to-face-one-way': 'Face to face, one way',
  'face-to-face-zigzag': 'Face to face, zigzag',
};
