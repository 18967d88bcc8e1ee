import { z } from 'zod';
import { listQuerySchema } from './list.schema';
import { materialSchema } from './materials.schema';
import { displayUnitSchema } from './users.schema';

/*
 * Lengths in a request body are plain numbers in the body's `unit` ('in' or 'mm'): every length of
 * the body (nominal, band, limits, grinding depths, station x/y, circle radii) is in that one unit,
 * and the server converts them once to millimetres, its canonical unit. Answers always carry
 * `unit: 'mm'`, so an answer's `definition` can be edited and sent back as it is.
 */

export const SPEC_STATUSES = ['draft', 'released', 'superseded'] as const;
export const specStatusSchema = z.enum(SPEC_STATUSES, { error: 'Choose draft, released or superseded.' });
export type SpecStatus = z.infer<typeof specStatusSchema>;

export const HEIGHT_STATISTICS = ['mean', 'highest', 'station'] as const;
export const heightStatisticSchema = z.enum(HEIGHT_STATISTICS, {
  error: 'Choose mean, highest or station for the part height.',
});

export const DECISION_RULES = ['simple', 'guarded'] as const;
export const decisionRuleSchema = z.enum(DECISION_RULES, {
  error: 'Choose simple acceptance or acceptance guarded by the uncertainty.',
});
export type DecisionRule = z.infer<typeof decisionRuleSchema>;

export const partNumberSchema = z
  .string({ error: 'Enter a part number.' })
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9][A-Z0-9.\-/]{0,39}$/, 'Use letters, digits, ".", "-" or "/" (at most 40), e.g. RB-40.');

const length = (what: string) => z.number({ error: `Enter ${what} as a number.` });
const positiveLength = (what: string) => length(what).positive(`${capitalise(what)} must be greater than zero.`);
const limit = (what: string) =>
  length(what)
    .min(0, `${capitalise(what)} cannot be negative.`)
    .refine((v) => v !== 0, `${capitalise(what)} must be greater than zero; leave it out when there is no limit.`)
    .nullable()
    .optional();

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

const stationNameSchema = z
  .string({ error: 'Name the station.' })
  .trim()
  .min(1, 'Name the station.')
  .max(20, 'Use at most 20 characters for a station name.');

export const stationSchema = z.object({
  name: stationNameSchema,
  x: length('x'),
  y: length('y'),
});
export type Station = z.infer<typeof stationSchema>;

export const runoutCircleSchema = z.object({
  name: stationNameSchema,
  radius: positiveLength('the radius'),
  positions: z
    .number({ error: 'Enter the number of positions.' })
    .int('The number of positions must be a whole number.')
    .min(3, 'Use at least 3 equally spaced positions.')
    .max(360, 'Use at most 360 positions.'),
});
export type RunoutCircle = z.infer<typeof runoutCircleSchema>;

export const measurementPlanSchema = z.object({
  /** Stations on the top face: height, flatness and parallelism are computed from them. */
  stations: z.array(stationSchema, { error: 'List the stations.' }).min(1, 'Add at least one station.').max(200),
  /** Stations on the datum face, when parallelism is measured against it rather than the plate. */
  datumStations: z.array(stationSchema).max(200).default([]),
  runoutCircles: z.array(runoutCircleSchema).max(20).default([]),
});
export type MeasurementPlan = z.infer<typeof measurementPlanSchema>;

/** Stock removal for a rework request: depths per pass and the stock left for finishing. */
export const grindingSchema = z.object({
  roughDepth: positiveLength('the rough depth'),
  finishAllowance: positiveLength('the finish allowance'),
  finishDepth: positiveLength('the finish depth'),
  sparkOutPasses: z
    .number({ error: 'Enter the number of spark-out passes.' })
    .int('Spark-out passes must be a whole number.')
    .min(0, 'Spark-out passes cannot be negative.')
    .max(20, 'Use at most 20 spark-out passes.'),
});
export type GrindingParameters = z.infer<typeof grindingSchema>;

