import type { SpecDefinition } from '@evenset/contracts';
import { specLength } from './spec-format';

const FIELD_LABELS: Record<string, string> = {
  material: 'Material',
  title: 'Title',
  displayUnit: 'Unit',
  nominal: 'Nominal height',
  'band.lower': 'Lower deviation',
  'band.upper': 'Upper deviation',
  matchingBand: 'Matching band',
  flatness: 'Flatness limit',
  parallelism: 'Parallelism limit',
  runout: 'Runout limit',
  setSize: 'Set size',
  heightStatistic: 'Part height',
  heightStation: 'Height station',
  decisionRule: 'Decision rule',
  grinding: 'Grinding parameters',
  'grinding.roughDepth': 'Rough depth per pass',
  'grinding.finishAllowance': 'Finish allowance',
  'grinding.finishDepth': 'Finish depth per pass',
  'grinding.sparkOutPasses': 'Spark-out passes',
  masterDriftLimit: 'Master-check drift limit',
  'plan.stations': 'Top-face stations',
  'plan.datumStations': 'Datum-face stations',
  'plan.runoutCircles': 'Runout circles',
};

const LIST_NOUNS: Record<string, string> = {
  stations: 'Top-face station',
  datumStations: 'Datum station',
  runoutCircles: 'Runout circle',
};

const LENGTH_KEYS = new Set([
  'nominal',
  'lower',
  'upper',
  'matchingBand',
  'flatness',
  'parallelism',
  'runout',
  'masterDriftLimit',
  'x',
  'y',
  'radius',
  'roughDepth',
  'finishAllowance',
  'finishDepth',
]);

const WORDS: Record<string, string> = {
  mean: 'Mean',
  highest: 'Highest',
  station: 'One named station',
  simple: 'Simple acceptance',
  guarded: 'Guarded acceptance',
  in: 'Inch',
  mm: 'Millimetre',
};

/** A changed field's dotted path in words: `plan.stations.C.x` → "Top-face station C — x". */
export function changeLabel(field: string): string {
  const known = FIELD_LABELS[field];
  if (known) return known;
  const [root, list, name, ...rest] = field.split('.');
  if (root === 'plan' && list && name && LIST_NOUNS[list]) return `${LIST_NOUNS[list]} ${name} — ${rest.join('.')}`;
  return field;
}

/** A changed value as people read it; lengths (answered in mm) in the spec's unit. */
export function changeValue(field: string, value: unknown, definition: SpecDefinition): string {
  if (value === null || value === undefined || value === '') return '—';
  const key = field.split('.').at(-1) ?? field;
  if (typeof value === 'number' && LENGTH_KEYS.has(key)) return specLength(definition, value);
  if (typeof value === 'string') return WORDS[value] ?? value;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  return JSON.stringify(value);
}
