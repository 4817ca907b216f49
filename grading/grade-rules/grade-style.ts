import type { Piece } from '../pieces/piece';
import { edgeLength } from '../pieces/piece-measure';
import { sizeIndex, type SizeChart } from '../size-charts/size-chart';
import { gradePiece, type GradedPiece, type GradeIssue } from './grade-piece';
import type { GradeMove, GradeRule } from './grade-rule';
import { proposeGradeRules } from './propose-grade-rules';
import { proposeRulesFromRedraft, type RedraftStyle } from './propose-from-redraft';
import type { SeamSpec } from './seam-check';
import { SHIRT_DRESS_STYLE } from '../blocks/shirt-dress';

/** The seams of the demo shirt dress that must match in every size (tolerances: common practice). */
export const SHIRT_DRESS_SEAMS: SeamSpec[] = [
  { name: 'side seam', a: [{ pieceId: 'front', edges: ['side'] }], b: [{ pieceId: 'back', edges: ['side'] }], toleranceMm: 1 },
  { name: 'shoulder seam', a: [{ pieceId: 'front', edges: ['shoulder'] }], b: [{ pieceId: 'back', edges: ['shoulder'] }], toleranceMm: 2 },
  { name: 'sleeve underarm', a: [{ pieceId: 'sleeve', edges: ['underarm-front'] }], b: [{ pieceId: 'sleeve', edges: ['underarm-back'] }], toleranceMm: 0.5 },
  {
    name: 'sleeve cap to armhole', a: [{ pieceId: 'front', edges: ['armhole'] }, { pieceId: 'back', edges: ['armhole'] }],
    b: [{ pieceId: 'sleeve', edges: ['cap-front', 'cap-back'] }], easeMm: SHIRT_DRESS_STYLE.sleeveCapEaseMm, toleranceMm: 3,
  },
  {
    name: 'collar band to neckline', a: [{ pieceId: 'front', edges: ['neckline'] }, { pieceId: 'back', edges: ['neckline'] }],
    b: [{ pieceId: 'collar-band', edges: ['neckline'] }], toleranceMm: 1,
  },
  { name: 'front facing to front edge', a: [{ pieceId: 'front', edges: ['neckline', 'neck-extension', 'front-edge'] }], b: [{ pieceId: 'front-facing', edges: ['neckline', 'neck-extension', 'front-edge'] }], toleranceMm: 1 },
  { name: 'back facing to back neckline', a: [{ pieceId: 'back', edges: ['neckline'] }], b: [{ pieceId: 'back-neck-facing', edges: ['neckline'] }], toleranceMm: 1 },
];

/** Result of {@link gradeStyle}: rules and graded pieces keyed by piece id, plus all grading issues. */
export interface GradedStyle {
  rules: Record<string, GradeRule[]>;
  graded: Record<string, GradedPiece>;
  issues: GradeIssue[];
}

/**
 * Grade a style's pieces over a chart's run. With `redraft` (the style's blocks drafted from one size's
 * measurements), every piece the blocks draft takes its rules from the blocks redrafted in each size (see
 * proposeRulesFromRedraft: darts grade their intake, sleeves their cap); other pieces (an imported file) take the
 * rules proposed by role from the chart's grades, trued against their mates as a cutter trues a graded set: the
 * collar band's neckline is set to the graded half neckline (front + back), and the sleeve bicep steps are solved
 * (bisection) so that cap − armhole keeps the base size's ease in every size.
 */
export function gradeStyle(pieces: readonly Piece[], chart: SizeChart, baseSize: string, redraft?: RedraftStyle): GradedStyle {
  sizeIndex(chart, baseSize);
  const sizes = chart.sizes;
  const fromBlocks = redraft ? proposeRulesFromRedraft(pieces, chart, baseSize, redraft) : {};
  const rules: Record<string, GradeRule[]> = {};
  const graded: Record<string, GradedPiece> = {};
  for (const p of pieces) rules[p.id] = fromBlocks[p.id] ?? proposeGradeRules(p, chart, baseSize);
  for (const p of pieces) graded[p.id] = gradePiece(p, rules[p.id], sizes, baseSize);
  const front = graded.front, back = graded.back;
  const byId = Object.fromEntries(pieces.filter((p) => !fromBlocks[p.id]).map((p) => [p.id, p]));
  if (front && back) {
    const halfNeck = sizes.map((s) => edgeLength(front.bySize[s], ['neckline']) + edgeLength(back.bySize[s], ['neckline']));
    const armhole = sizes.map((s) => edgeLength(front.bySize[s], ['armhole']) + edgeLength(back.bySize[s], ['armhole']));
    if (byId['collar-band']) {
      rules['collar-band'] = trueCollar(rules['collar-band'], halfNeck);
      graded['collar-band'] = gradePiece(byId['collar-band'], rules['collar-band'], sizes, baseSize);
    }
    if (byId.sleeve) {
      rules.sleeve = trueSleeve(byId.sleeve, rules.sleeve, armhole, sizes, baseSize);
      graded.sleeve = gradePiece(byId.sleeve, rules.sleeve, sizes, baseSize);
    }
  }
  return { rules, graded, issues: Object.values(graded).flatMap((g) => g.issues) };
}

function trueCollar(rules: GradeRule[], halfNeck: number[]): GradeRule[] {
  const steps = halfNeck.slice(1).map((l, i) => ({ dx: l - halfNeck[i], dy: 0 }));
  return rules.map((r) => (r.landmark && r.landmark !== 'bottom-left' && r.landmark !== 'top-left' ? { ...r, steps } : r));
}

function capLength(sleeve: Piece, rules: GradeRule[], sizes: readonly string[], base: string, size: string): number {
  return edgeLength(gradePiece(sleeve, rules, sizes, base).bySize[size], ['cap-front', 'cap-back']);
}

/** Rules with the underarm/hem x-steps replaced by `halfBicepSteps` (± for front/back). */
function withBicep(rules: GradeRule[], halfBicepSteps: number[]): GradeRule[] {
  return rules.map((r) => {
    const sign = r.landmark?.endsWith('front') ? -1 : r.landmark?.endsWith('back') ? 1 : 0;
    if (!sign) return r;
    return { ...r, steps: r.steps.map((s: GradeMove, i) => ({ dx: sign * halfBicepSteps[i], dy: s.dy })) };
  });
}

function trueSleeve(sleeve: Piece, rules: GradeRule[], armhole: number[], sizes: readonly string[], base: string): GradeRule[] {
  const b = sizeIndex({ sizes }, base);
  const ease = edgeLength(sleeve, ['cap-front', 'cap-back']) - armhole[b];
  const cum = sizes.map(() => 0);
  // Solve each size's cumulative half-bicep move from the base outwards; cap length grows with the bicep.
  const order = sizes.map((_, i) => i).filter((i) => i !== b).sort((x, y) => Math.abs(x - b) - Math.abs(y - b));
  for (const i of order) {
    let lo = -150, hi = 150;
    for (let it = 0; it < 50; it++) {
      const mid = (lo + hi) / 2;
      cum[i] = mid;
      const steps = cum.slice(1).map((c, k) => c - cum[k]);
      const len = capLength(sleeve, withBicep(rules, steps), sizes, base, sizes[i]);
      if (len < armhole[i] + ease) lo = mid;
      else hi = mid;
    }
    cum[i] = (lo + hi) / 2;
  }
  return withBicep(rules, cum.slice(1).map((c, k) => c - cum[k]));
}
