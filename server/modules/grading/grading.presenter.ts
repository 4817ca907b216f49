import { buildSpecSheet, computeGrades, designateByBust, type Piece, type SizeChart } from '@grading';
import type { GradedPieceDto, GradedShapeDto, GradingDto } from '../../../shared/schemas/grading';
import type { ComputedGrading } from './grading-compute';
import type { StoredGradingSet } from './grading-set.repository';

const r3 = (n: number) => Math.round(n * 1000) / 1000;
const pt = (p: { x: number; y: number }) => ({ x: r3(p.x), y: r3(p.y) });

function shape(p: Piece): GradedShapeDto {
  return {
    outline: p.outline.map(pt),
    grainLine: { from: pt(p.grainLine.from), to: pt(p.grainLine.to) },
    notches: p.notches.map((i) => pt(p.outline[i])),
    drillHoles: p.drillHoles.map(pt),
    internalLines: p.internalLines.map((l) => ({ kind: l.kind, name: l.name, points: l.points.map(pt) })),
  };
}

/** The chart as grid rows with the grade between neighbouring sizes. */
export function presentChart(chart: SizeChart): NonNullable<GradingDto['chart']> {
  const grades = computeGrades(chart);
  return {
    name: chart.name,
    sizes: chart.sizes,
    rows: Object.entries(chart.values).map(([pom, values]) => ({
      pointOfMeasure: pom,
      values: (values ?? []).map(r3),
      grades: (grades[pom as keyof typeof grades] ?? []).map(r3),
    })),
  };
}

/** A stored piece's material; pieces stored before materials existed are self. */
export const materialOf = (p: object): string => ('material' in p && typeof p.material === 'string' ? p.material : 'self');

/** The whole grading view of a style; `set` null gives an empty view over the style's run. */
export function presentGrading(styleId: number, styleRun: string[], styleBase: string, set: StoredGradingSet | null, computed: ComputedGrading | null): GradingDto {
  const chart = set?.sizeChart ?? null;
  const bust = chart?.values.bust;
  const designations = Object.fromEntries((chart?.sizes ?? styleRun).map((s, i) => [s, bust ? (designateByBust(bust[i])?.label ?? null) : null]));
  const pieces: GradedPieceDto[] = (set?.pieces ?? []).flatMap((p) => {
    const g = computed?.graded[p.id];
    if (!g) return [];
    return [{
      id: p.id, name: p.name, role: p.role, cut: p.cut, quantity: p.quantity, material: materialOf(p), landmarks: p.landmarks,
      edges: p.edges.map((e) => ({ name: e.name, allowanceMm: e.allowanceMm, isFold: !!e.isFold })),
      rules: set?.gradeRules[p.id] ?? [],
      bySize: Object.fromEntries(g.sizes.map((s) => [s, shape(g.bySize[s])])),
      baseCutting: (computed?.baseCutting[p.id] ?? []).map(pt),
      measurements: Object.fromEntries(g.sizes.map((s) => {
        const m = g.measurements[s];
        return [s, { areaMm2: r3(m.areaMm2), widthMm: r3(m.widthMm), heightMm: r3(m.heightMm), edgeLengthsMm: Object.fromEntries(Object.entries(m.edgeLengthsMm).map(([k, v]) => [k, r3(v)])) }];
      })),
    }];
  });
  const eases = Object.fromEntries(Object.entries(set?.eases ?? {}).map(([k, v]) => [k, { easeMm: v!.easeMm, toleranceMm: v!.toleranceMm }]));
  return {
    styleId,
    baseSize: computed?.baseSize ?? styleBase,
    sizes: chart?.sizes ?? styleRun,
    chart: chart ? presentChart(chart) : null,
    designations,
    eases,
    specSheet: chart ? buildSpecSheet(chart, set?.eases ?? {}).map((r) => ({ pointOfMeasure: r.pointOfMeasure, size: r.size, bodyMm: r3(r.bodyMm), garmentMm: r3(r.garmentMm), minMm: r3(r.minMm), maxMm: r3(r.maxMm) })) : [],
    pieces,
    seams: (computed?.seams ?? []).map((s) => ({ ...s, lengthAMm: r3(s.lengthAMm), lengthBMm: r3(s.lengthBMm), differenceMm: r3(s.differenceMm) })),
    errors: computed?.errors ?? [],
    updatedAt: set ? new Date(set.updatedAt).toISOString() : null,
  };
}
