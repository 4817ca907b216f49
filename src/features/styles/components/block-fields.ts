import { FACING_WIDTH_MM } from '@grading';
import type { BlockSpecInput } from '@shared/schemas/style-composition';

const IN = 25.4;

/**
 * One editable option of a block: where it sits in the block spec (dot path), how it is entered, and the default
 * the grading core takes when it is left empty (a number in mm, or words when the default comes from the body).
 */
export type BlockField =
  | { path: string; label: string; kind: 'length'; default: number | string }
  | { path: string; label: string; kind: 'number'; default: number | string; step?: number }
  | { path: string; label: string; kind: 'choice'; choices: readonly string[]; default: string }
  | { path: string; label: string; kind: 'switch'; default: boolean; on: unknown };

export type BlockName = BlockSpecInput['block'];

export const BLOCK_LABELS: Record<BlockName, string> = {
  bodice: 'Bodice (front and back)',
  skirt: 'Skirt',
  sleeve: 'Sleeve',
  peplum: 'Peplum / flounce',
  facing: 'Facings',
  waistband: 'Waistband',
  dress: 'Loose dress (bodice to hem)',
  'shirt-sleeve': 'Shirt sleeve (short)',
  'collar-band': 'Collar band',
  collar: 'Collar on a band',
  pocket: 'Pocket (patch or in-seam)',
  belt: 'Belt',
};

