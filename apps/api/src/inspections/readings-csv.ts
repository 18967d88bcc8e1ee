import { MAX_READINGS_ROWS, type RowError } from '@evenset/contracts';
import Papa from 'papaparse';
import { toMm } from '../common/units/lengths';

/** The columns of a readings file (docs/csv-format.md), in any order. */
export const CSV_COLUMNS = ['serial', 'station', 'reading', 'unit'] as const;
type Column = (typeof CSV_COLUMNS)[number];

/** One data row of a readings file, its reading converted to mm. `row` counts the header as row 1. */
export interface CsvReading {
  row: number;
  serial: string;
  station: string;
  readingMm: number;
}

export interface ParsedReadings {
  /** Data rows (empty lines not counted). */
  rows: number;
  readings: CsvReading[];
  errors: RowError[];
}

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;
const WITH_UNIT = /^[+-]?[\d.,]+\s*(in|inch|inches|mm|µm|um|thou|")$/i;
const OTHER_DELIMITERS: [string, string][] = [
  [';', 'semicolons'],
  ['\t', 'tabs'],
  ['|', 'vertical bars'],
];

/**
 * Each row of `text` as papaparse reads it (comma-separated), with its 1-based row number, one at a
 * time (papaparse's step mode): the rows are never all held at once. Return false to stop.
 */
export function eachCsvRow(text: string, visit: (fields: string[], row: number) => boolean | void): void {
  let row = 0;
  Papa.parse<string[]>(text, {
    delimiter: ',',
    step: (results, parser) => {
      row += 1;
      if (visit(results.data, row) === false) parser.abort();
    },
  });
}

/**
 * Parses a readings file with papaparse: comma-separated, a header line naming the columns
 * serial, station, reading and unit; a byte-order mark and Windows line ends are accepted.
 * Checks each row on its own (part and station matching is the caller's) as it is read; problems
 * come back row by row with the column and the value at fault.
 */
export function parseReadingsCsv(content: Buffer): ParsedReadings {
  const text = content.toString('utf8').replace(/^\uFEFF/, '');
  const fail = (message: string, row = 1): ParsedReadings => ({
    rows: 0,
    readings: [],
    errors: [{ row, column: null, value: null, message }],
  });
  if (!text.trim())
    return fail('The file is empty: it needs a header line (serial,station,reading,unit) and readings.');

  let header: { row: number; names: string[]; index: Map<Column, number> } | undefined;
  let refused: ParsedReadings | undefined;
  let rows = 0;
  const readings: CsvReading[] = [];
  const errors: RowError[] = [];
  // Blank lines are skipped here rather than by papaparse, so `row` stays the line of the file.
  eachCsvRow(text, (fields, row) => {
    if (fields.length <= 1 && (fields[0] ?? '').trim() === '') return true;
    if (!header) {
      const checked = readHeader(fields, row);
      if ('refused' in checked) {
        refused = checked.refused;
        return false;
      }
      header = { row, ...checked };
      return true;
    }
    rows += 1;
    // Past the limit only the count goes on, for the message.
    if (rows <= MAX_READINGS_ROWS) checkRow(fields, row, header.names, header.index, readings, errors);
    return true;
  });
  if (refused) return refused;
  // Nothing but blank fields (e.g. `""`): judged as an empty header.
  if (!header) {
    const checked = readHeader([], 1);
    if ('refused' in checked) return checked.refused;
  }
  if (!rows) return fail('The file has a header but no readings.', header?.row ?? 1);
  if (rows > MAX_READINGS_ROWS)
    return fail(
      `The file has ${rows.toLocaleString('en')} rows; at most ${MAX_READINGS_ROWS.toLocaleString('en')} fit in one upload.`,
    );
  return { rows, readings, errors };
}

/** The header's column names and where each column is, or the file's refusal. */
function readHeader(
  header: string[],
  headerRow: number,
): { names: string[]; index: Map<Column, number> } | { refused: ParsedReadings } {
  const refuse = (errors: RowError[]) => ({ refused: { rows: 0, readings: [], errors } });
  const names = header.map((h) => h.trim().toLowerCase());
  if (names.length === 1) {
    const other = OTHER_DELIMITERS.find(([d]) => (names[0] ?? '').includes(d));
    if (other)
      return refuse([
        {
          row: headerRow,
          column: null,
          value: null,
          message: `The columns are separated by ${other[1]}; separate them with commas (serial,station,reading,unit).`,
        },
      ]);
  }
  const errors: RowError[] = [];
  const index = new Map<Column, number>();
  for (const column of CSV_COLUMNS) {
    const at = names.indexOf(column);
    if (at < 0) errors.push({ row: headerRow, column, value: null, message: `The header has no "${column}" column.` });
    else index.set(column, at);
  }
  names.forEach((name, at) => {
    if (!(CSV_COLUMNS as readonly string[]).includes(name))
      errors.push({
        row: headerRow,
        column: name,
        value: header[at] ?? null,
        message: `"${header[at] ?? ''}" is not a column of a readings file.`,
      });
  });
  return errors.length ? refuse(errors) : { names, index };
}

/** Checks one data row: its reading goes to `readings`, or its problems to `errors`. */
function checkRow(
  fields: string[],
  row: number,
  names: string[],
  index: Map<Column, number>,
  readings: CsvReading[],
  errors: RowError[],
): void {
  const cell = (column: Column) => (fields[index.get(column)!] ?? '').trim();
  const problem = (column: Column | null, value: string | null, message: string) =>
    errors.push({ row, column, value, message });
  if (fields.length !== names.length) {
    const hint =
      fields.length > names.length ? ' A comma inside a number (1,5002) splits it: use a dot for decimals.' : '';
    problem(null, fields.join(','), `This row has ${fields.length} fields; the header has ${names.length}.${hint}`);
    return;
  }
  const [serial, station, reading, unit] = [cell('serial'), cell('station'), cell('reading'), cell('unit')];
  if (!serial) problem('serial', serial, 'The serial is empty.');
  if (!station) problem('station', station, 'The station is empty.');
  const unitOk = unit === 'in' || unit === 'mm';
  if (!unitOk) problem('unit', unit, `The unit must be "in" or "mm", not "${unit}".`);
  const numberOk = NUMBER.test(reading);
  if (!numberOk) problem('reading', reading, readingProblem(reading));
  if (serial && station && unitOk && numberOk)
    readings.push({ row, serial: serial.toUpperCase(), station, readingMm: toMm(Number(reading), unit) });
}

function readingProblem(value: string): string {
  if (!value) return 'The reading is empty.';
  if (WITH_UNIT.test(value))
    return `"${value}" carries a unit: write the number alone and put the unit in the unit column.`;
  if (/^[+-]?\d[\d,]*(\.\d*)?$/.test(value) && value.includes(','))
    return `"${value}" has a comma: use a dot for decimals and no thousands separators (e.g. 1.5002).`;
  return `"${value}" is not a number.`;
}
