import fc from 'fast-check';
import Papa from 'papaparse';
import { eachCsvRow, parseReadingsCsv } from './readings-csv';

const parse = (text: string) => parseReadingsCsv(Buffer.from(text, 'utf8'));

describe('parseReadingsCsv', () => {
  it('reads rows in any column order, converting inches to mm (1 in = 25.4 mm, NIST SP 811 App. B)', () => {
    const parsed = parse('\uFEFFreading,unit,serial,station\r\n0.0001,in,k-1,P1\r\n\r\n-0.002,mm,K-1,P2\r\n');
    expect(parsed.errors).toEqual([]);
    expect(parsed.rows).toBe(2);
    expect(parsed.readings).toEqual([
      { row: 2, serial: 'K-1', station: 'P1', readingMm: 0.00254 },
      { row: 4, serial: 'K-1', station: 'P2', readingMm: -0.002 },
    ]);
  });

  it('accepts the number forms the plan allows and nothing else', () => {
    const values = ['1', '-0.5', '+.25', '3.', '1e-3', 'NaN', 'Infinity', '0x10', ' '];
    const parsed = parse(['serial,station,reading,unit', ...values.map((v) => `K-1,P1,${v},mm`)].join('\n'));
    expect(parsed.readings.map((r) => r.readingMm)).toEqual([1, -0.5, 0.25, 3]);
    expect(parsed.errors.map((e) => e.value)).toEqual(['1e-3', 'NaN', 'Infinity', '0x10', '']);
  });
});

describe('eachCsvRow', () => {
  it('sees the rows, numbered, that papaparse gives for the whole file at once', () => {
    // Row numbers are lines of the file as long as the parse is the same one: checked on
    // random text made of the characters that matter to CSV (RFC 4180: quotes, commas, line ends).
    const text = fc
      .array(fc.constantFrom('a', '1', '.', '-', ' ', ',', ',', '"', '\n', '\r\n', '\r', ';'), { maxLength: 80 })
      .map((chars) => chars.join(''));
    fc.assert(
      fc.property(text, (t) => {
        const rows: [string[], number][] = [];
        eachCsvRow(t, (fields, row) => void rows.push([fields, row]));
        expect(rows).toEqual(Papa.parse<string[]>(t, { delimiter: ',' }).data.map((fields, i) => [fields, i + 1]));
      }),
      { seed: 20261202, numRuns: 2000 },
    );
  });
});
