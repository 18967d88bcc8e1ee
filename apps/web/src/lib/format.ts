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

const countFormat = new Intl.NumberFormat(undefined, { maximumFractionDigits: 0 });

/** A count with the reader's digit grouping: 10,000 in en-US, 10.000 in de-DE. */
export function formatCount(count: number): string {
  return countFormat.format(count);
}

/** A grouped count with its noun, singular for one: "1 lot", "10,000 parts". */
export function countOf(count: number, noun: string, plural = `${noun}s`): string {
  return `${formatCount(count)} ${count === 1 ? noun : plural}`;
}

/**
 * The first `limit` names, then how many more there are ("A, B and 9,990 more"): a big lot or
 * trend has thousands, and the page's lists or grids hold them all.
 */
export function nameFirst(names: readonly string[], limit: number, separator = ', '): string {
  const more = names.length - limit;
  return more > 0 ? `${names.slice(0, limit).join(separator)} and ${formatCount(more)} more` : names.join(separator);
}
