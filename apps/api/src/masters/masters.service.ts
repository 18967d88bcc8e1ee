import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import type { FilterQuery } from '@mikro-orm/core';
import { Injectable } from '@nestjs/common';
import type {
  ApiErrorDetail,
  CalibrationForm,
  CalibrationRecorded,
  CorrectionImpact,
  CreateMasterInput,
  GaugeListQuery,
  Master as MasterView,
  MasterDetail,
  Page,
  SessionUser,
} from '@evenset/contracts';
import { createHash } from 'node:crypto';
import { AuditService } from '../audit/audit.service';
import { certificatesOfParts } from '../certificates/certificate-impact';
import { NotFoundException, ValidationFailedException } from '../common/errors/domain.exception';
import { gaugeStatus, todayIso } from '../common/gauges/gauge-status';
import { listOptions, searchAny } from '../common/list-query';
import { toMm } from '../common/units/lengths';
import { CERTIFICATE_FIELD, type UploadedCertificate } from '../files/certificate-upload.interceptor';
import { detectCertificateType, safeFilename } from '../files/file-type';
import { FileMissingException, FileTypeRefusedException } from '../files/files.exception';
import { InspectionResult } from '../inspections/inspection-result.entity';
import { InspectionsService } from '../inspections/inspections.service';
import { Material } from '../materials/material.entity';
import { CalibrationCertificate } from './calibration-certificate.entity';
import { currentOf } from './current-calibration';
import { MasterCalibration } from './master-calibration.entity';
import { MasterGauge } from './master-gauge.entity';
import { GaugeCodeTakenException, GaugeRetiredException } from '../common/gauges/gauge.exception';
import { CalibrationAlreadySupersededException } from './masters.exception';

/** A calibrated size this far from nominal (1 %) is a slip of unit or digit, not a worn master. */
const SIZE_SANITY_FRACTION = 0.01;

export interface CertificateFile {
  filename: string;
  contentType: string;
  content: Buffer;
}

