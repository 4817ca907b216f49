import type { Piece } from '../pieces/piece';
import { computeGrades, sizeIndex, type PointOfMeasure, type SizeChart } from '../size-charts/size-chart';
import { SHIRT_DRESS_STYLE } from '../blocks/shirt-dress';
import type { GradeMove, GradeRule } from './grade-rule';

type G = (pom: PointOfMeasure) => number;
type Table = Record<string, (g: G) => GradeMove>;

const mv = (dx: number, dy: number): GradeMove => ({ dx, dy });
/** Underarm rises with back waist length and drops with armhole depth (both pieces: same side seam). */
const underarmDy = (g: G) => g('back-waist-length') - g('armhole-depth');
/** Neck width and front neck depth are neck/6 + constant in the block, so both grade by neck/6. */
const neck = (g: G) => g('neck-base') / 6;
/** Side waist sits halfway between quarter bust and quarter waist (the side takes half the suppression). */
const sideWaist = (g: G) => (g('bust') + g('waist')) / 8;

const SIDE: Table = {
  'side-hem': (g) => mv(g('hip') / 4, -g('waist-to-knee')),
  'side-hip': (g) => mv(g('hip') / 4, -g('waist-to-hip')),
  'side-waist': (g) => mv(sideWaist(g), 0),
  // Fasanella: the half front and half back each take a quarter of the girth grade (§2.1).
  underarm: (g) => mv(g('bust') / 4, underarmDy(g)),
};

const FRONT: Table = {
  ...SIDE,
  'cf-hem': (g) => mv(0, -g('waist-to-knee')),
  'cf-waist': () => mv(0, 0),
  across: (g) => mv(g('across-front') / 2, (g('front-waist-length') + underarmDy(g)) / 2),
  // Half the shoulder-width grade is split: the neck point takes neck/6, the shoulder length the rest.
  shoulder: (g) => mv(g('shoulder-width') / 2, g('front-waist-length')),
  hps: (g) => mv(neck(g), g('front-waist-length')),
  'cf-neck': (g) => mv(0, g('front-waist-length') - neck(g)),
  'cf-neck-ext': (g) => mv(0, g('front-waist-length') - neck(g)),
};

const BACK: Table = {
  ...SIDE,
  'cb-hem': (g) => mv(0, -g('waist-to-knee')),
  'cb-waist': () => mv(0, 0),
  across: (g) => mv(g('across-back') / 2, (g('back-waist-length') + underarmDy(g)) / 2),
  shoulder: (g) => mv(g('shoulder-width') / 2, g('back-waist-length')),
  hps: (g) => mv(neck(g), g('back-waist-length')),
  'cb-neck': (g) => mv(0, g('back-waist-length')),
};

const capDy = (g: G) => SHIRT_DRESS_STYLE.capHeightRatio * ((g('front-waist-length') + g('back-waist-length')) / 2 - underarmDy(g));
const SLEEVE: Table = {
  'hem-front': (g) => mv(-g('upper-arm') / 2, 0),
  'hem-back': (g) => mv(g('upper-arm') / 2, 0),
  'underarm-back': (g) => mv(g('upper-arm') / 2, 0),
  'underarm-front': (g) => mv(-g('upper-arm') / 2, 0),
  'cap-top': (g) => mv(0, capDy(g)),
};

const halfNeck = (g: G) => g('neck-base') / 2;
const TABLES: Record<string, Table> = {
  front: FRONT,
  'front-facing': FRONT,
  back: BACK,
  'back-facing': BACK,
  sleeve: SLEEVE,
  'collar-band': {
    'bottom-left': () => mv(0, 0), 'top-left': () => mv(0, 0),
    'bottom-notch-0': (g) => mv(halfNeck(g), 0), 'bottom-right': (g) => mv(halfNeck(g), 0), 'top-right': (g) => mv(halfNeck(g), 0),
  },
  belt: { 'bottom-left': () => mv(0, 0), 'top-left': () => mv(0, 0), 'bottom-right': (g) => mv(g('waist'), 0), 'top-right': (g) => mv(g('waist'), 0) },
  'skirt-front': { 'cf-hem': () => mv(0, 0), 'side-hem': (g) => mv(g('hip') / 4, 0), 'side-hip': (g) => mv(g('hip') / 4, -g('waist-to-hip')), 'side-waist': (g) => mv(g('waist') / 4, 0), 'cf-waist': () => mv(0, 0) },
  'skirt-back': { 'cb-hem': () => mv(0, 0), 'side-hem': (g) => mv(g('hip') / 4, 0), 'side-hip': (g) => mv(g('hip') / 4, -g('waist-to-hip')), 'side-waist': (g) => mv(g('waist') / 4, 0), 'cb-waist': () => mv(0, 0) },
};

