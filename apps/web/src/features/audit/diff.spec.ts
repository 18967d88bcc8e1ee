import { diffRecords, fieldLabel, formatValue } from './diff';

describe('diffRecords', () => {
  it('lines up each field before and after, marking what changed', () => {
    const rows = diffRecords(
      { email: 'a@x.example', roles: ['sales'], active: true, band: { lower: 38.08984, upper: 38.1 } },
      { email: 'a@x.example', roles: ['sales', 'service'], active: false, band: { lower: 38.09, upper: 38.1 } },
    );
    expect(rows.map((r) => [r.label, r.before, r.after, r.kind])).toEqual([
      ['Email', 'a@x.example', 'a@x.example', 'unchanged'],
      ['Roles', 'sales', 'sales, service', 'changed'],
      ['Active', 'yes', 'no', 'changed'],
      ['Band › lower', '38.08984', '38.09', 'changed'],
      ['Band › upper', '38.1', '38.1', 'unchanged'],
    ]);
  });

  it('shows a record made (after only) as added, and fields that come or go', () => {
    expect(
      diffRecords(null, { lotNumber: 'L-1', notes: null }).map((r) => [r.field, r.before, r.after, r.kind]),
    ).toEqual([
      ['lotNumber', null, 'L-1', 'added'],
      ['notes', null, '—', 'added'],
    ]);
    expect(diffRecords({ reason: 'x' }, { status: 'ground' }).map((r) => [r.field, r.kind])).toEqual([
      ['reason', 'removed'],
      ['status', 'added'],
    ]);
    expect(diffRecords(null, null)).toEqual([]);
  });
});

describe('fieldLabel and formatValue', () => {
  it('reads camel case as words and values as text', () => {
    expect(fieldLabel('nominalMm')).toBe('Nominal mm');
    expect(fieldLabel('targetHeightMm')).toBe('Target height mm');
    expect(formatValue([])).toBe('(none)');
    expect(formatValue('')).toBe('(empty)');
    expect(formatValue([{ kind: 'finish', depth: 0.00254 }])).toBe('[{"kind":"finish","depth":0.00254}]');
    expect(formatValue({ a: 1 })).toBe('{"a":1}');
  });
});