@Injectable()
export class MastersService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly inspections: InspectionsService,
  ) {}

  async list(query: GaugeListQuery): Promise<Page<MasterView>> {
    const today = todayIso();
    const usable: FilterQuery<MasterGauge> = query.usable
      ? { retiredAt: null, currentCalibration: { dueOn: { $gte: today } } }
      : {};
    const [masters, total] = await this.em.findAndCount(
      MasterGauge,
      { $and: [searchAny<MasterGauge>(query.q, ['code', 'description']), usable] },
      listOptions(query, ['code', 'description', 'nominalMm', 'createdAt'], 'code'),
    );
    return { items: masters.map((m) => view(m, today)), total };
  }

  async detail(id: string): Promise<MasterDetail> {
    const master = await this.get(id);
    const calibrations = await this.calibrationsOf(master);
    const supersededBy = new Map(calibrations.flatMap((c) => (c.supersedes ? [[c.supersedes.id, c.id]] : [])));
    return {
      ...view(master, todayIso()),
      calibrations: calibrations.map((c) => c.toView(supersededBy.get(c.id) ?? null)),
    };
  }

  async create(actor: SessionUser, input: CreateMasterInput): Promise<MasterView> {
    const material = await this.em.findOne(Material, { id: input.materialId });
    if (!material) throw new ValidationFailedException([{ path: 'materialId', message: 'There is no such material.' }]);
    const master = this.em.create(MasterGauge, {
      code: input.code,
      description: input.description,
      nominalMm: toMm(input.nominal, input.unit),
      material,
      createdAt: new Date(),
      updatedAt: new Date(),
    });
    this.em.persist(master);
    this.audit.record(actor, {
      action: 'master.create',
      subjectType: 'master',
      subjectId: master.id,
      after: {
        code: master.code,
        description: master.description,
        nominalMm: master.nominalMm,
        material: material.name,
      },
    });
    try {
      await this.em.flush();
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException) throw new GaugeCodeTakenException(input.code);
      throw error;
    }
    return view(master, todayIso());
  }

  async retire(actor: SessionUser, id: string, reason: string): Promise<MasterView> {
    const master = await this.get(id);
    if (master.retiredAt) throw new GaugeRetiredException(master.code);
    master.retiredAt = new Date();
    master.retiredReason = reason;
    this.audit.record(actor, { action: 'master.retire', subjectType: 'master', subjectId: master.id, reason });
    await this.em.flush();
    return view(master, todayIso());
  }

  /**
   * Records a calibration, or a correction superseding an earlier one; both stay on record. A
   * correction recomputes, in the same transaction, every inspection measured against the
   * superseded record and answers the parts whose verdict changes.
   */
  async addCalibration(
    actor: SessionUser,
    id: string,
    form: CalibrationForm,
    file: UploadedCertificate | undefined,
  ): Promise<CalibrationRecorded> {
    if (!file) throw new FileMissingException(CERTIFICATE_FIELD);
    const contentType = detectCertificateType(file.buffer);
    if (!contentType) throw new FileTypeRefusedException(CERTIFICATE_FIELD);
    const master = await this.get(id);
    if (master.retiredAt) throw new GaugeRetiredException(master.code);
    const calibratedSizeMm = toMm(form.calibratedSize, form.unit);
    this.checkPlausible(master, form, calibratedSizeMm);

    const calibrations = await this.calibrationsOf(master);
    const supersedes = form.supersedesId ? calibrations.find((c) => c.id === form.supersedesId) : undefined;
    if (form.supersedesId && !supersedes)
      throw new ValidationFailedException([
        { path: 'supersedesId', message: `There is no such calibration of ${master.code}.` },
      ]);
    if (supersedes && calibrations.some((c) => c.supersedes?.id === supersedes.id))
      throw new CalibrationAlreadySupersededException();

    const certificate = this.em.create(CalibrationCertificate, {
      filename: safeFilename(file.originalname, `${form.certificateNumber}-certificate`),
      contentType,
      sizeBytes: file.size,
      sha256: createHash('sha256').update(file.buffer).digest('hex'),
      content: file.buffer,
      createdAt: new Date(),
    });
    const calibration = this.em.create(MasterCalibration, {
      master,
      calibratedOn: form.calibratedOn,
      dueOn: form.dueOn,
      calibratedSizeMm,
      expandedUncertaintyMm: toMm(form.expandedUncertainty, form.unit),
      coverageFactor: form.coverageFactor,
      certificateNumber: form.certificateNumber,
      certificate,
      supersedes: supersedes ?? null,
      reason: form.reason ?? null,
      recordedById: actor.id,
      recordedByName: actor.displayName,
      createdAt: new Date(),
    });
    this.em.persist([certificate, calibration]);
    master.currentCalibration = currentOf([...calibrations, calibration]);
    this.audit.record(actor, {
      action: supersedes ? 'master.calibration-correct' : 'master.calibrate',
      subjectType: 'master',
      subjectId: master.id,
      before: supersedes ? calibrationSummary(supersedes) : undefined,
      after: { ...calibrationSummary(calibration), sha256: certificate.sha256 },
      reason: form.reason,
    });
    const certificates = supersedes ? await certificatesOfParts(this.em, await this.partsMeasuredWith(supersedes)) : [];
    const impact: CorrectionImpact | null = supersedes
      ? {
          ...(await this.inspections.recomputeForCorrection(actor, supersedes, calibration, form.reason ?? '')),
          certificates,
        }
      : null;
    try {
      await this.em.flush();
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException) throw new CalibrationAlreadySupersededException();
      throw error;
    }
    return { ...(await this.detail(master.id)), impact };
  }

  async certificate(id: string, calibrationId: string): Promise<CertificateFile> {
    const calibration = await this.em.findOne(
      MasterCalibration,
      { id: calibrationId, master: id },
      { populate: ['certificate.content'] },
    );
    if (!calibration) throw new NotFoundException('This calibration certificate');
    const { filename, contentType, content } = calibration.certificate;
    return { filename, contentType, content };
  }

  /** Parts whose height in force was measured against `calibration` (those a correction recomputes). */
  private async partsMeasuredWith(calibration: MasterCalibration): Promise<string[]> {
    const results = await this.em.find(
      InspectionResult,
      { masterCalibration: calibration },
      { populate: ['inspection'] },
    );
    const inspections = [...new Map(results.map((r) => [r.inspection.id, r.inspection])).values()];
    const latest = await this.inspections.latestResults(inspections.map((i) => i.id));
    return inspections.filter((i) => latest.get(i.id)?.masterCalibration.id === calibration.id).map((i) => i.part.id);
  }

  private checkPlausible(master: MasterGauge, form: CalibrationForm, calibratedSizeMm: number): void {
    const problems: ApiErrorDetail[] = [];
    if (Math.abs(calibratedSizeMm - master.nominalMm) > SIZE_SANITY_FRACTION * master.nominalMm)
      problems.push({
        path: 'calibratedSize',
        message: `This is far from the nominal size (${master.nominalMm} mm); check the unit and the digits.`,
      });
    if (form.calibratedOn > todayIso())
      problems.push({ path: 'calibratedOn', message: 'The calibration date cannot be in the future.' });
    if (problems.length) throw new ValidationFailedException(problems);
  }

  private calibrationsOf(master: MasterGauge): Promise<MasterCalibration[]> {
    return this.em.find(MasterCalibration, { master }, { orderBy: { calibratedOn: 'desc', createdAt: 'desc' } });
  }

  private async get(id: string): Promise<MasterGauge> {
    const master = await this.em.findOne(MasterGauge, { id });
    if (!master) throw new NotFoundException('This master gauge');
    return master;
  }
}

function view(master: MasterGauge, today: string): MasterView {
  const current = master.currentCalibration;
  return {
    id: master.id,
    code: master.code,
    description: master.description,
    nominal: master.nominalMm,
    material: master.material.toView(),
    status: gaugeStatus(current?.dueOn ?? null, today, master.retiredAt !== null),
    current: current?.toView(null) ?? null,
    retiredAt: master.retiredAt?.toISOString() ?? null,
    retiredReason: master.retiredReason,
    createdAt: master.createdAt.toISOString(),
  };
}

function calibrationSummary(c: MasterCalibration): Record<string, unknown> {
  return {
    calibrationId: c.id,
    calibratedOn: c.calibratedOn,
    dueOn: c.dueOn,
    calibratedSizeMm: c.calibratedSizeMm,
    expandedUncertaintyMm: c.expandedUncertaintyMm,
    coverageFactor: c.coverageFactor,
    certificateNumber: c.certificateNumber,
  };
}