/** Everything an engineer decides in one revision of a part spec. */
export const specDefinitionSchema = z
  .object({
    unit: displayUnitSchema,
    title: z
      .string({ error: 'Enter a title.' })
      .trim()
      .min(1, 'Enter a title.')
      .max(200, 'Use at most 200 characters.'),
    materialId: z.uuid({ error: 'Choose a material.' }),
    /** The unit people see this part in. */
    displayUnit: displayUnitSchema,
    nominal: positiveLength('the nominal height'),
    /** Deviations from nominal, e.g. lower −0.0004 and upper +0.0000 in. */
    band: z.object({ lower: length('the lower deviation'), upper: length('the upper deviation') }),
    matchingBand: positiveLength('the matching band'),
    flatness: limit('the flatness limit'),
    parallelism: limit('the parallelism limit'),
    runout: limit('the runout limit'),
    setSize: z
      .number({ error: 'Enter the set size.' })
      .int('The set size must be a whole number.')
      .min(1, 'The set size must be at least 1.')
      .max(100, 'The set size can be at most 100.'),
    heightStatistic: heightStatisticSchema,
    /** The station whose reading is the height, when `heightStatistic` is 'station'. */
    heightStation: z.string().trim().min(1).nullable().optional(),
    decisionRule: decisionRuleSchema,
    grinding: grindingSchema.nullable().optional(),
    /** Largest drift between the master checks before and after a run; a default applies when absent. */
    masterDriftLimit: limit('the master-check drift limit'),
    plan: measurementPlanSchema,
  })
  .superRefine((spec, ctx) => {
    const issue = (path: (string | number)[], message: string) => ctx.addIssue({ code: 'custom', path, message });
    if (spec.band.lower >= spec.band.upper)
      issue(['band', 'lower'], 'The lower deviation must be below the upper deviation.');
    if (spec.nominal + spec.band.lower <= 0)
      issue(['band', 'lower'], 'The lower deviation would take the height to zero or below.');

    const names = new Map<string, string>();
    const stationLists = [
      ['stations', spec.plan.stations],
      ['datumStations', spec.plan.datumStations],
    ] as const;
    for (const [list, stations] of stationLists) {
      stations.forEach((station, index) => {
        const seen = names.get(station.name);
        if (seen) issue(['plan', list, index, 'name'], `Station name "${station.name}" is already used in ${seen}.`);
        else names.set(station.name, list === 'stations' ? 'the top-face stations' : 'the datum stations');
      });
    }
    const circles = new Set<string>();
    spec.plan.runoutCircles.forEach((circle, index) => {
      if (circles.has(circle.name))
        issue(['plan', 'runoutCircles', index, 'name'], `Runout circle name "${circle.name}" is already used.`);
      circles.add(circle.name);
    });

    if (spec.flatness != null && spec.plan.stations.length < 3)
      issue(['plan', 'stations'], 'A flatness limit needs at least 3 top-face stations.');
    else if (spec.flatness != null && onOneLine(spec.plan.stations))
      issue(['plan', 'stations'], 'A flatness limit needs top-face stations that are not all on one line.');
    if (spec.parallelism != null && spec.plan.datumStations.length > 0 && spec.plan.datumStations.length < 3)
      issue(['plan', 'datumStations'], 'A measured datum face needs at least 3 stations.');
    if (spec.runout != null && spec.plan.runoutCircles.length === 0)
      issue(['plan', 'runoutCircles'], 'A runout limit needs at least one runout circle.');

    if (spec.heightStatistic === 'station') {
      if (!spec.heightStation) issue(['heightStation'], 'Name the station whose reading is the height.');
      else if (!spec.plan.stations.some((s) => s.name === spec.heightStation))
        issue(['heightStation'], `There is no top-face station named "${spec.heightStation}".`);
    } else if (spec.heightStation) {
      issue(['heightStation'], 'Name a height station only when the height statistic is "station".');
    }

    const grinding = spec.grinding;
    if (grinding) {
      if (grinding.finishDepth > grinding.roughDepth)
        issue(['grinding', 'finishDepth'], 'The finish depth cannot be deeper than the rough depth.');
      if (grinding.finishDepth > grinding.finishAllowance)
        issue(['grinding', 'finishDepth'], 'The finish depth cannot exceed the finish allowance.');
      if (grinding.finishAllowance >= spec.nominal)
        issue(['grinding', 'finishAllowance'], 'The finish allowance must be smaller than the part.');
    }
  });
/** True when every point lies on one straight line (no plane can be fitted to them). */
function onOneLine(points: { x: number; y: number }[]): boolean {
  const [a, ...rest] = points;
  const b = rest.find((p) => p.x !== a?.x || p.y !== a?.y);
  if (!a || !b) return true;
  return rest.every((p) => Math.abs((b.x - a.x) * (p.y - a.y) - (b.y - a.y) * (p.x - a.x)) < 1e-12);
}

export type SpecDefinition = z.infer<typeof specDefinitionSchema>;

export const createSpecSchema = z.object({ partNumber: partNumberSchema, definition: specDefinitionSchema });
export type CreateSpecInput = z.infer<typeof createSpecSchema>;

export const updateSpecSchema = z.object({ definition: specDefinitionSchema });
export type UpdateSpecInput = z.infer<typeof updateSpecSchema>;

export const specSchema = z.object({
  id: z.string(),
  partNumber: z.string(),
  revision: z.string(),
  status: specStatusSchema,
  /** The revision this one was made from. */
  previousId: z.string().nullable(),
  material: materialSchema,
  /** Lengths in millimetres (`unit: 'mm'`). */
  definition: specDefinitionSchema,
  /** The drift limit that applies, in mm: the spec's own or the default. */
  effectiveMasterDriftLimit: z.number(),
  /**
   * The part's expansion coefficient (1e-6/K) and its source, copied from the material at release
   * so later edits of the materials table never change a released revision; null for a draft.
   */
  frozenExpansion: z.object({ expansionPerK: z.number(), source: z.string() }).nullable(),
  releasedAt: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Spec = z.infer<typeof specSchema>;

export const specListQuerySchema = listQuerySchema.extend({ status: specStatusSchema.optional() });
export type SpecListQuery = z.infer<typeof specListQuerySchema>;

export const specChangeSchema = z.object({
  /** Dotted path of the field, e.g. `band.lower` or `plan.stations.C.x` (stations keyed by name). */
  field: z.string(),
  before: z.unknown(),
  after: z.unknown(),
});
export type SpecChange = z.infer<typeof specChangeSchema>;

export const specComparisonSchema = z.object({
  from: z.object({ id: z.string(), partNumber: z.string(), revision: z.string() }),
  to: z.object({ id: z.string(), partNumber: z.string(), revision: z.string() }),
  changes: z.array(specChangeSchema),
});
export type SpecComparison = z.infer<typeof specComparisonSchema>;
