import fc from 'fast-check';
import { decide } from './decide';

const band = { lower: 38.0898, upper: 38.1 };

describe('decide', () => {
  // Simple acceptance (ASME B89.7.3.1-2001 [seen]): the acceptance zone is the specification zone.
  it('accepts inside the band and rejects outside with the simple rule', () => {
    expect(decide(38.095, band, { rule: 'simple' })).toMatchObject({ verdict: 'conforms', side: null });
    expect(decide(38.1, band, { rule: 'simple' }).verdict).toBe('conforms');
    expect(decide(38.1001, band, { rule: 'simple' })).toMatchObject({ verdict: 'does-not-conform', side: 'high' });
    expect(decide(38.0897, band, { rule: 'simple' })).toMatchObject({ verdict: 'does-not-conform', side: 'low' });
  });

  // Guarded acceptance (ISO 14253-1 [memory]; ASME B89.7.3.1 [seen]): conformance is proven only
  // when lower + U <= value <= upper − U; between that and the limits the value is in the guard band.
  it('shrinks the acceptance zone by U with the guarded rule and names the guard-band side', () => {
    const U = 0.0005;
    expect(decide(38.095, band, { rule: 'guarded', expanded: U })).toMatchObject({
      verdict: 'conforms',
      acceptance: { lower: band.lower + U, upper: band.upper - U },
    });
    expect(decide(38.0999, band, { rule: 'guarded', expanded: U })).toMatchObject({
      verdict: 'guard-band',
      side: 'high',
    });
    expect(decide(38.09, band, { rule: 'guarded', expanded: U })).toMatchObject({ verdict: 'guard-band', side: 'low' });
    expect(decide(38.1002, band, { rule: 'guarded', expanded: U })).toMatchObject({
      verdict: 'does-not-conform',
      side: 'high',
    });
  });

  it('never passes a value outside the acceptance zone', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 0.6, noNaN: true }),
        fc.constantFrom('simple' as const, 'guarded' as const),
        (value, U, rule) => {
          const d = decide(value, { lower: 0, upper: 1 }, { rule, expanded: U });
          const u = rule === 'guarded' ? U : 0;
          if (d.verdict === 'conforms') {
            expect(value).toBeGreaterThanOrEqual(u);
            expect(value).toBeLessThanOrEqual(1 - u);
          } else if (d.verdict === 'does-not-conform') {
            expect(value < 0 || value > 1).toBe(true);
          } else {
            expect(rule).toBe('guarded');
            expect(value >= 0 && value <= 1).toBe(true);
          }
        },
      ),
    );
  });

  it('has an empty acceptance zone when 2U exceeds the band, and reports the guard band', () => {
    const d = decide(0.5, { lower: 0, upper: 1 }, { rule: 'guarded', expanded: 0.6 });
    expect(d.verdict).toBe('guard-band');
    expect(d.acceptance.lower).toBeGreaterThan(d.acceptance.upper);
  });

  it('rejects a reversed band, a missing U for the guarded rule and non-finite values', () => {
    expect(() => decide(1, { lower: 2, upper: 1 }, { rule: 'simple' })).toThrow(/lower <= upper/);
    expect(() => decide(1, band, { rule: 'guarded' })).toThrow(/needs the expanded uncertainty/);
    expect(() => decide(Number.NaN, band, { rule: 'simple' })).toThrow(/finite/);
    expect(() => decide(1, band, { rule: 'lenient' as never })).toThrow(/unknown decision rule/);
  });
});
