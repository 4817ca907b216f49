import type { Point } from '@shared/geometry/types';
import type { BodyMeasurements } from '../blocks/measure-input';
import type { Piece } from '../pieces/piece';
import { measurementsForSize, sizeIndex, type SizeChart } from '../size-charts/size-chart';
import type { GradeMove, GradeRule } from './grade-rule';

/** A style's pieces drafted from one size's body measurements (mm); ids must be the same in every size. */
export type RedraftStyle = (m: BodyMeasurements) => readonly Piece[];

/** A grade point of the base piece and how to find the same point on a redrafted piece. */
interface Anchor {
  index: number;
  label: string;
  find: (q: Piece) => number | undefined;
}

/**
 * Grade rules for every piece the blocks draft, read off the blocks redrafted from each size's chart measurements:
 * each grade point moves, step by step, as the same point moves between the redrafted sizes, so everything the
 * block computes from the chart grades with it (dart intake from bust − waist, cap height from the armhole, a peplum
 * radius from the waist). Grade points: every landmark, every notch and every edge end of the outline (matched by
 * name, then by order when the redrafted piece has as many notches and the same edges), labelled by landmark name,
 * `notch <k>` or `<edge> start`; every outline point in between, unlabelled, at the same fraction of the arc length
 * between its two grade points (a curve keeps its shape: a peplum's hem stays a circle); every drill hole, internal
 * line point and the grain line (matched by order).
 * Pieces the redraft does not give in every size, or whose edges change between sizes, are left out of the result
 * (the caller falls back to its own rules). Throws RangeError for an unknown base size or a measurement a block needs
 * that the chart lacks.
 */
export function proposeRulesFromRedraft(pieces: readonly Piece[], chart: SizeChart, baseSize: string, redraft: RedraftStyle): Record<string, GradeRule[]> {
  sizeIndex(chart, baseSize);
  const drafts = chart.sizes.map((s) => new Map(redraft(measurementsForSize(chart, s) as BodyMeasurements).map((p) => [p.id, p])));
  const out: Record<string, GradeRule[]> = {};
  for (const piece of pieces) {
    const bySize = drafts.map((d) => d.get(piece.id));
    if (bySize.some((q) => !q || !sameEdges(piece, q))) continue;
    out[piece.id] = rulesFor(piece, bySize as Piece[]);
  }
  return out;
}

function sameEdges(a: Piece, b: Piece): boolean {
  return a.edges.length === b.edges.length && a.edges.every((e, i) => e.name === b.edges[i].name);
}

function anchorsOf(piece: Piece): Anchor[] {
  const byIndex = new Map<number, Anchor>();
  for (const [name, index] of Object.entries(piece.landmarks)) byIndex.set(index, { index, label: name, find: (q) => q.landmarks[name] });
  piece.notches.forEach((index, k) => {
    if (!byIndex.has(index)) byIndex.set(index, { index, label: `notch ${k + 1}`, find: (q) => (q.notches.length === piece.notches.length ? q.notches[k] : undefined) });
  });
  piece.edges.forEach((e, k) => {
    if (!byIndex.has(e.from)) byIndex.set(e.from, { index: e.from, label: `${e.name} start`, find: (q) => q.edges[k].from });
  });
  return [...byIndex.values()].sort((a, b) => a.index - b.index);
}

/** Outline vertices from index a round to index b, both included (the whole ring when a = b). */
function run(ring: readonly Point[], a: number, b: number): Point[] {
  const n = ring.length;
  const out = [ring[a]];
  for (let i = (a + 1) % n; ; i = (i + 1) % n) {
    out.push(ring[i]);
    if (i === b) break;
  }
  return out;
}

/** Cumulative arc length at each vertex of a polyline. */
function cumulative(pts: readonly Point[]): number[] {
  const out = [0];
  for (let i = 1; i < pts.length; i++) out.push(out[i - 1] + Math.hypot(pts[i].x - pts[i - 1].x, pts[i].y - pts[i - 1].y));
  return out;
}

