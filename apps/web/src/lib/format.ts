const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/**
 * A calendar date in the reader's locale; an unreadable value is shown as it came. A bare
 * YYYY-MM-DD is that day where the reader is (`new Date` would read it as UTC midnight, the day
 * before west of Greenwich).
 */
export function formatDate(iso: string): string {
  const day = /^(\d{4})-(\d{2})-(\d{2})$/.exec(iso);
  const date = day ? new Date(Number(day[1]), Number(day[2]) - 1, Number(day[3])) : new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateFormat.format(date);
}
