import { FACING_WIDTH_MM } from '@grading';
import type { BlockSpecInput } from '@shared/schemas/style-composition';

const IN = 25.4;

/**
 * One editable option of a block: where it sits in the block spec (dot path), how it is entered, and the default
 * the grading core takes when it is left empty (a number in mm, or the key of its words in ../words.ts `defaults`
 * when the default comes from the body). Its label is `fields.<block>.<path with _ for .>` in ../words.ts.
 */
export type BlockField =
  | { path: string; kind: 'length'; default: number | string }
  | { path: string; kind: 'number'; default: number | string; step?: number }
  | { path: string; kind: 'choice'; choices: readonly string[]; default: string }
  | { path: string; kind: 'switch'; default: boolean; on: unknown };

export type BlockName = BlockSpecInput['block'];

/** The blocks a style can be drafted from, in the order the Add a block list offers them (names in ../words.ts). */
export const BLOCK_NAMES: readonly BlockName[] = [
  'bodice', 'skirt', 'sleeve', 'peplum', 'facing', 'waistband', 'dress', 'shirt-sleeve', 'collar-band', 'collar', 'pocket', 'belt',
];

/** The options shown for each block, with the grading core's defaults (grading/blocks). */
export const BLOCK_FIELDS: Record<BlockName, BlockField[]> = {
  bodice: [
    { path: 'bustEaseMm', kind: 'length', default: 2 * IN },
    { path: 'waistEaseMm', kind: 'length', default: IN },
    { path: 'waistDartMm', kind: 'length', default: 'bustMinusWaist' },
    { path: 'neckline.shape', kind: 'choice', choices: ['round', 'v', 'square', 'boat'], default: 'round' },
    { path: 'neckline.depthMm', kind: 'length', default: 'neckDepth' },
    { path: 'backNeckline', kind: 'choice', choices: ['standard', 'high'], default: 'standard' },
    { path: 'shoulderPads', kind: 'switch', default: false, on: {} },
    { path: 'centreBackOpening', kind: 'switch', default: false, on: {} },
    { path: 'seamMm', kind: 'length', default: 10 },
  ],
  skirt: [
    { path: 'shape', kind: 'choice', choices: ['straight', 'pencil', 'a-line', 'gathered', 'circle'], default: 'straight' },
    { path: 'lengthMm', kind: 'length', default: 'waistToKnee' },
    { path: 'waistEaseMm', kind: 'length', default: 0.5 * IN },
    { path: 'hipEaseMm', kind: 'length', default: 2 * IN },
    { path: 'fraction', kind: 'number', default: 1, step: 0.25 },
    { path: 'centreBackOpening', kind: 'switch', default: false, on: {} },
    { path: 'hemMm', kind: 'length', default: 'skirtHem' },
  ],
  sleeve: [
    { path: 'length', kind: 'choice', choices: ['short', 'three-quarter', 'long'], default: 'long' },
    { path: 'lengthMm', kind: 'length', default: 'fromArm' },
    { path: 'hemMm', kind: 'length', default: 'sleeveHem' },
  ],
  peplum: [
    { path: 'innerEdge.times', kind: 'number', default: 1, step: 0.5 },
    { path: 'innerEdge.plusMm', kind: 'length', default: 0 },
    { path: 'lengthMm', kind: 'length', default: 6 * IN },
    { path: 'cut', kind: 'choice', choices: ['ring', 'halves', 'quarters'], default: 'ring' },
    { path: 'cornerRadiusMm', kind: 'length', default: 0 },
  ],
  facing: [
    { path: 'of', kind: 'choice', choices: ['neckline', 'armhole', 'front-edge'], default: 'neckline' },
    { path: 'widthMm', kind: 'length', default: FACING_WIDTH_MM.neckline },
    { path: 'interfaced', kind: 'switch', default: true, on: true },
  ],
  waistband: [
    { path: 'widthMm', kind: 'length', default: 1.25 * IN },
    { path: 'extensionMm', kind: 'length', default: 1.25 * IN },
  ],
  dress: [
    { path: 'bustEaseMm', kind: 'length', default: 2 * IN },
    { path: 'waistEaseMm', kind: 'length', default: IN },
    { path: 'hipEaseMm', kind: 'length', default: 2 * IN },
    { path: 'lengthMm', kind: 'length', default: 'waistToKnee' },
    { path: 'hemFlareMm', kind: 'length', default: 60 },
    { path: 'buttonExtensionMm', kind: 'length', default: 0 },
    { path: 'hemMm', kind: 'length', default: 30 },
  ],
  'shirt-sleeve': [
    { path: 'capEaseMm', kind: 'length', default: 15 },
    { path: 'capHeightRatio', kind: 'number', default: 0.7, step: 0.05 },
    { path: 'underarmLengthMm', kind: 'length', default: 100 },
    { path: 'hemMm', kind: 'length', default: 25 },
  ],
  'collar-band': [
    { path: 'heightMm', kind: 'length', default: 30 },
    { path: 'extensionMm', kind: 'length', default: 15 },
  ],
  collar: [
    { path: 'heightMm', kind: 'length', default: 30 },
    { path: 'collar.widthMm', kind: 'length', default: 2.25 * IN },
    { path: 'collar.pointMm', kind: 'length', default: 0.5 * IN },
  ],
  pocket: [
    { path: 'kind', kind: 'choice', choices: ['patch', 'in-seam'], default: 'patch' },
    { path: 'widthMm', kind: 'length', default: 140 },
    { path: 'heightMm', kind: 'length', default: 160 },
    { path: 'fromCentreMm', kind: 'length', default: 115 },
    { path: 'belowWaistMm', kind: 'length', default: 'pocketTop' },
    { path: 'openingMm', kind: 'length', default: 6 * IN },
  ],
  belt: [
    { path: 'widthMm', kind: 'length', default: 35 },
    { path: 'extraMm', kind: 'length', default: 300 },
    { path: 'waistEaseMm', kind: 'length', default: IN },
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
