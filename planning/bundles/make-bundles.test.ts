import { describe, expect, it } from 'vitest';
import { makeBundles } from './make-bundles';

describe('makeBundles', () => {
  const lay = { ratio: { S: 1, M: 2 }, pliesByLot: [{ shadeLot: 'A', plies: 25 }, { shadeLot: 'B', plies: 12 }] };
  it('makes one-size, one-lot bundles of 10 plies, numbered consecutively', () => {
    const b = makeBundles({ batch: 'C7', sizes: ['S', 'M'], lays: [lay] });
    // per garment position: lot A 10+10+5, lot B 10+2 → 5 bundles; S once, M twice → 15
    expect(b).toHaveLength(15);
    expect(b.map((x) => x.number)).toEqual([...Array(15).keys()].map((i) => i + 1));
    expect(b[0]).toMatchObject({ ticket: 'C7-1', size: 'S', position: 1, shadeLot: 'A', plyFrom: 1, plyTo: 10, pieces: 10 });
    expect(b[2]).toMatchObject({ shadeLot: 'A', plyFrom: 21, plyTo: 25, pieces: 5 });
    expect(b[3]).toMatchObject({ shadeLot: 'B', plyFrom: 26, plyTo: 35 });
    expect(b.filter((x) => x.size === 'M').reduce((a, x) => a + x.pieces, 0)).toBe(2 * 37);
  });
  // "Usually 30–40 garments"; worked figure 10 bundles × 30 garments (EU ICT-TEX course) [quoted]
  it('takes a configurable bundle size: 300 plies of one size in bundles of 30 → 10 bundles', () => {
    const b = makeBundles({ batch: 'X', sizes: ['M'], lays: [{ ratio: { M: 1 }, pliesByLot: [{ shadeLot: '1', plies: 300 }] }], bundleSize: 30 });
    expect(b).toHaveLength(10);
    expect(b.every((x) => x.pieces === 30)).toBe(true);
  });
  it('is deterministic and empty for no lays', () => {
    const a = makeBundles({ batch: 'C', sizes: ['S', 'M'], lays: [lay, lay] });
    expect(makeBundles({ batch: 'C', sizes: ['S', 'M'], lays: [lay, lay] })).toEqual(a);
    expect(makeBundles({ batch: 'C', sizes: ['S'], lays: [] })).toEqual([]);
    expect(() => makeBundles({ batch: 'C', sizes: ['S'], lays: [], bundleSize: 0 })).toThrow(RangeError);
  });
  it('counts on from firstNumber when the studio already has bundles, tickets included', () => {
    const b = makeBundles({ batch: 'C8', sizes: ['S', 'M'], lays: [lay], firstNumber: 16 });
    // The same 15 bundles as the first test, numbered 16..30 so they follow another batch's 1..15.
    expect(b.map((x) => x.number)).toEqual([...Array(15).keys()].map((i) => i + 16));
    expect(b[0].ticket).toBe('C8-16');
    expect(() => makeBundles({ batch: 'C', sizes: ['S'], lays: [], firstNumber: 0 })).toThrow(RangeError);
  });
});
