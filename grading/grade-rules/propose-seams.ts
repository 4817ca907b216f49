import type { Piece } from '../pieces/piece';
import { edgeLength } from '../pieces/piece-measure';
import type { SeamSide, SeamSpec } from './seam-check';

/** Tolerances of a proposed seam's length match, mm (common practice: tighter on short straight seams). */
export const SEAM_TOLERANCE_MM = { side: 1, shoulder: 2, underarm: 0.5, cap: 3, neckline: 1, facing: 1 } as const;

type AnyPiece = Piece & { material?: string };

/** Edges a facing shares with the piece it faces. */
const FACED_EDGES = ['neckline', 'neck-extension', 'front-edge', 'armhole'];

const has = (p: Piece, ...names: string[]) => names.every((n) => p.edges.some((e) => e.name === n));
const side = (p: Piece, ...edges: string[]): SeamSide => ({ pieceId: p.id, edges });
const round1 = (x: number) => Math.round(x * 10) / 10;

/**
 * Seams of a pattern, proposed from its pieces' roles and edge names so the seam check works for any drafted style:
 * within each material (interfacing is fused, not sewn), the n-th front with the n-th back (side and shoulder), skirt
 * fronts with backs (side), a sleeve's two underarm edges, its cap against the armholes of the first front and back
 * (the intended ease is the cap's ease in the base pieces, rounded to 0.1 mm), a collar band against the front and
 * back necklines, and each facing against the piece it faces (its edges of the same name). Seams are named
 * "Side seam", "Shoulder seam"…, with the material added when it is not the self fabric and a number when a
 * material has several. Pieces whose roles are not known to the blocks get no seams; an owner adds them by hand.
 */
export function proposeSeams(pieces: readonly AnyPiece[]): SeamSpec[] {
  const out: SeamSpec[] = [];
  const materials = [...new Set(pieces.map((p) => p.material ?? 'self'))].filter((m) => m !== 'interfacing');
  for (const material of materials) {
    const group = pieces.filter((p) => (p.material ?? 'self') === material);
    const suffix = material === 'self' ? '' : ` (${material})`;
    const add = (name: string, spec: Omit<SeamSpec, 'name'>) => {
      const taken = out.filter((s) => s.name === name + suffix || s.name.startsWith(`${name}${suffix} `)).length;
      out.push({ name: taken ? `${name}${suffix} ${taken + 1}` : name + suffix, ...spec });
    };
    const fronts = group.filter((p) => p.role === 'front'), backs = group.filter((p) => p.role === 'back');
    fronts.forEach((f, k) => {
      const b = backs[k];
      if (!b) return;
      for (const edge of ['side', 'shoulder'] as const) {
        if (has(f, edge) && has(b, edge)) add(edge === 'side' ? 'Side seam' : 'Shoulder seam', { a: [side(f, edge)], b: [side(b, edge)], toleranceMm: SEAM_TOLERANCE_MM[edge] });
      }
    });
    group.filter((p) => p.role === 'skirt-front').forEach((f, k) => {
      const b = group.filter((p) => p.role === 'skirt-back')[k];
      if (b && has(f, 'side') && has(b, 'side')) add('Skirt side seam', { a: [side(f, 'side')], b: [side(b, 'side')], toleranceMm: SEAM_TOLERANCE_MM.side });
    });
    const [front, back] = [fronts[0], backs[0]];
    for (const sleeve of group.filter((p) => p.role === 'sleeve')) {
      if (has(sleeve, 'underarm-front', 'underarm-back')) add('Sleeve underarm', { a: [side(sleeve, 'underarm-front')], b: [side(sleeve, 'underarm-back')], toleranceMm: SEAM_TOLERANCE_MM.underarm });
      const cap = has(sleeve, 'cap') ? ['cap'] : has(sleeve, 'cap-front', 'cap-back') ? ['cap-front', 'cap-back'] : null;
      if (cap && front && back && has(front, 'armhole') && has(back, 'armhole')) {
        const ease = edgeLength(sleeve, cap) - edgeLength(front, ['armhole']) - edgeLength(back, ['armhole']);
        add('Sleeve cap to armhole', { a: [side(front, 'armhole'), side(back, 'armhole')], b: [side(sleeve, ...cap)], easeMm: round1(ease), toleranceMm: SEAM_TOLERANCE_MM.cap });
      }
    }
    for (const band of group.filter((p) => p.role === 'collar-band' && has(p, 'neckline'))) {
      if (front && back && has(front, 'neckline') && has(back, 'neckline')) {
        add('Collar band to neckline', { a: [side(front, 'neckline'), side(back, 'neckline')], b: [side(band, 'neckline')], toleranceMm: SEAM_TOLERANCE_MM.neckline });
      }
    }
    for (const facing of group.filter((p) => p.role === 'front-facing' || p.role === 'back-facing')) {
      const mate = facing.role === 'front-facing' ? front : back;
      const edges = mate ? FACED_EDGES.filter((e) => has(facing, e) && has(mate, e)) : [];
      if (mate && edges.length) add(`${facing.name} to ${mate.name.toLowerCase()}`, { a: [side(mate, ...edges)], b: [side(facing, ...edges)], toleranceMm: SEAM_TOLERANCE_MM.facing });
    }
  }
  return out;
}

/** Why a seam cannot be checked on these pieces (a piece or an edge it names is missing), or null when it can. */
export function seamProblem(seam: SeamSpec, pieces: readonly Pick<Piece, 'id' | 'name' | 'edges'>[]): string | null {
  for (const part of [...seam.a, ...seam.b]) {
    const p = pieces.find((x) => x.id === part.pieceId);
    if (!p) return `${seam.name}: there is no piece "${part.pieceId}"`;
    const missing = part.edges.find((name) => !p.edges.some((e) => e.name === name));
    if (missing) return `${seam.name}: ${p.name} has no edge "${missing}"`;
  }
  return null;
}
