import { parseReadingsCsv } from './readings-csv';

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