/** The options shown for each block, with the grading core's defaults (grading/blocks). */
export const BLOCK_FIELDS: Record<BlockName, BlockField[]> = {
  bodice: [
    { path: 'bustEaseMm', label: 'Bust ease', kind: 'length', default: 2 * IN },
    { path: 'waistEaseMm', label: 'Waist ease', kind: 'length', default: IN },
    { path: 'waistDartMm', label: 'Waist dart intake', kind: 'length', default: 'from bust − waist' },
    { path: 'neckline.shape', label: 'Front neckline', kind: 'choice', choices: ['round', 'v', 'square', 'boat'], default: 'round' },
    { path: 'neckline.depthMm', label: 'Neckline depth', kind: 'length', default: 'round 3 in, V 7 in' },
    { path: 'backNeckline', label: 'Back neckline', kind: 'choice', choices: ['standard', 'high'], default: 'standard' },
    { path: 'shoulderPads', label: 'Shoulder pads (+1 in at the shoulder)', kind: 'switch', default: false, on: {} },
    { path: 'centreBackOpening', label: 'Centre-back zip opening (1½ in allowance)', kind: 'switch', default: false, on: {} },
    { path: 'seamMm', label: 'Seam allowance', kind: 'length', default: 10 },
  ],
  skirt: [
    { path: 'shape', label: 'Shape', kind: 'choice', choices: ['straight', 'pencil', 'a-line', 'gathered', 'circle'], default: 'straight' },
    { path: 'lengthMm', label: 'Length', kind: 'length', default: 'waist to knee' },
    { path: 'waistEaseMm', label: 'Waist ease', kind: 'length', default: 0.5 * IN },
    { path: 'hipEaseMm', label: 'Hip ease', kind: 'length', default: 2 * IN },
    { path: 'fraction', label: 'Circle fraction (circle)', kind: 'number', default: 1, step: 0.25 },
    { path: 'centreBackOpening', label: 'Centre-back zip opening (1½ in allowance)', kind: 'switch', default: false, on: {} },
    { path: 'hemMm', label: 'Hem allowance', kind: 'length', default: 'straight 2 in, circle ⅜ in' },
  ],
  sleeve: [
    { path: 'length', label: 'Length', kind: 'choice', choices: ['short', 'three-quarter', 'long'], default: 'long' },
    { path: 'lengthMm', label: 'Sleeve length', kind: 'length', default: 'from the arm' },
    { path: 'hemMm', label: 'Hem allowance', kind: 'length', default: 'long 2 in, else 1 in' },
  ],
  peplum: [
    { path: 'innerEdge.times', label: 'Inner edge × waist', kind: 'number', default: 1, step: 0.5 },
    { path: 'innerEdge.plusMm', label: 'Inner edge extra', kind: 'length', default: 0 },
    { path: 'lengthMm', label: 'Length', kind: 'length', default: 6 * IN },
    { path: 'cut', label: 'Cut as', kind: 'choice', choices: ['ring', 'halves', 'quarters'], default: 'ring' },
    { path: 'cornerRadiusMm', label: 'Curved corner radius', kind: 'length', default: 0 },
  ],
  facing: [
    { path: 'of', label: 'Facing of', kind: 'choice', choices: ['neckline', 'armhole', 'front-edge'], default: 'neckline' },
    { path: 'widthMm', label: 'Width', kind: 'length', default: FACING_WIDTH_MM.neckline },
    { path: 'interfaced', label: 'Interfaced', kind: 'switch', default: true, on: true },
  ],
  waistband: [
    { path: 'widthMm', label: 'Finished width', kind: 'length', default: 1.25 * IN },
    { path: 'extensionMm', label: 'Extension', kind: 'length', default: 1.25 * IN },
  ],
  dress: [
    { path: 'bustEaseMm', label: 'Bust ease', kind: 'length', default: 2 * IN },
    { path: 'waistEaseMm', label: 'Waist ease', kind: 'length', default: IN },
    { path: 'hipEaseMm', label: 'Hip ease', kind: 'length', default: 2 * IN },
    { path: 'lengthMm', label: 'Waist to hem', kind: 'length', default: 'waist to knee' },
    { path: 'hemFlareMm', label: 'Flare at the hem (each side)', kind: 'length', default: 60 },
    { path: 'buttonExtensionMm', label: 'Button extension (0 = front on the fold)', kind: 'length', default: 0 },
    { path: 'hemMm', label: 'Hem allowance', kind: 'length', default: 30 },
  ],
  'shirt-sleeve': [
    { path: 'capEaseMm', label: 'Cap ease', kind: 'length', default: 15 },
    { path: 'capHeightRatio', label: 'Cap height × armhole depth', kind: 'number', default: 0.7, step: 0.05 },
    { path: 'underarmLengthMm', label: 'Underarm length', kind: 'length', default: 100 },
    { path: 'hemMm', label: 'Hem allowance', kind: 'length', default: 25 },
  ],
  'collar-band': [
    { path: 'heightMm', label: 'Band height', kind: 'length', default: 30 },
    { path: 'extensionMm', label: 'Extension past centre front', kind: 'length', default: 15 },
  ],
  collar: [
    { path: 'heightMm', label: 'Band height', kind: 'length', default: 30 },
    { path: 'collar.widthMm', label: 'Collar width', kind: 'length', default: 2.25 * IN },
    { path: 'collar.pointMm', label: 'Collar point reach', kind: 'length', default: 0.5 * IN },
  ],
  pocket: [
    { path: 'kind', label: 'Kind', kind: 'choice', choices: ['patch', 'in-seam'], default: 'patch' },
    { path: 'widthMm', label: 'Patch width', kind: 'length', default: 140 },
    { path: 'heightMm', label: 'Patch height', kind: 'length', default: 160 },
    { path: 'fromCentreMm', label: 'Patch centre from centre front', kind: 'length', default: 115 },
    { path: 'belowWaistMm', label: 'Top below the waist', kind: 'length', default: 'patch 90 mm, in-seam 1 in' },
    { path: 'openingMm', label: 'In-seam opening', kind: 'length', default: 6 * IN },
  ],
  belt: [
    { path: 'widthMm', label: 'Finished width', kind: 'length', default: 35 },
    { path: 'extraMm', label: 'Length past the waist', kind: 'length', default: 300 },
    { path: 'waistEaseMm', label: 'Waist ease', kind: 'length', default: IN },
  ],
};

/** A value at a dot path of a block spec. */
export function getAt(spec: object, path: string): unknown {
  return path.split('.').reduce<unknown>((o, k) => (o && typeof o === 'object' ? (o as Record<string, unknown>)[k] : undefined), spec);
}

/** A copy of the spec with the value at a dot path set (undefined removes it; an emptied parent goes too). */
export function setAt<T extends object>(spec: T, path: string, value: unknown): T {
  const [head, ...rest] = path.split('.');
  const out = { ...spec } as Record<string, unknown>;
  if (rest.length) {
    const child = setAt((out[head] as object | undefined) ?? {}, rest.join('.'), value);
    if (Object.keys(child).length) out[head] = child;
    else delete out[head];
  } else if (value === undefined) delete out[head];
  else out[head] = value;
  return out as T;
}

/** The materials a composition cuts: each block's (self by default), interfacing for interfaced facings. */
export function materialsOf(blocks: readonly BlockSpecInput[], preset: string | null): string[] {
  if (preset === 'shirt-dress' && blocks.length === 0) return ['self'];
  const out = new Set<string>();
  for (const b of blocks) {
    out.add(b.material ?? 'self');
    if (b.block === 'facing' && b.interfaced !== false) out.add('interfacing');
  }
  return [...out];
}
