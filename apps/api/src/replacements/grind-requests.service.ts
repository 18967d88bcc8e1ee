import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import {
  GRINDING_CAUTION_ITEMS,
  type CreateGrindRequestInput,
  type GrindRequestDetail,
  type GrindRequestListQuery,
  type GrindRequestRow,
  type GrindRequestStepInput,
  type Page,
  type SessionUser,
} from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import { AuditService } from '../audit/audit.service';
import { NotFoundException } from '../common/errors/domain.exception';
import { InspectionResult } from '../inspections/inspection-result.entity';
import { PartDisposition } from '../lots/part-disposition.entity';
import { reworkPlan } from '../lots/rework-plan';
import { SetMember } from '../sets/set-member.entity';
import { lockFreeStock } from '../sets/set-number';
import { GrindRequestProgress, type Progress } from './grind-request-progress';
import { nextGrindRequestNumber } from './grind-request-number';
import { GrindRequestStep } from './grind-request-step.entity';
import { GrindRequest } from './grind-request.entity';
import { inWindow } from '../sets/window';
import { GrindRequestStepRefusedException, ReplacementRefusedException } from './replacements.exception';
import { ReplacementsService } from './replacements.service';
import { lockRow } from './row-lock';

/** Sort fields of the list, as the grid names them, and their columns. */
const SORTS: Record<string, string> = {
  requestNumber: 'requestNumber',
  serial: 'part.serial',
  partNumber: 'part.partNumber',
  targetHeight: 'targetHeightMm',
  stock: 'stockMm',
  createdAt: 'createdAt',
};

