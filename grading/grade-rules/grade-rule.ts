import type { Point } from '@shared/geometry/types';
import { sizeIndex } from '../size-charts/size-chart';
import type { Piece } from '../pieces/piece';

/** A movement in mm (x across, y up, in the piece's frame). */
export interface GradeMove {
  dx: number;
  dy: number;
}

/** What a rule moves: an outline vertex, or a feature: `drill:<i>`, `line:<name>:<j>`, `grain:from|to`. */
export type GradeTarget = { kind: 'vertex'; index: number } | { kind: 'feature'; key: string };

/**
 * A grade rule: the movement of one grade point for each size step of the run; steps[i] moves size i to size
 * i + 1 (length = sizes − 1). Steps may differ along the run (break points).
 */
export interface GradeRule {
  target: GradeTarget;
  landmark?: string;
  steps: GradeMove[];
}

/** Cumulative movement from `baseSize` to `size` (moving down the run subtracts the steps in between). */
export function cumulativeMove(steps: readonly GradeMove[], sizes: readonly string[], baseSize: string, size: string): GradeMove {
  const b = sizeIndex({ sizes }, baseSize);
  const s = sizeIndex({ sizes }, size);
  if (steps.length !== sizes.length - 1) throw new RangeError(`rule has ${steps.length} steps for ${sizes.length} sizes`);
  let dx = 0, dy = 0;
  for (let i = Math.min(b, s); i < Math.max(b, s); i++) {
    dx += steps[i].dx;
    dy += steps[i].dy;
  }
  return s >= b ? { dx, dy } : { dx: -dx, dy: -dy };
}

/** Per-size displacement of every outline vertex and feature point. */
export interface Displacement {
  outline: GradeMove[];
  feature: (key: string) => GradeMove;
}

/**
 * Displacement field for one size. Ruled vertices move by their rule; the other outline vertices take a
 * blend of the nearest ruled vertices before and after them, weighted by vertex count (curves are flattened with
 * uniform parameter steps, so this follows the curve parameter). Unruled features move by the mean outline
 * displacement. The field depends only on the rules and vertex indices, never on coordinates, so grading is
 * exactly reversible. No rules → no movement.
 */
export function displacementFor(piece: Pick<Piece, 'outline'>, rules: readonly GradeRule[], sizes: readonly string[], baseSize: string, size: string): Displacement {
  const n = piece.outline.length;
  const at = new Map<number, GradeMove>();
  const features = new Map<string, GradeMove>();
  for (const r of rules) {
    const mv = cumulativeMove(r.steps, sizes, baseSize, size);
    if (r.target.kind === 'vertex') at.set(r.target.index, mv);
    else features.set(r.target.key, mv);
  }
  const ruled = [...at.keys()].sort((a, b) => a - b);
  const outline: GradeMove[] = [];
  for (let k = 0; k < n; k++) {
    if (ruled.length === 0) outline.push({ dx: 0, dy: 0 });
    else if (at.has(k)) outline.push(at.get(k)!);
    else {
      const prev = [...ruled].reverse().find((i) => i < k) ?? ruled[ruled.length - 1];
      const next = ruled.find((i) => i > k) ?? ruled[0];
      const span = (next - prev + n) % n || n;
      const t = ((k - prev + n) % n) / span;
      const a = at.get(prev)!, b = at.get(next)!;
      outline.push({ dx: a.dx + (b.dx - a.dx) * t, dy: a.dy + (b.dy - a.dy) * t });
    }
  }
  const mean = { dx: outline.reduce((s, m) => s + m.dx, 0) / Math.max(n, 1), dy: outline.reduce((s, m) => s + m.dy, 0) / Math.max(n, 1) };
  return { outline, feature: (key) => features.get(key) ?? mean };
}

/** Apply (sign = 1) or remove (sign = −1) a displacement. Returns a new piece; indices, edges and landmarks kept. */
export function applyDisplacement(piece: Piece, d: Displacement, sign: 1 | -1): Piece {
  const mv = (p: Point, m: GradeMove): Point => ({ x: p.x + sign * m.dx, y: p.y + sign * m.dy });
  return {
    ...piece,
    outline: piece.outline.map((p, i) => mv(p, d.outline[i])),
    edges: piece.edges.map((e) => ({ ...e })),
    notches: [...piece.notches],
    landmarks: { ...piece.landmarks },
    drillHoles: piece.drillHoles.map((p, i) => mv(p, d.feature(`drill:${i}`))),
    internalLines: piece.internalLines.map((l) => ({ ...l, points: l.points.map((p, j) => mv(p, d.feature(`line:${l.name}:${j}`))) })),
    grainLine: { from: mv(piece.grainLine.from, d.feature('grain:from')), to: mv(piece.grainLine.to, d.feature('grain:to')) },
  };
}
