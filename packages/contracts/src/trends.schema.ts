import { z } from 'zod';
import { isoDateSchema } from './masters.schema';
import { partNumberSchema } from './specs.schema';

/*
 * Trends of part height per part number: control charts, run-rule signals, capability and a
 * histogram. Read-only. Heights, limits and bins in answers are millimetres.
 *
 * Routes (roles):
 * - GET /api/trends               engineer, admin, inspector  → { items: TrendPartNumber[] } (released specs)
 * - GET /api/trends/:partNumber   engineer, admin, inspector  `trendQuerySchema` → Trend
 */

export const TREND_SUBGROUPS = ['lot', 'set'] as const;
export const trendSubgroupSchema = z.enum(TREND_SUBGROUPS, { error: 'Choose lot or set for the subgroups.' });
export type TrendSubgroup = z.infer<typeof trendSubgroupSchema>;

/** A list in a query string: `a,b` or the key repeated. */
const idList = (message: string) =>
  z
    .union([z.string(), z.array(z.string())], { error: message })
    .transform((v) => (Array.isArray(v) ? v : v.split(',')).map((s) => s.trim()).filter(Boolean))
    .pipe(z.array(z.uuid({ error: message })).max(200, 'Choose at most 200 lots.'));

export const trendQuerySchema = z
  .object({
    /** Inspection date from (inclusive, UTC). */
    from: isoDateSchema('the first inspection date').optional(),
    /** Inspection date to (inclusive, UTC). */
    to: isoDateSchema('the last inspection date').optional(),
    lotIds: idList('Choose lots from the list; one of them is not a valid lot id.').optional(),
    /** The inspector's user id, or their name as recorded (any case). */
    inspector: z.string().trim().min(1, 'Choose an inspector.').max(200, 'Use at most 200 characters.').optional(),
    masterId: z.uuid({ error: 'Choose a master gauge from the list.' }).optional(),
    subgroup: trendSubgroupSchema.default('lot'),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, {
    path: ['to'],
    message: 'The last inspection date must not be before the first.',
  });
export type TrendQuery = z.input<typeof trendQuerySchema>;

export const trendPartNumberParamsSchema = z.object({ partNumber: partNumberSchema });

export const trendPartNumberSchema = z.object({
  partNumber: z.string(),
  revision: z.string(),
  title: z.string(),
});
export type TrendPartNumber = z.infer<typeof trendPartNumberSchema>;

/**
 * Each charted part's current height (the newest result of its current, not superseded, inspection)
 * as columns: entry i of every column is point i. A part number can hold 20,000 points, so a point
 * names its lot, inspector and master by their place in `choices` rather than repeating names and
 * ids; `trendPointAt` puts one back together.
 */
export const trendPointsSchema = z
  .object({
    serial: z.array(z.string()),
    /** Place of the point's lot in `choices.lots`. */
    lot: z.array(z.number().int()),
    /** The sold set holding the part, if any. */
    setNumber: z.array(z.string().nullable()),
    /** Place of the inspector in `choices.inspectors`. */
    inspector: z.array(z.number().int()),
    /** Place of the master gauge in `choices.masters`. */
    master: z.array(z.number().int()),
    inspectedAt: z.array(z.string()),
    /** mm */
    height: z.array(z.number()),
  })
  .refine((p) => Object.values(p).every((column) => column.length === p.serial.length), {
    message: 'Every column of the points has one entry per point.',
  });
export type TrendPoints = z.infer<typeof trendPointsSchema>;

/** One point with its names, for tables, files and tests. */
export interface TrendPoint {
  serial: string;
  lotNumber: string;
  setNumber: string | null;
  inspectorName: string;
  masterCode: string;
  inspectedAt: string;
  /** mm */
  height: number;
}

export const trendLimitsSchema = z.object({ centre: z.number(), lower: z.number(), upper: z.number() });
export type TrendLimits = z.infer<typeof trendLimitsSchema>;

export const trendSignalSchema = z.object({
  chart: z.enum(['xbar', 'individuals']),
  rule: z.number().int(),
  side: z.enum(['high', 'low']),
  /** The rule in plain words. */
  description: z.string(),
  /** Position (0-based) of the point completing the pattern on its chart. */
  index: z.number().int(),
  /** Labels (serials or subgroup names) of the points that make the pattern, in chart order. */
  points: z.array(z.string()),
  /** Chart positions of those points. */
  indexes: z.array(z.number().int()),
});
export type TrendSignal = z.infer<typeof trendSignalSchema>;

export const trendSubgroupRowSchema = z.object({
  label: z.string(),
  /** Serials of the parts charted for the subgroup (its first `size` in chart order). */
  serials: z.array(z.string()),
  mean: z.number(),
  range: z.number(),
});

export const trendSubgroupChartSchema = z.object({
  basis: trendSubgroupSchema,
  /** Values per subgroup used in the chart; null when no chart could be drawn. */
  size: z.number().int().nullable(),
  /** How the size was chosen, in plain words. */
  sizeRule: z.string(),
  subgroups: z.array(trendSubgroupRowSchema),
  /** Subgroups not charted, and why. */
  leftOut: z.array(z.object({ label: z.string(), count: z.number().int(), reason: z.string() })),
  /** Subgroups charted with only their first `size` values. */
  trimmed: z.array(z.object({ label: z.string(), count: z.number().int() })),
  xbar: trendLimitsSchema.nullable(),
  range: trendLimitsSchema.nullable(),
  /** Within-subgroup σ estimate R̄/d2, mm. */
  sigma: z.number().nullable(),
  /** Why there is no chart, when there is none. */
  note: z.string().nullable(),
});
export type TrendSubgroupChart = z.infer<typeof trendSubgroupChartSchema>;

export const trendIndividualsSchema = z.object({
  /** |x_i − x_{i−1}|, one fewer than the points. */
  movingRanges: z.array(z.number()),
  individuals: trendLimitsSchema,
  movingRange: trendLimitsSchema,
  /** MR̄/d2, mm. */
  sigma: z.number(),
});
export type TrendIndividuals = z.infer<typeof trendIndividualsSchema>;

export const trendCapabilitySchema = z.object({
  revision: z.string(),
  /** Specification limits, absolute heights in mm (nominal + band). */
  lower: z.number(),
  upper: z.number(),
  count: z.number().int(),
  mean: z.number(),
  /** Sample standard deviation of the heights, mm. */
  sigma: z.number(),
  cp: z.number(),
  cpk: z.number(),
  /** Fewer values than common practice wants behind a capability figure (30). */
  fewValues: z.boolean(),
  warning: z.string().nullable(),
});
export type TrendCapability = z.infer<typeof trendCapabilitySchema>;

export const trendHistogramBinSchema = z.object({ from: z.number(), to: z.number(), count: z.number().int() });
export type TrendHistogramBin = z.infer<typeof trendHistogramBinSchema>;

export const trendSchema = z.object({
  partNumber: z.string(),
  /** The current released revision whose band the charts and capability use; null if none. */
  spec: z
    .object({
      id: z.string(),
      revision: z.string(),
      /** mm */
      nominal: z.number(),
      /** Absolute limits, mm. */
      lower: z.number(),
      upper: z.number(),
    })
    .nullable(),
  /** Points in chart order: lots by grind date, then parts by inspection time. */
  points: trendPointsSchema,
  subgroups: trendSubgroupChartSchema,
  individuals: trendIndividualsSchema.nullable(),
  signals: z.array(trendSignalSchema),
  capability: trendCapabilitySchema.nullable(),
  /** Why there is no capability, when there is none. */
  capabilityNote: z.string().nullable(),
  histogram: z.array(trendHistogramBinSchema),
  /** Filter choices found in all of the part number's data (before the filters). */
  choices: z.object({
    lots: z.array(z.object({ id: z.string(), lotNumber: z.string() })),
    inspectors: z.array(z.object({ id: z.string().nullable(), name: z.string() })),
    masters: z.array(z.object({ id: z.string(), code: z.string() })),
  }),
});
export type Trend = z.infer<typeof trendSchema>;

/** Point `i` of a trend, its lot, inspector and master named from the trend's choices. */
export function trendPointAt({ points, choices }: Pick<Trend, 'points' | 'choices'>, i: number): TrendPoint {
  return {
    serial: points.serial[i]!,
    lotNumber: choices.lots[points.lot[i]!]!.lotNumber,
    setNumber: points.setNumber[i]!,
    inspectorName: choices.inspectors[points.inspector[i]!]!.name,
    masterCode: choices.masters[points.master[i]!]!.code,
    inspectedAt: points.inspectedAt[i]!,
    height: points.height[i]!,
  };
}

/** Every point of a trend, in chart order, as `trendPointAt` gives them. */
export function trendPointList(trend: Pick<Trend, 'points' | 'choices'>): TrendPoint[] {
  return trend.points.serial.map((_, i) => trendPointAt(trend, i));
}