/** Grind-to-target requests: a free part above a sold set's window, ground down to its centre. */
@Injectable()
export class GrindRequestsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly replacements: ReplacementsService,
    private readonly progress: GrindRequestProgress,
  ) {}

  /**
   * Raises the request and, in the same transaction, a rework disposition with the same target,
   * so the part leaves released stock until it is ground, re-inspected and released again.
   */
  async create(actor: SessionUser, input: CreateGrindRequestInput): Promise<GrindRequestDetail> {
    const id = await this.em.transactional(async (em) => {
      await lockFreeStock(em);
      const sold = await this.replacements.originalSet(input.originalSetId);
      const { part, free } = await this.replacements.usablePart(em, sold, input.partId);
      const { window, centre, explanation } = sold.window;
      if (!window || centre === null) throw new ReplacementRefusedException(explanation, 'originalSetId');
      const result = await em.findOneOrFail(InspectionResult, { id: free.resultId });
      await em.populate(part, ['lot']);
      const unit = sold.spec.displayUnit;
      const show = (mm: number) => formatLength(mm, unit, { level: 'fine' });
      if (inWindow(window, free.height))
        throw new ReplacementRefusedException(
          `Part ${part.serial} already fits set ${sold.set.setNumber} (${show(free.height)}); send it as a replacement instead of grinding it.`,
        );
      if (free.height < window.low)
        throw new ReplacementRefusedException(
          `Part ${part.serial} measures ${show(free.height)}, below the window (${show(window.low)} to ${show(window.high)}); grinding only removes stock.`,
        );
      // Grinding follows the part's own spec revision: the Bench re-inspects it against that revision.
      const plan = reworkPlan(part.lot.spec, free.height, centre);
      const requestNumber = await nextGrindRequestNumber(em);
      const now = new Date();
      const request = em.create(GrindRequest, {
        requestNumber,
        part,
        originalSet: sold.set,
        currentHeightMm: plan.currentHeightMm,
        targetHeightMm: plan.targetHeightMm,
        stockMm: plan.stockMm,
        windowLowMm: window.low,
        windowHighMm: window.high,
        passes: plan.passes ?? [],
        requestedById: actor.id,
        requestedByName: actor.displayName,
        createdAt: now,
      });
      em.create(GrindRequestStep, {
        request,
        status: 'open',
        recordedById: actor.id,
        recordedByName: actor.displayName,
        createdAt: now,
      });
      const rework = em.create(PartDisposition, {
        part,
        kind: 'rework',
        reason: `Grind request ${requestNumber}: grind to match set ${sold.set.setNumber}.`,
        inspectionId: result.inspection.id,
        currentHeightMm: plan.currentHeightMm,
        targetHeightMm: plan.targetHeightMm,
        stockMm: plan.stockMm,
        passes: plan.passes,
        decidedById: actor.id,
        decidedByName: actor.displayName,
        createdAt: now,
      });
      this.audit.record(actor, {
        action: 'part.rework',
        subjectType: 'part',
        subjectId: part.id,
        after: {
          kind: 'rework',
          inspectionId: rework.inspectionId,
          targetHeightMm: plan.targetHeightMm,
          stockMm: plan.stockMm,
        },
        reason: rework.reason ?? undefined,
      });
      this.audit.record(actor, {
        action: 'grind-request.create',
        subjectType: 'grind-request',
        subjectId: request.id,
        after: {
          requestNumber,
          serial: part.serial,
          originalSet: sold.set.setNumber,
          currentHeightMm: plan.currentHeightMm,
          targetHeightMm: plan.targetHeightMm,
          stockMm: plan.stockMm,
          windowLowMm: window.low,
          windowHighMm: window.high,
        },
      });
      await em.flush();
      return request.id;
    });
    return this.detail(id);
  }

  /** Records that the part was ground; re-inspection is read from the Bench, never recorded here. */
  async step(actor: SessionUser, id: string, input: GrindRequestStepInput): Promise<GrindRequestDetail> {
    await this.em.transactional(async (em) => {
      if (!(await lockRow(em, 'grind_request', id))) throw new NotFoundException('This grind request');
      const request = await em.findOneOrFail(GrindRequest, { id });
      const { status } = (await this.progress.of([request])).get(id)!;
      if (status !== 'open')
        throw new GrindRequestStepRefusedException(
          `Grind request ${request.requestNumber} is already ${status}; only an open request can be marked as ground.`,
        );
      em.create(GrindRequestStep, {
        request,
        status: input.status,
        note: input.note || null,
        recordedById: actor.id,
        recordedByName: actor.displayName,
        createdAt: new Date(),
      });
      this.audit.record(actor, {
        action: 'grind-request.ground',
        subjectType: 'grind-request',
        subjectId: request.id,
        after: { status: input.status, note: input.note || null },
      });
      await em.flush();
    });
    return this.detail(id);
  }

  async list(query: GrindRequestListQuery): Promise<Page<GrindRequestRow>> {
    const q = query.q?.trim();
    const where = {
      ...(query.originalSetId ? { originalSet: query.originalSetId } : {}),
      ...(q
        ? {
            $or: [
              { requestNumber: { $ilike: `%${escapeLike(q)}%` } },
              { part: { serial: { $ilike: `%${escapeLike(q)}%` } } },
            ],
          }
        : {}),
    };
    const [field, direction] = (query.sort ?? 'createdAt:desc').split(':') as [string, string];
    const column = SORTS[field] ?? 'createdAt';
    const order = direction === 'asc' ? 'asc' : 'desc';
    const orderBy = column.startsWith('part.') ? { part: { [column.slice(5)]: order } } : { [column]: order };
    const [requests, total] = await this.em.findAndCount(GrindRequest, where, {
      populate: ['part.lot', 'originalSet'],
      orderBy: [orderBy, { id: 'asc' }],
      limit: query.pageSize,
      offset: query.page * query.pageSize,
    });
    const progress = await this.progress.of(requests);
    return { items: requests.map((r) => row(r, progress.get(r.id)!)), total };
  }

  async detail(id: string): Promise<GrindRequestDetail> {
    const request = await this.em.findOne(GrindRequest, { id }, { populate: ['part.lot', 'originalSet'] });
    if (!request) throw new NotFoundException('This grind request');
    const progress = (await this.progress.of([request])).get(id)!;
    const members = await this.em.find(
      SetMember,
      { set: request.originalSet },
      { orderBy: { position: 'asc', id: 'asc' } },
    );
    const spec = request.part.lot.spec;
    const set = request.originalSet;
    return {
      ...row(request, progress),
      lotId: request.part.lot.id,
      lotNumber: request.part.lot.lotNumber,
      revision: spec.revision,
      originalSet: {
        id: set.id,
        setNumber: set.setNumber,
        customerName: set.order.customer.name,
        orderReference: set.order.reference,
        heights: members.map((m) => ({ serial: m.part.serial, height: m.heightMm })),
      },
      window: { low: request.windowLowMm, high: request.windowHighMm },
      grinding:
        spec.roughDepthMm != null &&
        spec.finishAllowanceMm != null &&
        spec.finishDepthMm != null &&
        spec.sparkOutPasses != null
          ? {
              roughDepth: spec.roughDepthMm,
              finishAllowance: spec.finishAllowanceMm,
              finishDepth: spec.finishDepthMm,
              sparkOutPasses: spec.sparkOutPasses,
            }
          : null,
      passes: request.passes,
      cautions: [...GRINDING_CAUTION_ITEMS],
      steps: progress.steps.map((s) => ({
        status: s.status,
        note: s.note,
        recordedBy: s.recordedByName,
        createdAt: s.createdAt.toISOString(),
      })),
      reInspection: progress.reInspection,
    };
  }
}

function row(r: GrindRequest, progress: Progress): GrindRequestRow {
  return {
    id: r.id,
    requestNumber: r.requestNumber,
    partId: r.part.id,
    serial: r.part.serial,
    partNumber: r.part.partNumber,
    originalSetNumber: r.originalSet.setNumber,
    currentHeight: r.currentHeightMm,
    targetHeight: r.targetHeightMm,
    stock: r.stockMm,
    status: progress.status,
    requestedBy: r.requestedByName,
    createdAt: r.createdAt.toISOString(),
  };
}

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}