/** The point at fraction t (0–1) of a polyline's arc length. */
function atFraction(pts: readonly Point[], t: number): Point {
  const c = cumulative(pts);
  const want = t * c[c.length - 1];
  let i = 1;
  while (i < pts.length - 1 && c[i] < want) i++;
  const seg = c[i] - c[i - 1];
  const u = seg > 0 ? (want - c[i - 1]) / seg : 0;
  return { x: pts[i - 1].x + (pts[i].x - pts[i - 1].x) * u, y: pts[i - 1].y + (pts[i].y - pts[i - 1].y) * u };
}

/** Rules for the outline points between neighbouring grade points, at the same arc-length fraction on each size. */
function inBetweenRules(piece: Piece, bySize: readonly Piece[], anchors: readonly Anchor[]): GradeRule[] {
  const rules: GradeRule[] = [];
  anchors.forEach((a, k) => {
    const b = anchors[(k + 1) % anchors.length];
    const base = run(piece.outline, a.index, b.index);
    if (base.length <= 2) return;
    const c = cumulative(base);
    const total = c[c.length - 1];
    const spans = bySize.map((q) => {
      const i = a.find(q), j = b.find(q);
      return i === undefined || j === undefined ? undefined : run(q.outline, i, j);
    });
    if (spans.some((s) => !s) || total === 0) return;
    for (let m = 1; m < base.length - 1; m++) {
      const pts = spans.map((s) => atFraction(s!, c[m] / total));
      rules.push({ target: { kind: 'vertex', index: (a.index + m) % piece.outline.length }, steps: pts.slice(1).map((p, i) => diff(pts[i], p)) });
    }
  });
  return rules;
}

const diff = (a: Point, b: Point): GradeMove => ({ dx: b.x - a.x, dy: b.y - a.y });

/** Per-step moves of one point located on each size's piece; null when some size lacks it. */
function stepsOf(bySize: readonly Piece[], at: (q: Piece) => Point | undefined): GradeMove[] | null {
  const pts = bySize.map(at);
  if (pts.some((p) => !p)) return null;
  return pts.slice(1).map((p, i) => diff(pts[i]!, p!));
}

function rulesFor(piece: Piece, bySize: readonly Piece[]): GradeRule[] {
  const rules: GradeRule[] = [];
  const anchors = anchorsOf(piece).filter((a) => bySize.every((q) => a.find(q) !== undefined));
  for (const a of anchors) {
    const steps = stepsOf(bySize, (q) => q.outline[a.find(q)!]);
    if (steps) rules.push({ target: { kind: 'vertex', index: a.index }, landmark: a.label, steps });
  }
  rules.push(...inBetweenRules(piece, bySize, anchors));
  const order = (r: GradeRule) => (r.target.kind === 'vertex' ? r.target.index : Infinity);
  rules.sort((x, y) => order(x) - order(y) || 0);
  const seen = new Set<string>();
  const feature = (key: string, at: (q: Piece) => Point | undefined) => {
    if (seen.has(key)) return;
    seen.add(key);
    const steps = stepsOf(bySize, at);
    if (steps) rules.push({ target: { kind: 'feature', key }, steps });
  };
  piece.drillHoles.forEach((_, i) => feature(`drill:${i}`, (q) => (q.drillHoles.length === piece.drillHoles.length ? q.drillHoles[i] : undefined)));
  piece.internalLines.forEach((line, k) => {
    line.points.forEach((_, j) => feature(`line:${line.name}:${j}`, (q) => {
      const same = q.internalLines[k];
      return same && same.name === line.name && same.points.length === line.points.length ? same.points[j] : undefined;
    }));
  });
  feature('grain:from', (q) => q.grainLine.from);
  feature('grain:to', (q) => q.grainLine.to);
  return rules;
}
