import { csvField, trendCsv } from './trend-csv';

// Quoting as RFC 4180 §2 rules 6 and 7: fields holding a comma, quote or line break are quoted,
// and a quote inside is doubled.
describe('trend CSV', () => {
  it('quotes only the fields that need it', () => {
    expect(csvField('RB40-0401')).toBe('RB40-0401');
    expect(csvField('Lisle, Rowan')).toBe('"Lisle, Rowan"');
    expect(csvField('the "good" master')).toBe('"the ""good"" master"');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
  });

  it('writes one row a point, heights in the chosen unit', () => {
    const csv = trendCsv(
      [
        {
          serial: 'RB40-0401',
          lotNumber: 'L-2026-041',
          setNumber: null,
          inspectorName: 'Lisle, Rowan',
          masterCode: 'MG-1.500-A',
          inspectedAt: '2026-11-20T10:00:00.000Z',
          height: 38.1,
        },
      ],
      'in',
    );
    // 38.1 mm is exactly 1.5 in (25.4 mm to the inch, by definition).
    expect(csv).toBe(
      'Serial,Lot,Set,Inspector,Master,Inspected at,Height (in)\r\n' +
        'RB40-0401,L-2026-041,,"Lisle, Rowan",MG-1.500-A,2026-11-20T10:00:00.000Z,1.50000\r\n',
    );
  });
});
