import { describe, expect, it } from 'vitest';
import { neutraliseCsvCell, readTable, rowsToCsv } from './table-io';

describe('CSV export against formula injection', () => {
  // OWASP "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection): prefix cells that begin with
  // = + - @, tab or carriage return with a single quote so a spreadsheet shows them as text.
  it('prefixes a single quote to every cell that begins with = + - @ tab or CR', () => {
    for (const cell of ['=HYPERLINK("http://x","y")', '+1+cmd', '-2+3+cmd|\' /C calc\'!A0', '@SUM(A1)', '\tTAB', '\rCR']) {
      expect(neutraliseCsvCell(cell)).toBe(`'${cell}`);
    }
    for (const cell of ['bust', '800', '37 1/4', 'M=L', '']) expect(neutraliseCsvCell(cell)).toBe(cell);
  });

  it('writes a size label such as =cmd|x as text in the CSV and reads it back unchanged', async () => {
    const rows = [['measurement', 'unit', '=cmd|x', '@M'], ['bust', 'mm', '800', '840']];
    const csv = rowsToCsv(rows);
    expect(csv.split('\r\n')[0]).toBe("measurement,unit,'=cmd|x,'@M");
    const back = await readTable({ originalname: 'c.csv', mimetype: 'text/csv', buffer: Buffer.from(csv) });
    expect(back).toEqual(rows);
  });
});
