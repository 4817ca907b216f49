import { describe, expect, it } from 'vitest';
import { solveCutOrderJob, type CutOrderJobInput } from './cut-order-job';

// One size, 3 garments, one garment per marker, at most 3 plies: one lay of 3 plies of a 980 mm marker,
// spread 1 000 mm a ply (980 + the 20 mm end allowance of Vilumsone-Nemes §4.2.3). Rolls of 1 500 and 1 700 mm
// give one whole ply each; the third ply needs a splice (worked by hand, as in allocate-rolls.test.ts).
const base: CutOrderJobInput = {
  order: { sizes: ['M'], quantities: { M: 3 }, maxPlies: 3, maxGarmentsPerMarker: 1 },
  measured: [],
  garmentAreasMm2: { M: 980 * 1000 * 0.75 },
  widthMm: 1000,
  assumedUtilisation: 0.75,
  rolls: [{ id: '1', label: 'A', lengthMm: 1500, shadeLot: 'x', widthMm: 1000 }, { id: '2', label: 'B', lengthMm: 1700, shadeLot: 'x', widthMm: 1000 }],
};

describe('the cut-order job', () => {
  it('splices rolls only at the splice zones of a measured marker', async () => {
    const measured = await solveCutOrderJob({ ...base, measured: [{ ratio: { M: 1 }, lengthMm: 980, spliceZones: [{ near: 300, far: 450 }] }] });
    if ('rangeError' in measured) throw new Error(measured.rangeError);
    expect(measured.markerLengths).toBe('measured');
    expect(measured.allocation.shortfall).toEqual([0]);
    expect(measured.allocation.rolls.some((r) => r.segments.some((s) => s.spliced > 0))).toBe(true);
  });

  it('never splices on an estimated length, which has no pieces to place a join between', async () => {
    const estimated = await solveCutOrderJob(base);
    if ('rangeError' in estimated) throw new Error(estimated.rangeError);
    expect(estimated.markerLengths).toBe('estimated');
    expect(estimated.allocation.rolls.every((r) => r.segments.every((s) => s.spliced === 0))).toBe(true);
  });

  it('refuses a roll narrower than the fabric width the markers are made on', async () => {
    const narrow = await solveCutOrderJob({ ...base, rolls: [...base.rolls, { id: '3', label: 'C', lengthMm: 9000, shadeLot: 'y', widthMm: 900 }] });
    if ('rangeError' in narrow) throw new Error(narrow.rangeError);
    expect(narrow.allocation.refusals.map((r) => r.refusal.message)).toContain('Roll C is 900 mm wide, narrower than the 1000 mm marker: it cannot be spread for this lay');
    expect(narrow.allocation.rolls.find((r) => r.id === '3')!.segments).toEqual([]);
  });
});
