import { trendPointList, type DisplayUnit, type Trend } from '@evenset/contracts';
import { displayResolution, formatFixed, fromMillimetres } from '@evenset/metrology';

/** One CSV field (RFC 4180): quoted when it holds a comma, a quote or a line break; quotes doubled. */
export function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/** The trend's points as CSV, heights in the person's unit at the trade's fine resolution. */
export function trendCsv(trend: Pick<Trend, 'points' | 'choices'>, unit: DisplayUnit): string {
  const { decimals, symbol } = displayResolution(unit, 'fine');
  const header = ['Serial', 'Lot', 'Set', 'Inspector', 'Master', 'Inspected at', `Height (${symbol})`];
  const rows = trendPointList(trend).map((p) => [
    p.serial,
    p.lotNumber,
    p.setNumber ?? '',
    p.inspectorName,
    p.masterCode,
    p.inspectedAt,
    formatFixed(fromMillimetres(p.height, unit), decimals),
  ]);
  return `${[header, ...rows].map((row) => row.map(csvField).join(',')).join('\r\n')}\r\n`;
}
