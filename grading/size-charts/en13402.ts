import type { Millimetres } from '@shared/units/units';

/**
 * EN 13402-3 women's bust-girth interval limits in cm: 74–102 in 4 cm steps, then 107–131 in 6 cm steps
 * (13 limits, 12 intervals; 102–107 is 5 cm wide). Source: CRAN package Anthropometry, `bustSizesStandard`,
 * citing CEN, "Size designation of clothes. Part 3: Measurements and intervals" (2005).
 */
export const EN13402_BUST_LIMITS_CM = [74, 78, 82, 86, 90, 94, 98, 102, 107, 113, 119, 125, 131] as const;

/**
 * Nominal bust designation per interval (cm). From memory (sizing-and-grading.md §1.4), consistent with the
 * limits above: a display label only, never used for assignment.
 */
export const EN13402_BUST_NOMINAL_CM = [76, 80, 84, 88, 92, 96, 100, 104, 110, 116, 122, 128] as const;

/** An EN 13402-3 bust interval: [lowerMm, upperMm), its index (0-based) and nominal label. */
export interface BustDesignation {
  index: number;
  lowerMm: number;
  upperMm: number;
  nominalCm: number;
  label: string;
}

/** All twelve intervals in order. */
export function en13402BustIntervals(): BustDesignation[] {
  return EN13402_BUST_NOMINAL_CM.map((nominalCm, index) => ({
    index,
    lowerMm: EN13402_BUST_LIMITS_CM[index] * 10,
    upperMm: EN13402_BUST_LIMITS_CM[index + 1] * 10,
    nominalCm,
    label: `${EN13402_BUST_LIMITS_CM[index]}–${EN13402_BUST_LIMITS_CM[index + 1]}`,
  }));
}

/**
 * The EN 13402-3 bust interval holding `bustMm`, with half-open intervals [lower, upper).
 * Returns null below 740 mm, at or above 1310 mm, or for a non-finite value.
 */
export function designateByBust(bustMm: Millimetres | number): BustDesignation | null {
  if (!Number.isFinite(bustMm)) return null;
  return en13402BustIntervals().find((d) => bustMm >= d.lowerMm && bustMm < d.upperMm) ?? null;
}
