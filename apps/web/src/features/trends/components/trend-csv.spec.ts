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
      {
        points: {
          serial: ['RB40-0401', 'RB40-0402'],
          lot: [0, 0],
          setNumber: [null, 'S-2026-007'],
          inspector: [1, 0],
          master: [0, 0],
          inspectedAt: ['2026-11-20T10:00:00.000Z', '2026-11-20T10:05:00.000Z'],
          height: [38.1, 25.4],
        },
        choices: {
          lots: [{ id: 'lot-1', lotNumber: 'L-2026-041' }],
          inspectors: [
            { id: 'person-1', name: 'Ames Tull' },
            { id: null, name: 'Lisle, Rowan' },
          ],
          masters: [{ id: 'master-1', code: 'MG-1.500-A' }],
        },
      },
      'in',
    );
    // 38.1 mm is exactly 1.5 in (25.4 mm to the inch, by definition); each point's names come from the choices.
    expect(csv).toBe(
      'Serial,Lot,Set,Inspector,Master,Inspected at,Height (in)\r\n' +
        'RB40-0401,L-2026-041,,"Lisle, Rowan",MG-1.500-A,2026-11-20T10:00:00.000Z,1.50000\r\n' +
        'RB40-0402,L-2026-041,S-2026-007,Ames Tull,MG-1.500-A,2026-11-20T10:05:00.000Z,1.00000\r\n',
    );
  });
});
