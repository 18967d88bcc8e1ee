const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/** A calendar date in the reader's locale; an unreadable value is shown as it came. */
export function formatDate(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateFormat.format(date);
}
