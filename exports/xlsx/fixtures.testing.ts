/** Shared inputs for the exports tests (plain factories; each call returns fresh objects). */
import { mm } from '@shared/units';
import type { BundleTicketsInput, MarkerListInput } from '../types';

/**
 * Jana (2008) roll example R1 (shared/reference/production-and-costing.md §3.4) [quoted]: lay length 6.5 m;
 * roll A 15 m → 2 plies, remnant 2 m; roll B 16 m → 2 plies, remnant 3 m. End allowance 1 cm each end for a
 * non-elastic fabric (Vilumsone-Nemes, §4.2.3, p. 31) [quoted]; the R1 remnants ignore it.
 */
export function buildMarkerListInput(overrides: Partial<MarkerListInput> = {}): MarkerListInput {
  return {
    studioName: 'Linden Row Studio',
    dateIso: '2026-03-14T09:30:00Z',
    locale: 'en-GB',
    unitSystem: 'metric',
    style: { code: 'DR-12', name: 'Wrap dress' },
    batch: { code: 'B-2026-07' },
    fabric: { description: 'Viscose twill, navy', widthMm: mm(1450) },
    lays: [
      {
        layNo: 1,
        ratio: [
          { size: 'S', count: 1 },
          { size: 'M', count: 2 },
          { size: 'L', count: 1 },
        ],
        markerLengthMm: mm(6500),
        plies: 4,
        spreadingMode: 'face-up-one-way',
        endAllowanceMm: mm(10),
        rolls: [
          {
            rollLabel: 'A',
            shadeLot: 'Lot 3',
            lengthMm: mm(15000),
            pliesToSpread: 2,
            expectedRemnantMm: mm(2000),
          },
          {
            rollLabel: 'B',
            shadeLot: 'Lot 3',
            lengthMm: mm(16000),
            pliesToSpread: 2,
            expectedRemnantMm: mm(3000),
          },
        ],
      },
      {
        layNo: 2,
        ratio: [{ size: 'XL', count: 2 }],
        markerLengthMm: mm(3200),
        plies: 3,
        spreadingMode: 'face-to-face-zigzag',
        endAllowanceMm: mm(15),
        rolls: [
          {
            rollLabel: 'C',
            shadeLot: 'Lot 4',
            lengthMm: mm(12000),
            pliesToSpread: 3,
            expectedRemnantMm: mm(2400),
          },
        ],
      },
    ],
    ...overrides,
  };
}

/** Three bundles of the marker-list batch over four operations; bundle 1 has statuses. */
export function buildBundleTicketsInput(
  overrides: Partial<BundleTicketsInput> = {},
): BundleTicketsInput {
  const bundles = [
    { bundleNo: 1, size: 'S', shadeLot: 'Lot 3', plyFrom: 1, plyTo: 4, pieces: 4, layNo: 1 },
    { bundleNo: 2, size: 'M', shadeLot: 'Lot 3', plyFrom: 1, plyTo: 4, pieces: 8, layNo: 1 },
    { bundleNo: 3, size: 'XL', shadeLot: 'Lot 4', plyFrom: 1, plyTo: 3, pieces: 6, layNo: 2 },
  ];
  return {
    studioName: 'Linden Row Studio',
    dateIso: '2026-03-14',
    locale: 'en-GB',
    style: { code: 'DR-12', name: 'Wrap dress' },
    batch: { code: 'B-2026-07' },
    operations: [
      { name: 'Join shoulders', samMinutes: 0.8 },
      { name: 'Set sleeves', samMinutes: 2.4 },
      { name: 'Side seams', samMinutes: 1.6 },
      { name: 'Hem', samMinutes: 1.2 },
    ],
    bundles: bundles.map((b): BundleTicketsInput['bundles'][number] => ({
      ...b,
      qrText: `SR-B:b-2026-07:${b.bundleNo}`,
      statusByOperation:
        b.bundleNo === 1 ? { 'Join shoulders': 'done', 'Set sleeves': 'in progress' } : {},
    })),
    ...overrides,
  };
}
