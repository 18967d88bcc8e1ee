import type { DisplayUnit, Spec, SpecDefinition, specDefinitionSchema } from '@evenset/contracts';
import { fromMillimetres, type ResolutionLevel } from '@evenset/metrology';
import type { z } from 'zod';

/** A definition as the form holds it, before the schema's defaults are applied. */
type SpecDefinitionInput = z.input<typeof specDefinitionSchema>;

/** What the spec form holds: the part number and the definition, lengths in the definition's unit. */
export interface SpecFormValues {
  partNumber: string;
  definition: SpecDefinitionInput;
}

/** A length from the answer's millimetres in `unit`, without binary noise (25.4 → 1, not 0.99999…). */
function inUnit(mm: number, unit: DisplayUnit): number {
  return Number(fromMillimetres(mm, unit).toPrecision(12));
}

function optionalInUnit(mm: number | null | undefined, unit: DisplayUnit): number | null {
  return mm == null ? null : inUnit(mm, unit);
}

/** A spec's definition (answered in mm) with every length in the spec's own unit, ready to edit. */
export function definitionInOwnUnit(definition: SpecDefinition): SpecDefinition {
  const unit = definition.displayUnit;
  const length = (mm: number) => inUnit(mm, unit);
  const station = (s: { name: string; x: number; y: number }) => ({ name: s.name, x: length(s.x), y: length(s.y) });
  return {
    ...definition,
    unit,
    nominal: length(definition.nominal),
    band: { lower: length(definition.band.lower), upper: length(definition.band.upper) },
    matchingBand: length(definition.matchingBand),
    flatness: optionalInUnit(definition.flatness, unit),
    parallelism: optionalInUnit(definition.parallelism, unit),
    runout: optionalInUnit(definition.runout, unit),
    masterDriftLimit: optionalInUnit(definition.masterDriftLimit, unit),
    grinding: definition.grinding
      ? {
          roughDepth: length(definition.grinding.roughDepth),
          finishAllowance: length(definition.grinding.finishAllowance),
          finishDepth: length(definition.grinding.finishDepth),
          sparkOutPasses: definition.grinding.sparkOutPasses,
        }
      : null,
    plan: {
      stations: definition.plan.stations.map(station),
      datumStations: definition.plan.datumStations.map(station),
      runoutCircles: definition.plan.runoutCircles.map((c) => ({ ...c, radius: length(c.radius) })),
    },
  };
}

export function specFormValues(spec: Spec): SpecFormValues {
  return { partNumber: spec.partNumber, definition: definitionInOwnUnit(spec.definition) };
}

export function newSpecValues(unit: DisplayUnit): SpecFormValues {
  return {
    partNumber: '',
    definition: {
      unit,
      displayUnit: unit,
      title: '',
      materialId: '',
      nominal: Number.NaN,
      band: { lower: Number.NaN, upper: Number.NaN },
      matchingBand: Number.NaN,
      flatness: null,
      parallelism: null,
      runout: null,
      setSize: 1,
      heightStatistic: 'mean',
      heightStation: null,
      decisionRule: 'guarded',
      grinding: null,
      masterDriftLimit: null,
      plan: { stations: [], datumStations: [], runoutCircles: [] },
    },
  };
}

/**
 * Inch specs are shown to a tenth (0.0001 in) unless a limit needs tenths of tenths
 * (0.00001 in); metric specs have one resolution.
 */
export function specResolution(definition: SpecDefinition): ResolutionLevel {
  if (definition.displayUnit !== 'in') return 'standard';
  const limits = [
    definition.band.lower,
    definition.band.upper,
    definition.matchingBand,
    definition.flatness,
    definition.parallelism,
    definition.runout,
  ];
  const needsFine = limits.some((mm) => {
    if (mm == null) return false;
    const tenths = fromMillimetres(mm, 'in') * 10000;
    return Math.abs(tenths - Math.round(tenths)) > 1e-6;
  });
  return needsFine ? 'fine' : 'standard';
}
