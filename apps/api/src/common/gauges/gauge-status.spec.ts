import { addDays, gaugeStatus, todayIso } from './gauge-status';

describe('gaugeStatus', () => {
  const today = '2026-12-01';

  it('is in service until 30 days before the due date (common practice), then due soon', () => {
    expect(gaugeStatus('2027-01-01', today, false)).toBe('in-service'); // 31 days ahead
    expect(gaugeStatus('2026-12-31', today, false)).toBe('due-soon'); // 30 days ahead
    expect(gaugeStatus('2026-12-01', today, false)).toBe('due-soon'); // due today: still usable
  });

  it('is overdue the day after the due date, and retired whatever the date', () => {
    expect(gaugeStatus('2026-11-30', today, false)).toBe('overdue');
    expect(gaugeStatus('2030-01-01', today, true)).toBe('retired');
    expect(gaugeStatus(null, today, false)).toBe('not-calibrated');
  });

  it('counts calendar days across month and leap-year ends', () => {
    expect(addDays('2028-02-28', 1)).toBe('2028-02-29'); // 2028 is a leap year
    expect(addDays('2026-12-31', 1)).toBe('2027-01-01');
    expect(addDays('2026-03-01', -1)).toBe('2026-02-28');
    expect(todayIso(new Date('2026-12-01T23:59:59Z'))).toBe('2026-12-01');
  });
});
