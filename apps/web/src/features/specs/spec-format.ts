import type { SpecDefinition } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import { specResolution } from './spec-values';

/** A length of a spec in the spec's own unit and resolution, e.g. "1.5000 in". */
export function specLength(definition: SpecDefinition, mm: number): string {
  return formatLength(mm, definition.displayUnit, { level: specResolution(definition) });
}

/** A deviation from nominal with its sign always shown, minus as a true minus: "+0.0000", "−0.0004". */
export function specDeviation(definition: SpecDefinition, mm: number, withSymbol = true): string {
  const text = formatLength(mm, definition.displayUnit, {
    level: specResolution(definition),
    signed: true,
    withSymbol,
  });
  if (text.startsWith('-')) return `−${text.slice(1)}`;
  return text.startsWith('+') ? text : `+${text}`;
}

/** The tolerance band as its two deviations, upper first: "+0.0000 / −0.0004 in". */
export function specBand(definition: SpecDefinition): string {
  return `${specDeviation(definition, definition.band.upper, false)} / ${specDeviation(definition, definition.band.lower)}`;
}
