import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { mm } from '@shared/units/units';
import { checkLayout } from './checker';
import { parseEsicupXml } from './testing/esicup-xml';
import type { NestingInput } from './types';
import { datasetPath, hasDatasets } from '../../tests/fixtures/reference-data';

const esicup = (...p: string[]) => datasetPath('nesting', 'esicup', ...p);
const load = (...p: string[]) => parseEsicupXml(readFileSync(esicup(...p), 'utf8'));

describe.skipIf(!hasDatasets)('checkLayout on published layouts (ESICUP XML, ../shared/datasets/nesting/esicup)', () => {
  // Gomes & Oliveira (2006), EJOR 171(3):811–829, layouts GLSHA and SAHA stored in the XML [quoted, S3 of
  // nesting-benchmarks.md]: shirts L = 62.21 / 62.218, dagli L = 59.322 / 58.196.
  const cases: [string, string, string, number][] = [
    ['shirts', 'shirts.xml', 'GLSHA', 62.21],
    ['shirts', 'shirts.xml', 'SAHA', 62.218],
    ['dagli', 'dagli.xml', 'GLSHA', 59.322],
    ['dagli', 'dagli.xml', 'SAHA', 58.196],
  ];
  for (const [dir, file, algorithm, length] of cases) {
    it(`accepts the ${algorithm} layout of ${dir} (Gomes & Oliveira 2006) when checked against the stored length`, () => {
      const inst = load(dir, file);
      const sol = inst.solutions.find((s) => s.algorithm === algorithm)!;
      expect(sol.length).toBe(length);
      const check = checkLayout(inst.input, { placements: sol.placements, length: sol.length });
      expect(check.errors).toEqual([]);
      expect(check.valid).toBe(true);
    });
  }

  it('rejects a published layout when one piece is moved onto another', () => {
    const inst = load('shirts', 'shirts.xml');
    const sol = inst.solutions.find((s) => s.algorithm === 'GLSHA')!;
    const moved = sol.placements.map((p, i) => (i === 1 ? { ...sol.placements[0] , copy: p.copy, pieceId: p.pieceId } : p));
    const check = checkLayout(inst.input, { placements: moved, length: sol.length });
    expect(check.valid).toBe(false);
    expect(check.errors.some((e) => e.includes('overlaps'))).toBe(true);
  });

  it('rejects a published layout when the strip is shorter than its length', () => {
    const inst = load('dagli', 'dagli.xml');
    const sol = inst.solutions.find((s) => s.algorithm === 'SAHA')!;
    const check = checkLayout(inst.input, { placements: sol.placements, length: sol.length - 1 });
    expect(check.errors.some((e) => e.includes('outside the strip'))).toBe(true);
  });
});

describe('checkLayout rules', () => {
  const square = [{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 10 }, { x: 0, y: 10 }];
  const input: NestingInput = {
    stripWidth: mm(10),
    pieces: [
      { id: 'a', polygon: square, quantity: 2, orientations: [0] },
      { id: 'cuff', polygon: [{ x: 0, y: 0 }, { x: 4, y: 0 }, { x: 0, y: 3 }], quantity: 1, mirrored: true, orientations: [0] },
    ],
  };
  const ok = [
    { pieceId: 'a', copy: 0, rotation: 0, mirrored: false, x: mm(0), y: mm(0) },
    { pieceId: 'a', copy: 1, rotation: 0, mirrored: false, x: mm(10), y: mm(0) },
    { pieceId: 'cuff', copy: 0, rotation: 0, mirrored: false, x: mm(20), y: mm(0) },
    { pieceId: 'cuff', copy: 1, rotation: 0, mirrored: true, x: mm(24), y: mm(5) },
  ];

  it('accepts touching pieces and a mirrored pair', () => {
    expect(checkLayout(input, { placements: ok, length: 24 })).toMatchObject({ valid: true, errors: [] });
  });

  it('rejects a missing copy, a duplicate, a forbidden rotation and a wrong mirror flag', () => {
    const bad = [ok[0], ok[0], { ...ok[2], rotation: 180 }, { ...ok[3], mirrored: false }];
    const { errors } = checkLayout(input, { placements: bad, length: 30 });
    expect(errors).toEqual(
      expect.arrayContaining([
        'a#0: placed more than once',
        'a#1: not placed',
        'cuff#0: rotation 180 not allowed',
        'cuff#1: mirrored must be true',
      ]),
    );
  });

  it('rejects an overlap of a tenth of a square when the pieces are the same otherwise', () => {
    const overlapping = [ok[0], { ...ok[1], x: mm(9) }, ok[2], ok[3]];
    const check = checkLayout(input, { placements: overlapping, length: 24 });
    expect(check.valid).toBe(false);
    expect(check.maxOverlapRatio).toBeCloseTo(0.1, 9);
  });
});
