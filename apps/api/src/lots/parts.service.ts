import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import {
  GRINDING_CAUTION_ITEMS,
  type Disposition as DispositionView,
  type DispositionInput,
  type PartDetail,
  type PartStatus,
  type ReleaseInput,
  type SessionUser,
} from '@evenset/contracts';
import { AuditService } from '../audit/audit.service';
import { NotFoundException } from '../common/errors/domain.exception';
import { toMm } from '../common/units/lengths';
import { Inspection } from '../inspections/inspection.entity';
import { InspectionsService } from '../inspections/inspections.service';
import { DispositionRefusedException } from './lots.exception';
import { PartDisposition } from './part-disposition.entity';
import { PartStatusService, type PartState } from './part-status';
import { reworkPlan } from './rework-plan';
import { Part } from './part.entity';
import { InterchangeService } from '../sets/interchange.service';
import { SetMember } from '../sets/set-member.entity';

/** Shown beside every rework plan: grinding can hurt people (the one list grind requests carry too). */
export const GRINDING_CAUTIONS = `Before grinding: ${GRINDING_CAUTION_ITEMS.join(' ')}`;

/** States a disposition may be made from: the part failed, sits in a guard band, is held, or is already in rework. */
const DISPOSABLE: PartStatus[] = ['does-not-conform', 'guard-band', 'held', 'rework'];
/** States a part may be released from. */
const RELEASABLE: PartStatus[] = ['conforms', 'use-as-is'];

@Injectable()
export class PartsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly states: PartStatusService,
    private readonly inspections: InspectionsService,
    private readonly interchange: InterchangeService,
  ) {}

  async detail(id: string): Promise<PartDetail> {
    const [state] = await this.states.states([await this.get(id)]);
    const { part, status } = state!;
    const inspections = await this.em.find(Inspection, { part }, { orderBy: { createdAt: 'desc', id: 'asc' } });
    const dispositions = await this.em.find(PartDisposition, { part }, { orderBy: { createdAt: 'desc', id: 'asc' } });
    const window = await this.interchange.summary(part.partNumber);
    const member = await this.em.findOne(SetMember, { part }, { populate: ['set'] });
    return {
      id: part.id,
      serial: part.serial,
      partNumber: part.partNumber,
      lot: { id: part.lot.id, lotNumber: part.lot.lotNumber },
      status,
      inspections: await this.inspections.views(inspections),
      dispositions: dispositions.map(view),
      interchange: { ...window.summary, outside: window.outside(state!.result?.computed.height ?? null) },
      set: member ? { id: member.set.id, setNumber: member.set.setNumber, kind: member.set.kind } : null,
      createdAt: part.createdAt.toISOString(),
    };
  }

  async dispose(actor: SessionUser, id: string, input: DispositionInput): Promise<DispositionView> {
    const state = await this.state(id);
    if (!DISPOSABLE.includes(state.status))
      throw new DispositionRefusedException(
        `Part ${state.part.serial} is ${state.status.replace(/-/g, ' ')}; only parts that do not conform, sit in a guard band or are held take a disposition.`,
      );
    const record = this.em.create(PartDisposition, {
      part: state.part,
      kind: input.kind,
      reason: input.reason ?? null,
      inspectionId: state.inspection?.id ?? null,
      decidedById: actor.id,
      decidedByName: actor.displayName,
      createdAt: new Date(),
    });
    if (input.kind === 'rework') this.planRework(record, state, input.targetHeight, input.unit ?? 'mm');
    return this.save(actor, record);
  }

  async release(actor: SessionUser, id: string, input: ReleaseInput): Promise<DispositionView> {
    const state = await this.state(id);
    if (!RELEASABLE.includes(state.status))
      throw new DispositionRefusedException(
        `Part ${state.part.serial} is ${state.status.replace(/-/g, ' ')}; only a conforming part, or one an engineer accepted for use as is, can be released.`,
      );
    const record = this.em.create(PartDisposition, {
      part: state.part,
      kind: 'release',
      reason: input.note || null,
      inspectionId: state.inspection?.id ?? null,
      decidedById: actor.id,
      decidedByName: actor.displayName,
      createdAt: new Date(),
    });
    return this.save(actor, record);
  }

  /** Target (default mid-band), stock to remove and the pass plan from the spec's grinding parameters. */
  private planRework(record: PartDisposition, state: PartState, target: number | undefined, unit: 'in' | 'mm'): void {
    const spec = state.part.lot.spec;
    if (!state.result)
      throw new DispositionRefusedException(`Part ${state.part.serial} has no inspection to plan a rework from.`);
    const current = state.result.computed.height;
    const targetMm =
      target !== undefined
        ? toMm(target, unit)
        : toMm(spec.nominalMm + (spec.bandLowerMm + spec.bandUpperMm) / 2, 'mm');
    if (!(targetMm < current))
      throw new DispositionRefusedException(
        `Part ${state.part.serial} is already at or below the target height; grinding can only remove stock.`,
      );
    const plan = reworkPlan(spec, current, targetMm);
    record.currentHeightMm = plan.currentHeightMm;
    record.targetHeightMm = plan.targetHeightMm;
    record.stockMm = plan.stockMm;
    record.passes = plan.passes;
  }

  private async save(actor: SessionUser, record: PartDisposition): Promise<DispositionView> {
    this.em.persist(record);
    this.audit.record(actor, {
      action: record.kind === 'release' ? 'part.release' : `part.${record.kind}`,
      subjectType: 'part',
      subjectId: record.part.id,
      after: {
        kind: record.kind,
        inspectionId: record.inspectionId,
        targetHeightMm: record.targetHeightMm,
        stockMm: record.stockMm,
      },
      reason: record.reason ?? undefined,
    });
    await this.em.flush();
    return view(record);
  }

  private async state(id: string): Promise<PartState> {
    const [state] = await this.states.states([await this.get(id)]);
    return state!;
  }

  private async get(id: string): Promise<Part> {
    const part = await this.em.findOne(Part, { id }, { populate: ['lot'] });
    if (!part) throw new NotFoundException('This part');
    return part;
  }
}

function view(d: PartDisposition): DispositionView {
  return {
    id: d.id,
    partId: d.part.id,
    kind: d.kind,
    reason: d.reason,
    inspectionId: d.inspectionId,
    rework:
      d.kind === 'rework' && d.currentHeightMm != null && d.targetHeightMm != null && d.stockMm != null
        ? {
            currentHeight: d.currentHeightMm,
            targetHeight: d.targetHeightMm,
            stockToRemove: d.stockMm,
            passes: d.passes,
            cautions: GRINDING_CAUTIONS,
          }
        : null,
    decidedBy: d.decidedByName,
    createdAt: d.createdAt.toISOString(),
  };
}
