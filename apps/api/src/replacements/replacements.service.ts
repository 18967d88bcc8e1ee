import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type {
  AllocateReplacementInput,
  AllocatedReplacement,
  LookupChoice,
  ReplacementCandidate,
  ReplacementCheck,
  ReplacementLookup,
  SessionUser,
} from '@evenset/contracts';
import { formatLength, stockToRemove } from '@evenset/metrology';
import { AuditService } from '../audit/audit.service';
import { Certificate } from '../certificates/certificate.entity';
import { NotFoundException } from '../common/errors/domain.exception';
import { InspectionResult } from '../inspections/inspection-result.entity';
import { CustomerOrder } from '../customers/customer-order.entity';
import { Part } from '../lots/part.entity';
import { MatchedSet } from '../sets/matched-set.entity';
import { SetMember } from '../sets/set-member.entity';
import { lockFreeStock, nextSetNumber } from '../sets/set-number';
import { GrindRequestProgress } from './grind-request-progress';
import { GrindRequest } from './grind-request.entity';
import { inWindow } from '../sets/window';
import { lockRow } from './row-lock';
import {
  NotSoldException,
  NothingFoundException,
  PartTakenException,
  ReplacementRefusedException,
} from './replacements.exception';
import { distance, type FreePart, type SoldSet, SoldSets } from './sold-set';

