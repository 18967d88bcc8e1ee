import { Check, DecimalType, Entity, Index, ManyToOne, Property } from '@mikro-orm/core';
import type { InspectionResult as InspectionResultView, Verdict } from '@evenset/contracts';
import { BaseEntity } from '../database/base.entity';
import { LENGTH_COLUMN } from '../common/units/lengths';
import { MasterCalibration } from '../masters/master-calibration.entity';
import { Inspection } from './inspection.entity';

const optionalLength = () => ({ type: new DecimalType('number'), ...LENGTH_COLUMN, nullable: true });

/** The computed part of a result: the columns the lists sort on, and the whole answer as computed. */
export type ComputedResult = Omit<InspectionResultView, 'id' | 'reason' | 'masterCalibrationId' | 'createdAt'>;

/** A result as the API shows it: the computed answer with its identity (from an entity or a stored row). */
export function resultView(r: {
  id: string;
  reason: string;
  masterCalibrationId: string;
  computed: ComputedResult;
  createdAt: Date;
}): InspectionResultView {
  return {
    ...r.computed,
    id: r.id,
    reason: r.reason,
    masterCalibrationId: r.masterCalibrationId,
    createdAt: r.createdAt.toISOString(),
  };
}

/**
 * What the server computed from an inspection's readings. Append-only: a recomputation (e.g.
 * after a master correction) adds a result; the newest is the one in force.
 */
@Entity({ tableName: 'inspection_result' })
@Check({
  name: 'inspection_result_verdict_check',
  expression: `verdict in ('conforms', 'does-not-conform', 'guard-band') and expanded_uncertainty_mm >= 0`,
})
// The newest result of each inspection, with the height, read from the index alone (trends).
@Index({
  name: 'inspection_result_current_height',
  expression:
    'create index "inspection_result_current_height" on "inspection_result" ("inspection_id", "created_at", "id") include ("height_mm")',
})
export class InspectionResult extends BaseEntity {
  @ManyToOne(() => Inspection)
  inspection!: Inspection;

  @Property({ type: 'text' })
  reason!: string;

  @ManyToOne(() => MasterCalibration)
  @Index()
  masterCalibration!: MasterCalibration;

  @Property({ type: new DecimalType('number'), ...LENGTH_COLUMN })
  heightMm!: number;

  @Property({ type: new DecimalType('number'), ...LENGTH_COLUMN })
  expandedUncertaintyMm!: number;

  @Property(optionalLength())
  flatnessMm: number | null = null;

  @Property(optionalLength())
  parallelismMm: number | null = null;

  @Property(optionalLength())
  runoutMm: number | null = null;

  @Property({ type: 'text' })
  verdict!: Verdict;

  /** The full computed answer in millimetres, unrounded, as the server produced it. */
  @Property({ type: 'jsonb' })
  computed!: ComputedResult;

  toView(): InspectionResultView {
    return resultView({
      id: this.id,
      reason: this.reason,
      masterCalibrationId: this.masterCalibration.id,
      computed: this.computed,
      createdAt: this.createdAt,
    });
  }
}