/** Feature rules for the bodice/dress darts, drill holes and reference lines (front and back). */
function featureRules(piece: Piece, g: G): Record<string, GradeMove> {
  const out: Record<string, GradeMove> = {};
  const isFront = piece.role === 'front';
  if (piece.role !== 'front' && piece.role !== 'back') return out;
  const apexDy = isFront ? g('front-waist-length') - g('bust-point-height') : underarmDy(g);
  const dartDx = g('bust-point-span') / 2;
  for (const line of piece.internalLines) {
    line.points.forEach((p, j) => {
      const key = `line:${line.name}:${j}`;
      if (line.name === 'waist-dart') out[key] = mv(dartDx, p.y > 0 ? apexDy : p.y < 0 ? -0.6 * g('waist-to-hip') : 0);
      if (line.name === 'chest-line') out[key] = mv(j === 0 ? 0 : g('across-front') / 2, g('front-waist-length') - g('bust-point-height'));
      if (line.name === 'centre-front') out[key] = j === 0 ? FRONT['cf-neck'](g) : FRONT['cf-hem'](g);
    });
  }
  piece.drillHoles.forEach((p, i) => (out[`drill:${i}`] = mv(dartDx, p.y > 0 ? apexDy : -0.6 * g('waist-to-hip'))));
  out['grain:from'] = mv(dartDx / 2, -g('waist-to-knee'));
  out['grain:to'] = mv(dartDx / 2, isFront ? g('front-waist-length') - g('bust-point-height') : underarmDy(g));
  return out;
}

/** Roles that keep their size in every size (a pocket is cut the same for the whole run). */
const UNGRADED_ROLES = new Set(['pocket']);

/**
 * Proportional rules for a piece of a role the tables do not know (an imported file's pieces): every outline point,
 * drill hole, internal line point and the grain line moves away from the piece's lower-left corner in proportion to
 * the chart: across by the bust girth's ratio to the base size, up by the back waist length's (the bust's when the
 * chart lacks it). Edge starts are labelled `<edge> start`, landmarks by name. Empty when the chart has no bust row.
 */
function proportionalRules(piece: Piece, chart: SizeChart, baseSize: string): GradeRule[] {
  const across = chart.values.bust ?? chart.values.waist ?? chart.values.hip;
  if (!across) return [];
  const up = chart.values['back-waist-length'] ?? across;
  const b = sizeIndex(chart, baseSize);
  const minX = Math.min(...piece.outline.map((p) => p.x)), minY = Math.min(...piece.outline.map((p) => p.y));
  const steps = (p: { x: number; y: number }): GradeMove[] =>
    chart.sizes.slice(1).map((_, i) => ({ dx: ((p.x - minX) * (across[i + 1] - across[i])) / across[b], dy: ((p.y - minY) * (up[i + 1] - up[i])) / up[b] }));
  const label = new Map<number, string>();
  piece.edges.forEach((e) => label.set(e.from, `${e.name} start`));
  for (const [name, i] of Object.entries(piece.landmarks)) label.set(i, name);
  const rules: GradeRule[] = piece.outline.map((p, index) => ({ target: { kind: 'vertex' as const, index }, ...(label.has(index) ? { landmark: label.get(index) } : {}), steps: steps(p) }));
  piece.drillHoles.forEach((p, i) => rules.push({ target: { kind: 'feature', key: `drill:${i}` }, steps: steps(p) }));
  const seen = new Set<string>();
  for (const line of piece.internalLines) {
    line.points.forEach((p, j) => {
      const key = `line:${line.name}:${j}`;
      if (seen.has(key)) return;
      seen.add(key);
      rules.push({ target: { kind: 'feature', key }, steps: steps(p) });
    });
  }
  rules.push({ target: { kind: 'feature', key: 'grain:from' }, steps: steps(piece.grainLine.from) }, { target: { kind: 'feature', key: 'grain:to' }, steps: steps(piece.grainLine.to) });
  return rules;
}

/**
 * Propose grade rules for a piece from a size chart's per-step grades (break points come for free: each step
 * uses that step's grade). Rules sit on the piece's named landmarks, chosen by `piece.role`
 * (front, back, their facings, sleeve, collar-band, belt, skirt-front/back); pockets get no rules (they do not
 * grade); any other role grades in proportion to the chart (see proportionalRules). Missing chart rows grade by 0.
 * Throws RangeError if baseSize is not in the chart.
 */
export function proposeGradeRules(piece: Piece, chart: SizeChart, baseSize: string): GradeRule[] {
  sizeIndex(chart, baseSize);
  if (!TABLES[piece.role] && !UNGRADED_ROLES.has(piece.role)) return proportionalRules(piece, chart, baseSize);
  const grades = computeGrades(chart);
  const table = TABLES[piece.role] ?? {};
  const steps = chart.sizes.length - 1;
  const perStep = <T>(f: (g: G) => T): T[] =>
    Array.from({ length: steps }, (_, i) => f((pom) => grades[pom]?.[i] ?? 0));
  const rules: GradeRule[] = [];
  for (const [landmark, index] of Object.entries(piece.landmarks).sort((a, b) => a[1] - b[1])) {
    const f = table[landmark];
    if (f) rules.push({ target: { kind: 'vertex', index }, landmark, steps: perStep(f) });
  }
  const featureSteps = perStep((g) => featureRules(piece, g));
  for (const key of Object.keys(featureSteps[0] ?? {})) {
    rules.push({ target: { kind: 'feature', key }, steps: featureSteps.map((s) => s[key]) });
  }
  return rules;
}
