import { DUE_SOON_DAYS, type GaugeStatus } from '@evenset/contracts';

const DAY_MS = 24 * 60 * 60 * 1000;

/** Today's date as YYYY-MM-DD, in UTC (the server's calendar day for due dates). */
export function todayIso(now: Date = new Date()): string {
  return now.toISOString().slice(0, 10);
}

/** A YYYY-MM-DD date moved by a number of days. */
export function addDays(isoDate: string, days: number): string {
  return new Date(Date.parse(`${isoDate}T00:00:00Z`) + days * DAY_MS).toISOString().slice(0, 10);
}

/**
 * Where a calibrated gauge stands on `today`. Usable up to and including its due date; "due soon"
 * from `DUE_SOON_DAYS` days before it (common practice: 30 days).
 */
export function gaugeStatus(dueOn: string | null, today: string, retired: boolean): GaugeStatus {
  if (retired) return 'retired';
  if (!dueOn) return 'not-calibrated';
  if (today > dueOn) return 'overdue';
  if (addDays(today, DUE_SOON_DAYS) >= dueOn) return 'due-soon';
  return 'in-service';
}
