import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import ts from 'typescript';
import { countOf, formatCount, nameFirst } from './format';

/**
 * formatDate as a reader west of Greenwich sees it. The time zone is fixed when a process starts,
 * so format.ts runs in a child Node process with TZ set (America/Chicago, UTC−6 in November).
 */
function formatInChicago(values: string[]): { got: string[]; local: string[] } {
  const source = ts.transpileModule(readFileSync(join(__dirname, 'format.ts'), 'utf8'), {
    compilerOptions: { module: ts.ModuleKind.CommonJS, target: ts.ScriptTarget.ES2022 },
  }).outputText;
  const script = `
    const module = { exports: {} }; const exports = module.exports;
    ${source}
    const local = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });
    console.log(JSON.stringify({
      got: ${JSON.stringify(values)}.map(module.exports.formatDate),
      local: [local.format(new Date(2026, 10, 20)), local.format(new Date(2026, 0, 1))],
    }));`;
  const run = spawnSync(process.execPath, ['-e', script], { env: { ...process.env, TZ: 'America/Chicago' } });
  if (run.status !== 0) throw new Error(run.stderr.toString());
  return JSON.parse(run.stdout.toString()) as { got: string[]; local: string[] };
}

describe('formatDate west of Greenwich', () => {
  it('shows a calendar date as that day, and an instant in the reader’s zone', () => {
    const { got, local } = formatInChicago(['2026-11-20', '2026-01-01', '2026-11-21T03:00:00.000Z', 'not a date']);
    // 03:00 UTC on 21 November is still 20 November in Chicago.
    expect(got).toEqual([local[0], local[1], local[0], 'not a date']);
  });
});

describe('formatCount', () => {
  it('groups digits as the reader’s locale does', () => {
    // ECMA-402 toLocaleString with no locale is the reader's own grouping (1,234,567 in en-US).
    expect(formatCount(1234567)).toBe((1234567).toLocaleString());
    expect(formatCount(1234567)).not.toBe('1234567');
  });
});

describe('countOf', () => {
  it('says one thing in the singular and any other count in the plural', () => {
    expect(countOf(1, 'lot')).toBe('1 lot');
    expect(countOf(0, 'lot')).toBe('0 lots');
    expect(countOf(1234567, 'part')).toBe(`${formatCount(1234567)} parts`);
  });
});

describe('nameFirst', () => {
  const serials = Array.from({ length: 12 }, (_, i) => `S-${i + 1}`);

  it('names all when they are few', () => {
    expect(nameFirst(serials.slice(0, 3), 10)).toBe('S-1, S-2, S-3');
    expect(nameFirst(serials.slice(0, 10), 10, '; ')).toBe(serials.slice(0, 10).join('; '));
  });

  it('names the first ones and counts the rest', () => {
    expect(nameFirst(serials, 2)).toBe(`S-1, S-2 and ${formatCount(10)} more`);
  });
});
