import {
  checkSeams, cuttingOutline, gradePiece, proposeSeams, seamProblem, validateCuttingOutline,
  type GradedPiece, type GradeIssue, type SeamCheck, type SeamSpec,
} from '@grading';
import type { Polygon } from '@shared/geometry/types';
import type { StoredGradingSet } from './grading-set.repository';

/** A stored set graded over its run: pieces per size, seam checks, and every error found on the way. */
export interface ComputedGrading {
  sizes: string[];
  baseSize: string;
  graded: Record<string, GradedPiece>;
  baseCutting: Record<string, Polygon>;
  seams: (SeamCheck & { toleranceMm: number })[];
  errors: { pieceId?: string; size?: string; code: string; message: string }[];
}

const cache = new Map<string, ComputedGrading>();
const CACHE_LIMIT = 20;

/**
 * Grade every stored piece by its stored rules. Pure apart from a small memo keyed by the set's content (the
 * same chart, pieces and rules always grade the same). A rule with the wrong step count or an unknown size is
 * reported as an error for that piece, which is then left out. Seams are the style's own (`seams`) or, when it has
 * none, proposed from the pieces; a seam naming a piece or edge the set lacks is reported, not checked.
 */
export function computeGrading(set: Pick<StoredGradingSet, 'sizeChart' | 'pieces' | 'gradeRules'> & { seams?: SeamSpec[] | null }, styleBase: string): ComputedGrading {
  const key = JSON.stringify([styleBase, set.sizeChart?.sizes, set.pieces, set.gradeRules, set.seams]);
  const hit = cache.get(key);
  if (hit) return hit;
  const sizes = set.sizeChart?.sizes ?? [];
  const baseSize = sizes.includes(styleBase) ? styleBase : (sizes[0] ?? styleBase);
  const graded: Record<string, GradedPiece> = {};
  const baseCutting: Record<string, Polygon> = {};
  const errors: ComputedGrading['errors'] = [];
  for (const piece of set.pieces) {
    try {
      graded[piece.id] = gradePiece(piece, set.gradeRules[piece.id] ?? [], sizes, baseSize);
    } catch (e) {
      errors.push({ pieceId: piece.id, code: 'bad_rule', message: `${piece.name}: ${(e as Error).message}` });
      continue;
    }
    const cut = cuttingOutline(piece);
    baseCutting[piece.id] = cut;
    for (const issue of validateCuttingOutline(piece, cut, 0.5)) {
      errors.push({ pieceId: piece.id, size: baseSize, code: `cutting_${issue.code}`, message: `${piece.name}: ${issue.message}` });
    }
  }
  errors.push(...Object.values(graded).flatMap((g) => g.issues.map((i: GradeIssue) => ({ pieceId: i.pieceId, size: i.size, code: i.code, message: i.message }))));
  const specs = set.seams ?? proposeSeams(set.pieces);
  for (const s of specs) {
    const problem = seamProblem(s, set.pieces.filter((p) => graded[p.id]));
    if (problem) errors.push({ code: 'seam_unknown', message: `Seam ${problem}` });
  }
  const seams = sizes.length ? seamChecks(graded, specs.filter((s) => !seamProblem(s, set.pieces.filter((p) => graded[p.id])))) : [];
  for (const s of seams.filter((c) => !c.ok)) {
    errors.push({ size: s.size, code: 'seam_mismatch', message: `${s.seam}, size ${s.size}: off by ${(s.differenceMm - s.expectedMm).toFixed(1)} mm (allowed ±${s.toleranceMm} mm)` });
  }
  const out = { sizes, baseSize, graded, baseCutting, seams, errors };
  if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value as string);
  cache.set(key, out);
  return out;
}

/** Seam checks, each with its tolerance. */
function seamChecks(graded: Record<string, GradedPiece>, specs: readonly SeamSpec[]): ComputedGrading['seams'] {
  return specs.flatMap((s) => checkSeams(graded, [s]).map((c) => ({ ...c, toleranceMm: s.toleranceMm })));
}
