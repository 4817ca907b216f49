import { mm, type Millimetres } from '@shared/units/units';
import type { PointOfMeasure, SizeChart } from './size-chart';

/** The demo style's size run (A-line shirt dress). */
export const DEMO_SIZE_RUN = ['XS', 'S', 'M', 'L', 'XL'] as const;

// Girths taken from ASTM D5585-11e1 Table 1 (inch-pound) at sizes 2, 6, 10, 14, 18 for XS…XL, × 25.4 and rounded
// to whole mm (e.g. bust size 10 = 37 1/4 in = 946.15 mm → 946). Waist = "waist girth, curvy".
// Every other row is Seamrun's own studio value: lengths and widths chosen to be plausible against ANSUR II female
// medians (waistbacklength 424.5 mm, neckcircumferencebase 370 mm; sizing-and-grading.md §4) and the from-memory
// Aldrich increments (§1.5: back width ≈ 10 mm, nape to waist ≈ 5 mm per size). Not a published chart.
const VALUES: Record<PointOfMeasure, number[]> = {
  bust: [838, 895, 946, 1026, 1118],
  'under-bust': [692, 737, 787, 864, 956],
  'upper-chest': [845, 889, 933, 997, 1073],
  waist: [645, 686, 737, 826, 933],
  'waist-straight': [683, 724, 775, 864, 972],
  'high-hip': [840, 890, 940, 1015, 1105],
  hip: [910, 965, 1015, 1090, 1175],
  'neck-base': [349, 362, 378, 394, 406],
  'mid-neck': [327, 340, 352, 371, 394],
  head: [546, 552, 559, 565, 572],
  'shoulder-girth': [975, 1010, 1048, 1092, 1156],
  'back-waist-length': [404, 412, 420, 428, 436],
  'front-waist-length': [420, 432, 444, 458, 474],
  'armhole-depth': [190, 197, 204, 212, 220],
  'shoulder-width': [370, 380, 390, 402, 414],
  'across-back': [330, 340, 350, 362, 374],
  'across-front': [310, 320, 330, 342, 354],
  'bust-point-height': [235, 245, 255, 265, 275],
  'bust-point-span': [170, 180, 190, 202, 214],
  'arm-length': [570, 580, 590, 600, 610],
  'upper-arm': [260, 275, 290, 310, 335],
  wrist: [150, 155, 160, 166, 172],
  'waist-to-hip': [195, 200, 205, 210, 215],
  'waist-to-knee': [570, 580, 590, 600, 610],
  'waist-to-floor': [1030, 1040, 1050, 1060, 1070],
};

/**
 * The demo style's body chart, XS–XL, all values in mm (see the source comment above). Returns a fresh copy.
 */
export function demoSizeChart(): SizeChart {
  const values: Partial<Record<PointOfMeasure, Millimetres[]>> = {};
  for (const [k, v] of Object.entries(VALUES) as [PointOfMeasure, number[]][]) values[k] = v.map(mm);
  return { name: 'Seamrun demo: A-line shirt dress (XS–XL)', sizes: [...DEMO_SIZE_RUN], values };
}
