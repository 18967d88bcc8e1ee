import { Check, DecimalType, Entity, ManyToOne, OneToOne, Property } from '@mikro-orm/core';
import type { Calibration as CalibrationView } from '@evenset/contracts';
import { BaseEntity } from '../database/base.entity';
import { LENGTH_COLUMN } from '../common/units/lengths';
import { CalibrationCertificate } from './calibration-certificate.entity';
import { MasterGauge } from './master-gauge.entity';

/**
 * One calibration of a master gauge. Permanent: the database refuses UPDATE and DELETE; a
 * correction is a new record that supersedes this one, with a reason.
 */
@Entity({ tableName: 'master_calibration' })
@Check({
  name: 'master_calibration_values_check',
  expression:
    'due_on > calibrated_on and calibrated_size_mm > 0 and expanded_uncertainty_mm > 0 and coverage_factor between 1 and 4',
})
@Check({ name: 'master_calibration_correction_check', expression: '(supersedes_id is null) = (reason is null)' })
export class MasterCalibration extends BaseEntity {
  @ManyToOne(() => MasterGauge)
  master!: MasterGauge;

  @Property({ type: 'date' })
  calibratedOn!: string;

  @Property({ type: 'date' })
  dueOn!: string;

  @Property({ type: new DecimalType('number'), ...LENGTH_COLUMN })
  calibratedSizeMm!: number;

  @Property({ type: new DecimalType('number'), ...LENGTH_COLUMN })
  expandedUncertaintyMm!: number;

  @Property({ type: new DecimalType('number'), precision: 4, scale: 2 })
  coverageFactor!: number;

  @Property({ type: 'text' })
  certificateNumber!: string;

  @OneToOne(() => CalibrationCertificate, { owner: true, eager: true })
  certificate!: CalibrationCertificate;

  /** The record this one corrects; at most one correction per record. */
  @OneToOne(() => MasterCalibration, { owner: true, nullable: true })
  supersedes: MasterCalibration | null = null;

  @Property({ type: 'text', nullable: true })
  reason: string | null = null;

  @Property({ type: 'uuid', nullable: true })
  recordedById: string | null = null;

  @Property({ type: 'text' })
  recordedByName!: string;

  toView(supersededById: string | null): CalibrationView {
    return {
      id: this.id,
      calibratedOn: this.calibratedOn,
      dueOn: this.dueOn,
      calibratedSize: this.calibratedSizeMm,
      expandedUncertainty: this.expandedUncertaintyMm,
      coverageFactor: this.coverageFactor,
      certificateNumber: this.certificateNumber,
      certificate: {
        filename: this.certificate.filename,
        contentType: this.certificate.contentType,
        sizeBytes: this.certificate.sizeBytes,
      },
      supersedesId: this.supersedes?.id ?? null,
      supersededById,
      reason: this.reason,
      recordedBy: this.recordedByName,
      createdAt: this.createdAt.toISOString(),
    };
  }
}