/** The replacement check: find the set a customer holds, what would match it, and send a part. */
@Injectable()
export class ReplacementsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly sold: SoldSets,
    private readonly progress: GrindRequestProgress,
  ) {}

  /** By certificate number, set number or serial; a replacement leads to the set it replaced. */
  async lookup(text: string): Promise<ReplacementLookup> {
    const q = text.trim().toUpperCase();
    const certificate = await this.em.findOne(Certificate, { certificateNumber: q }, { populate: ['set'] });
    if (certificate) return this.check(certificate.set, `Certificate ${q} is for set ${certificate.set.setNumber}`);
    const set = await this.em.findOne(MatchedSet, { setNumber: q });
    if (set) return this.check(set, `Set ${q}`);

    const members = await this.em.find(
      SetMember,
      { part: { serial: q } },
      { populate: ['set', 'set.replacesSet'], orderBy: { part: { partNumber: 'asc' } } },
    );
    if (!members.length) {
      const unsold = await this.em.find(Part, { serial: q });
      if (unsold.length)
        throw new NotSoldException(
          q,
          unsold.map((p) => p.partNumber),
        );
      throw new NothingFoundException(q);
    }
    if (members.length > 1) {
      const choices: LookupChoice[] = members.map((m) => {
        const original = m.set.replacesSet ?? m.set;
        return {
          setId: original.id,
          setNumber: original.setNumber,
          partNumber: m.part.partNumber,
          serial: m.part.serial,
          customerName: original.order.customer.name,
        };
      });
      return {
        match: 'choices',
        message: `Serial ${q} was sold under ${members.length} part numbers. Choose the set the customer holds.`,
        choices,
      };
    }
    const member = members[0]!;
    return this.check(
      member.set,
      `Serial ${q} (${member.part.partNumber}) is in ${member.set.kind === 'replacement' ? 'replacement' : 'set'} ${member.set.setNumber}`,
    );
  }

  /** Allocates a fitting part as a replacement for a sold set, in one transaction. */
  async allocate(actor: SessionUser, input: AllocateReplacementInput): Promise<AllocatedReplacement> {
    return this.em.transactional(async (em) => {
      await lockFreeStock(em);
      const sold = await this.originalSet(input.originalSetId);
      const { set, window } = sold;
      const { part, free } = await this.usablePart(em, sold, input.partId);
      if (!window.window || !inWindow(window.window, free.height))
        throw new ReplacementRefusedException(
          window.window
            ? `Part ${part.serial} measures ${this.show(sold, free.height)}, outside the window ${this.show(sold, window.window.low)} to ${this.show(sold, window.window.high)}. Choose a part from the list of fitting parts.`
            : window.explanation,
        );
      const customer = set.order.customer;
      const order =
        (await em.findOne(CustomerOrder, { customer, reference: input.orderReference })) ??
        em.create(CustomerOrder, {
          customer,
          reference: input.orderReference,
          createdById: actor.id,
          createdAt: new Date(),
        });
      const replacement = em.create(MatchedSet, {
        setNumber: await nextSetNumber(em),
        order,
        partNumber: set.partNumber,
        kind: 'replacement',
        replacesSet: set,
        matchingBandMm: set.matchingBandMm,
        allocatedById: actor.id,
        allocatedByName: actor.displayName,
        createdAt: new Date(),
      });
      em.create(SetMember, {
        set: replacement,
        part,
        position: 1,
        result: em.getReference(InspectionResult, free.resultId),
        heightMm: free.height,
        createdAt: new Date(),
      });
      this.audit.record(actor, {
        action: 'set.replacement',
        subjectType: 'set',
        subjectId: replacement.id,
        after: {
          setNumber: replacement.setNumber,
          replacesSet: set.setNumber,
          customer: customer.name,
          orderReference: order.reference,
          serial: part.serial,
          heightMm: free.height,
          windowLowMm: window.window.low,
          windowHighMm: window.window.high,
        },
      });
      try {
        await em.flush();
      } catch (error) {
        if (error instanceof UniqueConstraintViolationException && isPartTaken(error))
          throw new PartTakenException(part.serial);
        throw error;
      }
      return {
        id: replacement.id,
        setNumber: replacement.setNumber,
        originalSetId: set.id,
        originalSetNumber: set.setNumber,
        customerName: customer.name,
        orderReference: order.reference,
        serial: part.serial,
        height: free.height,
      };
    });
  }

  /** The sold set a replacement or grind request is for: a set, not itself a replacement. */
  async originalSet(id: string): Promise<SoldSet> {
    const sold = await this.sold.get(id);
    if (sold.set.kind === 'replacement')
      throw new ReplacementRefusedException(
        `${sold.set.setNumber} is itself a replacement; check against the set it replaced${sold.set.replacesSet ? ` (${sold.set.replacesSet.setNumber})` : ''}.`,
        'originalSetId',
      );
    return sold;
  }

  /**
   * The part, locked for this transaction, when it is released, in no set and of the set's part
   * number; otherwise a refusal that says which of those it is not.
   */
  async usablePart(em: EntityManager, sold: SoldSet, partId: string): Promise<{ part: Part; free: FreePart }> {
    if (!(await lockRow(em, 'part', partId))) throw new NotFoundException('This part');
    const part = await em.findOneOrFail(Part, { id: partId });
    if (part.partNumber !== sold.set.partNumber)
      throw new ReplacementRefusedException(
        `Part ${part.serial} is a ${part.partNumber}; set ${sold.set.setNumber} is ${sold.set.partNumber}.`,
      );
    const [free] = await this.sold.freeParts(part.partNumber, part.id);
    if (free) return { part, free };
    const member = await em.findOne(SetMember, { part }, { populate: ['set'] });
    if (member) throw new PartTakenException(part.serial);
    throw new ReplacementRefusedException(
      `Part ${part.serial} is not released stock, so it cannot be sent. Choose a released part.`,
    );
  }

  private async check(found: MatchedSet, foundBy: string): Promise<ReplacementCheck> {
    const original = found.replacesSet ? await this.em.findOneOrFail(MatchedSet, found.replacesSet.id) : found;
    const sold = await this.sold.of(original);
    const { set, members, spec, tolerance, window } = sold;
    const free = await this.sold.freeParts(set.partNumber);
    const candidate = (p: FreePart, grind: boolean): ReplacementCandidate => ({
      id: p.id,
      serial: p.serial,
      lotNumber: p.lotNumber,
      revision: p.revision,
      height: p.height,
      distance: distance(p.height, window.centre!),
      stockToCentre: grind ? stockToRemove(p.height, window.centre!) : null,
    });
    const replacements = await this.em.find(MatchedSet, { replacesSet: set }, { orderBy: { createdAt: 'asc' } });
    const replacementMembers = await this.em.find(SetMember, { set: { $in: replacements } });
    const requests = await this.em.find(GrindRequest, { originalSet: set }, { orderBy: { createdAt: 'asc' } });
    const progress = await this.progress.of(requests);
    return {
      match: 'set',
      foundBy: found === original ? `${foundBy}.` : `${foundBy}, a replacement for set ${set.setNumber}.`,
      set: {
        id: set.id,
        setNumber: set.setNumber,
        kind: set.kind,
        customerId: set.order.customer.id,
        customerName: set.order.customer.name,
        orderReference: set.order.reference,
        partNumber: set.partNumber,
        revision: spec.revision,
        displayUnit: spec.displayUnit,
        matchingBand: set.matchingBandMm,
        members: members.map((m) => ({ partId: m.part.id, serial: m.part.serial, height: m.heightMm })),
        createdAt: set.createdAt.toISOString(),
      },
      tolerance,
      setWindow: window.setWindow,
      window: window.window,
      centre: window.centre,
      explanation: window.explanation,
      fits: SoldSets.fits(free, sold).map((p) => candidate(p, false)),
      grindable: SoldSets.grindable(free, sold).map((p) => candidate(p, true)),
      replacements: replacements.map((r) => ({
        id: r.id,
        setNumber: r.setNumber,
        serial: replacementMembers.find((m) => m.set.id === r.id)?.part.serial ?? '',
        createdAt: r.createdAt.toISOString(),
      })),
      grindRequests: requests.map((r) => ({
        id: r.id,
        requestNumber: r.requestNumber,
        serial: r.part.serial,
        status: progress.get(r.id)!.status,
        createdAt: r.createdAt.toISOString(),
      })),
    };
  }

  private show(sold: SoldSet, mm: number): string {
    return formatLength(mm, sold.spec.displayUnit, { level: 'fine' });
  }
}

/** The unique constraint that keeps a part in one set at most. */
function isPartTaken(error: UniqueConstraintViolationException): boolean {
  const constraint = (error as { constraint?: unknown }).constraint;
  return constraint === 'set_member_part_id_unique' || error.message.includes('set_member_part_id_unique');
}
