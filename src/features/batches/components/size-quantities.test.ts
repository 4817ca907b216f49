import { describe, expect, it } from 'vitest';
import { createBatchInput } from '@shared/schemas/batches';
import { readSizeQuantities } from './size-quantities';

describe('garments per size typed on the new batch form', () => {
  const run = ['8', '10', '12'];

  it('keeps 8.5 and -4 as typed so the schema names the size, instead of reading them as 85 and 4', () => {
    const { quantities, total } = readSizeQuantities(run, { '8': '-4', '10': '8.5', '12': '12' });
    expect(quantities).toEqual({ '8': -4, '10': 8.5, '12': 12 });
    expect(total).toBe(12);
    const parsed = createBatchInput.safeParse({ styleId: 1, quantities, dueDate: '2027-01-29' });
    expect(parsed.success).toBe(false);
    const issues = Object.fromEntries(parsed.error!.issues.map((i) => [i.path.join('.'), i.message]));
    expect(issues['quantities.8']).toBe('Cannot be negative');
    expect(issues['quantities.10']).toBe('Whole garments only');
  });

  it('reads an empty box as 0 and lists text that is not a number', () => {
    const { quantities, unreadable, total } = readSizeQuantities(run, { '8': '', '10': 'ten', '12': ' 6 ' });
    expect(quantities['8']).toBe(0);
    expect(quantities['12']).toBe(6);
    expect(unreadable).toEqual(['10']);
    expect(total).toBe(6);
  });

  it('adds whole garments of every size for the total', () => {
    expect(readSizeQuantities(['XS', 'S', 'M', 'L', 'XL'], { XS: '4', S: '8', M: '12', L: '10', XL: '6' }).total).toBe(40);
  });
});
