import type { EntityManager } from '@mikro-orm/postgresql';
import { createHash } from 'node:crypto';
import { CalibrationCertificate } from '../../masters/calibration-certificate.entity';
import { currentOf } from '../../masters/current-calibration';
import { MasterCalibration } from '../../masters/master-calibration.entity';
import { MasterGauge } from '../../masters/master-gauge.entity';
import type { Material } from '../../materials/material.entity';
import { minimalPdf } from './certificate-file';

export interface CalibrationSeed {
  calibratedOn: string;
  dueOn: string;
  calibratedSizeMm: number;
  expandedUncertaintyMm: number;
  coverageFactor?: number;
  certificateNumber: string;
  /** When set, this record corrects the one seeded just before it. */
  correctionReason?: string;
}

export interface MasterSeed {
  code: string;
  description: string;
  nominalMm: number;
  material: Material;
  calibrations: CalibrationSeed[];
}

/** Creates and flushes a master gauge with its calibration history, or returns the existing one (idempotent). */
export async function ensureMaster(em: EntityManager, seed: MasterSeed): Promise<MasterGauge> {
  const existing = await em.findOne(MasterGauge, { code: seed.code });
  if (existing) return existing;
  const master = em.create(MasterGauge, {
    code: seed.code,
    description: seed.description,
    nominalMm: seed.nominalMm,
    material: seed.material,
    createdAt: new Date(),
    updatedAt: new Date(),
  });
  em.persist(master);
  const calibrations: MasterCalibration[] = [];
  // One flush per record: a correction must point at a row already written, since calibration
  // rows can never be updated afterwards.
  for (const c of seed.calibrations) {
    const content = minimalPdf(`Calibration certificate ${c.certificateNumber} - ${seed.code} - demo only`);
    const certificate = em.create(CalibrationCertificate, {
      filename: `${c.certificateNumber}.pdf`,
      contentType: 'application/pdf',
      sizeBytes: content.length,
      sha256: createHash('sha256').update(content).digest('hex'),
      content,
      createdAt: new Date(),
    });
    const previous = calibrations.at(-1);
    calibrations.push(
      em.create(MasterCalibration, {
        master,
        calibratedOn: c.calibratedOn,
        dueOn: c.dueOn,
        calibratedSizeMm: c.calibratedSizeMm,
        expandedUncertaintyMm: c.expandedUncertaintyMm,
        coverageFactor: c.coverageFactor ?? 2,
        certificateNumber: c.certificateNumber,
        certificate,
        supersedes: c.correctionReason && previous ? previous : null,
        reason: c.correctionReason ?? null,
        recordedByName: 'system',
        createdAt: new Date(),
      }),
    );
    master.currentCalibration = currentOf(calibrations);
    await em.flush();
  }
  return master;
}
