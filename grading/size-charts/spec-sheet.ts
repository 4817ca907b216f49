import { mm, type Millimetres } from '@shared/units/units';
import type { PointOfMeasure, SizeChart } from './size-chart';

/** Ease and tolerance for one point of measure (mm). Negative ease is allowed (stretch fabrics). */
export interface EaseSpec {
  easeMm: Millimetres;
  toleranceMm: Millimetres;
}

/** One spec-sheet line: garment = body + ease, accepted within ± tolerance. */
export interface SpecSheetRow {
  pointOfMeasure: PointOfMeasure;
  size: string;
  bodyMm: Millimetres;
  easeMm: Millimetres;
  garmentMm: Millimetres;
  toleranceMm: Millimetres;
  minMm: Millimetres;
  maxMm: Millimetres;
}

/**
 * Garment measurement spec per size. Only points of measure present both in `eases` and in the chart are listed,
 * in chart-size order within `eases` key order. Throws RangeError on a negative tolerance.
 */
export function buildSpecSheet(chart: SizeChart, eases: Partial<Record<PointOfMeasure, EaseSpec>>): SpecSheetRow[] {
  const rows: SpecSheetRow[] = [];
  for (const [pom, spec] of Object.entries(eases) as [PointOfMeasure, EaseSpec][]) {
    if (spec.toleranceMm < 0) throw new RangeError(`tolerance for ${pom} must be ≥ 0`);
    const vals = chart.values[pom];
    if (!vals) continue;
    chart.sizes.forEach((size, i) => {
      const garment = vals[i] + spec.easeMm;
      rows.push({
        pointOfMeasure: pom, size, bodyMm: vals[i], easeMm: spec.easeMm, garmentMm: mm(garment),
        toleranceMm: spec.toleranceMm, minMm: mm(garment - spec.toleranceMm), maxMm: mm(garment + spec.toleranceMm),
      });
    });
  }
  return rows;
}
