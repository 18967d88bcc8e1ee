import type { DisplayUnit, SetRow } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';

const dateTimeFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** When a set was allocated, in the reader's locale; an unreadable value is shown as it came. */
export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateTimeFormat.format(date);
}

export const SET_KIND_LABELS: Record<SetRow['kind'], string> = { set: 'Set', replacement: 'Replacement' };

/** A height or spread at the fine resolution the trade reads matched sets at (0.00001 in, 0.0001 mm). */
export function formatHeight(mm: number, unit: DisplayUnit, withSymbol = true): string {
  return formatLength(mm, unit, { level: 'fine', withSymbol });
}
