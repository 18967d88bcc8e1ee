import { Check, DecimalType, Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import type {
  DecisionRule,
  DisplayUnit,
  MeasurementPlan,
  SpecDefinition,
  SpecStatus,
  Spec as SpecView,
} from '@evenset/contracts';
import { BaseEntity } from '../database/base.entity';
import { LENGTH_COLUMN, toMm, toMmOrNull } from '../common/units/lengths';
import { Material } from '../materials/material.entity';

// Fresh options per column: the ORM writes its metadata into the object it is given.
const length = () => ({ type: new DecimalType('number'), ...LENGTH_COLUMN });
const optionalLength = () => ({ ...length(), nullable: true });

/**
 * Our default master-check drift limit when a spec names none: one tenth (0.0001 in = 0.00254 mm),
 * the smallest step of the tenths indicators the shop uses. A house choice, not a published value.
 */
export const DEFAULT_MASTER_DRIFT_LIMIT_MM = 0.00254;

/**
 * One revision of a part spec. Lengths in millimetres. A released revision is frozen: only its
 * status moves on (to superseded); a change is a new revision.
 */
@Entity({ tableName: 'part_spec' })
@Unique({ properties: ['partNumber', 'revision'] })
@Check({ name: 'part_spec_status_check', expression: `status in ('draft', 'released', 'superseded')` })
@Check({
  name: 'part_spec_choices_check',
  expression: `display_unit in ('in', 'mm') and height_statistic in ('mean', 'highest', 'station') and decision_rule in ('simple', 'guarded')`,
})
@Check({ name: 'part_spec_band_check', expression: 'band_lower_mm < band_upper_mm' })
@Check({
  name: 'part_spec_lengths_check',
  expression:
    'nominal_mm > 0 and matching_band_mm > 0 and set_size >= 1 and coalesce(flatness_mm, 1) > 0 and coalesce(parallelism_mm, 1) > 0 and coalesce(runout_mm, 1) > 0 and coalesce(master_drift_limit_mm, 1) > 0',
})
@Check({ name: 'part_spec_height_check', expression: `(height_statistic = 'station') = (height_station is not null)` })
@Check({
  name: 'part_spec_grinding_check',
  expression:
    '(rough_depth_mm is null) = (finish_allowance_mm is null) and (rough_depth_mm is null) = (finish_depth_mm is null) and (rough_depth_mm is null) = (spark_out_passes is null)',
})
export class Spec extends BaseEntity {
  @Property({ type: 'text' })
  @Index()
  partNumber!: string;

  @Property({ type: 'text' })
  revision!: string;

  @Property({ type: 'text' })
  status: SpecStatus = 'draft';

  /** The revision this one was made from. */
  @ManyToOne(() => Spec, { nullable: true })
  previous?: Spec;

  @Property({ type: 'text' })
  title!: string;

  @ManyToOne(() => Material, { eager: true })
  material!: Material;

  @Property({ type: 'text' })
  displayUnit!: DisplayUnit;

  @Property(length())
  nominalMm!: number;

  @Property(length())
  bandLowerMm!: number;

  @Property(length())
  bandUpperMm!: number;

  @Property(length())
  matchingBandMm!: number;

  @Property(optionalLength())
  flatnessMm: number | null = null;

  @Property(optionalLength())
  parallelismMm: number | null = null;

  @Property(optionalLength())
  runoutMm: number | null = null;

  @Property({ type: 'integer' })
  setSize!: number;

  @Property({ type: 'text' })
  heightStatistic!: SpecDefinition['heightStatistic'];

  @Property({ type: 'text', nullable: true })
  heightStation: string | null = null;

  @Property({ type: 'text' })
  decisionRule!: DecisionRule;

  @Property(optionalLength())
  roughDepthMm: number | null = null;

  @Property(optionalLength())
  finishAllowanceMm: number | null = null;

  @Property(optionalLength())
  finishDepthMm: number | null = null;

  @Property({ type: 'integer', nullable: true })
  sparkOutPasses: number | null = null;

  @Property(optionalLength())
  masterDriftLimitMm: number | null = null;

  /**
   * Stations and circles, x/y/radius in mm. Kept as one document: the plan is part of the frozen
   * revision, read and written whole and never queried station by station.
   */
  @Property({ type: 'jsonb' })
  plan!: MeasurementPlan;

  /**
   * The material's expansion coefficient (1e-6/K) and its source, copied at release: a released
   * revision must not change when the materials table is edited later.
   */
  @Property({ type: new DecimalType('number'), precision: 6, scale: 2, nullable: true })
  frozenExpansionPerK: number | null = null;

  @Property({ type: 'text', nullable: true })
  frozenExpansionSource: string | null = null;

  @Property({ type: 'timestamptz', nullable: true })
  releasedAt: Date | null = null;

  @Property({ type: 'uuid', nullable: true })
  releasedById: string | null = null;

  @Property({ type: 'timestamptz', onUpdate: () => new Date(), defaultRaw: 'now()' })
  updatedAt: Date = new Date();

  /** A new revision holding `definition` (a draft unless said otherwise). */
  static revision(
    identity: { partNumber: string; revision: string; status?: SpecStatus; previous?: Spec },
    definition: SpecDefinition,
    material: Material,
  ): Spec {
    const spec = new Spec();
    spec.partNumber = identity.partNumber;
    spec.revision = identity.revision;
    spec.status = identity.status ?? 'draft';
    spec.previous = identity.previous;
    spec.applyDefinition(definition, material);
    return spec;
  }

  /** Copies the material's coefficient into the revision, as it stands at release. */
  freezeExpansion(): void {
    this.frozenExpansionPerK = this.material.expansionPerK;
    this.frozenExpansionSource = this.material.source;
  }

  /** The part's expansion coefficient, 1e-6/K: the frozen one once released. */
  expansionPerK(): number {
    return this.frozenExpansionPerK ?? this.material.expansionPerK;
  }

  /** Takes a definition given in its own unit, converting every length once to millimetres. */
  applyDefinition(definition: SpecDefinition, material: Material): void {
    const mm = (value: number) => toMm(value, definition.unit);
    const point = ({ name, x, y }: { name: string; x: number; y: number }) => ({ name, x: mm(x), y: mm(y) });
    this.title = definition.title;
    this.material = material;
    this.displayUnit = definition.displayUnit;
    this.nominalMm = mm(definition.nominal);
    this.bandLowerMm = mm(definition.band.lower);
    this.bandUpperMm = mm(definition.band.upper);
    this.matchingBandMm = mm(definition.matchingBand);
    this.flatnessMm = toMmOrNull(definition.flatness, definition.unit);
    this.parallelismMm = toMmOrNull(definition.parallelism, definition.unit);
    this.runoutMm = toMmOrNull(definition.runout, definition.unit);
    this.setSize = definition.setSize;
    this.heightStatistic = definition.heightStatistic;
    this.heightStation = definition.heightStation ?? null;
    this.decisionRule = definition.decisionRule;
    this.roughDepthMm = toMmOrNull(definition.grinding?.roughDepth, definition.unit);
    this.finishAllowanceMm = toMmOrNull(definition.grinding?.finishAllowance, definition.unit);
    this.finishDepthMm = toMmOrNull(definition.grinding?.finishDepth, definition.unit);
    this.sparkOutPasses = definition.grinding?.sparkOutPasses ?? null;
    this.masterDriftLimitMm = toMmOrNull(definition.masterDriftLimit, definition.unit);
    this.plan = {
      stations: definition.plan.stations.map(point),
      datumStations: definition.plan.datumStations.map(point),
      runoutCircles: definition.plan.runoutCircles.map((c) => ({ ...c, radius: mm(c.radius) })),
    };
  }

  /** The definition in millimetres, in the shape a request takes, so it can be edited and sent back. */
  definition(): SpecDefinition {
    const grinding =
      this.roughDepthMm != null &&
      this.finishAllowanceMm != null &&
      this.finishDepthMm != null &&
      this.sparkOutPasses != null
        ? {
            roughDepth: this.roughDepthMm,
            finishAllowance: this.finishAllowanceMm,
            finishDepth: this.finishDepthMm,
            sparkOutPasses: this.sparkOutPasses,
          }
        : null;
    return {
      unit: 'mm',
      title: this.title,
      materialId: this.material.id,
      displayUnit: this.displayUnit,
      nominal: this.nominalMm,
      band: { lower: this.bandLowerMm, upper: this.bandUpperMm },
      matchingBand: this.matchingBandMm,
      flatness: this.flatnessMm,
      parallelism: this.parallelismMm,
      runout: this.runoutMm,
      setSize: this.setSize,
      heightStatistic: this.heightStatistic,
      heightStation: this.heightStation,
      decisionRule: this.decisionRule,
      grinding,
      masterDriftLimit: this.masterDriftLimitMm,
      plan: this.plan,
    };
  }

  toView(): SpecView {
    return {
      id: this.id,
      partNumber: this.partNumber,
      revision: this.revision,
      status: this.status,
      previousId: this.previous?.id ?? null,
      material: this.material.toView(),
      definition: this.definition(),
      effectiveMasterDriftLimit: this.masterDriftLimitMm ?? DEFAULT_MASTER_DRIFT_LIMIT_MM,
      frozenExpansion:
        this.frozenExpansionPerK != null && this.frozenExpansionSource != null
          ? { expansionPerK: this.frozenExpansionPerK, source: this.frozenExpansionSource }
          : null,
      releasedAt: this.releasedAt?.toISOString() ?? null,
      createdAt: this.createdAt.toISOString(),
      updatedAt: this.updatedAt.toISOString(),
    };
  }
}
