import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import type { FilterQuery } from '@mikro-orm/core';
import { Injectable } from '@nestjs/common';
import type {
  GaugeListQuery,
  Instrument as InstrumentView,
  InstrumentInput,
  Page,
  SessionUser,
} from '@evenset/contracts';
import { AuditService } from '../audit/audit.service';
import { NotFoundException } from '../common/errors/domain.exception';
import { gaugeStatus, todayIso } from '../common/gauges/gauge-status';
import { listOptions, searchAny } from '../common/list-query';
import { toMm } from '../common/units/lengths';
import { GaugeCodeTakenException, GaugeRetiredException } from '../common/gauges/gauge.exception';
import { Instrument } from './instrument.entity';

@Injectable()
export class InstrumentsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async list(query: GaugeListQuery): Promise<Page<InstrumentView>> {
    const today = todayIso();
    const usable: FilterQuery<Instrument> = query.usable ? { retiredAt: null, calibrationDueOn: { $gte: today } } : {};
    const [instruments, total] = await this.em.findAndCount(
      Instrument,
      { $and: [searchAny<Instrument>(query.q, ['code', 'description']), usable] },
      listOptions(query, ['code', 'kind', 'description', 'calibrationDueOn', 'createdAt'], 'code'),
    );
    return { items: instruments.map((i) => view(i, today)), total };
  }

  async view(id: string): Promise<InstrumentView> {
    return view(await this.get(id), todayIso());
  }

  async create(actor: SessionUser, input: InstrumentInput): Promise<InstrumentView> {
    const instrument = this.em.create(Instrument, {
      ...fields(input),
      createdAt: new Date(),
      updatedAt: new Date(),
    });
    this.em.persist(instrument);
    this.audit.record(actor, {
      action: 'instrument.create',
      subjectType: 'instrument',
      subjectId: instrument.id,
      after: fields(input),
    });
    await this.flush(input.code);
    return view(instrument, todayIso());
  }

  async update(actor: SessionUser, id: string, input: InstrumentInput): Promise<InstrumentView> {
    const instrument = await this.get(id);
    if (instrument.retiredAt) throw new GaugeRetiredException(instrument.code);
    const before = summary(instrument);
    this.em.assign(instrument, fields(input));
    this.audit.record(actor, {
      action: 'instrument.update',
      subjectType: 'instrument',
      subjectId: instrument.id,
      before,
      after: summary(instrument),
    });
    await this.flush(input.code);
    return view(instrument, todayIso());
  }

  async retire(actor: SessionUser, id: string, reason: string): Promise<InstrumentView> {
    const instrument = await this.get(id);
    if (instrument.retiredAt) throw new GaugeRetiredException(instrument.code);
    instrument.retiredAt = new Date();
    instrument.retiredReason = reason;
    this.audit.record(actor, { action: 'instrument.retire', subjectType: 'instrument', subjectId: id, reason });
    await this.em.flush();
    return view(instrument, todayIso());
  }

  private async get(id: string): Promise<Instrument> {
    const instrument = await this.em.findOne(Instrument, { id });
    if (!instrument) throw new NotFoundException('This instrument');
    return instrument;
  }

  private async flush(code: string): Promise<void> {
    try {
      await this.em.flush();
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException) throw new GaugeCodeTakenException(code);
      throw error;
    }
  }
}

function fields(input: InstrumentInput) {
  return {
    code: input.code,
    kind: input.kind,
    description: input.description,
    resolutionMm: toMm(input.resolution, input.unit),
    calibrationDueOn: input.calibrationDueOn,
  };
}

function summary(instrument: Instrument): Record<string, unknown> {
  const { code, kind, description, resolutionMm, calibrationDueOn } = instrument;
  return { code, kind, description, resolutionMm, calibrationDueOn };
}

function view(instrument: Instrument, today: string): InstrumentView {
  return {
    id: instrument.id,
    code: instrument.code,
    kind: instrument.kind,
    description: instrument.description,
    resolution: instrument.resolutionMm,
    calibrationDueOn: instrument.calibrationDueOn,
    status: gaugeStatus(instrument.calibrationDueOn, today, instrument.retiredAt !== null),
    retiredAt: instrument.retiredAt?.toISOString() ?? null,
    retiredReason: instrument.retiredReason,
    createdAt: instrument.createdAt.toISOString(),
  };
}
