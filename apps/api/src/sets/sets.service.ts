import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import type { FilterQuery } from '@mikro-orm/core';
import { Injectable } from '@nestjs/common';
import { fitsBand, setSpread } from '@evenset/metrology';
import type {
  AllocateSetsInput,
  Page,
  Proposal,
  ProposalRequest,
  SessionUser,
  SetDetail,
  SetListQuery,
  SetRow,
  Stock,
} from '@evenset/contracts';
import { AuditService } from '../audit/audit.service';
import { NotFoundException } from '../common/errors/domain.exception';
import { listOptions, searchAny } from '../common/list-query';
import { CustomerOrder } from '../customers/customer-order.entity';
import { Customer } from '../customers/customer.entity';
import { InspectionResult } from '../inspections/inspection-result.entity';
import { Part } from '../lots/part.entity';
import { Spec } from '../specs/spec.entity';
import { FreeStock, type FreeStockPart } from './free-stock';
import { InterchangeService } from './interchange.service';
import { insideWindow, inWindow } from './window';
import { MatchedSet } from './matched-set.entity';
import { chooseSets, narrow } from './proposal';
import { lockFreeStock, nextSetNumber } from './set-number';
import { SetMember } from './set-member.entity';
import { AllocationRefusedException, PartTakenException } from './sets.exception';

@Injectable()
export class SetsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly interchange: InterchangeService,
    private readonly stock: FreeStock,
  ) {}

  async list(query: SetListQuery): Promise<Page<SetRow>> {
    const where: FilterQuery<MatchedSet> = {
      $and: [
        searchAny<MatchedSet>(query.q, ['setNumber', 'partNumber', 'order.reference', 'order.customer.name']),
        query.partNumber ? { partNumber: query.partNumber } : {},
        query.customerId ? { order: { customer: query.customerId } } : {},
      ],
    };
    const [sets, total] = await this.em.findAndCount(
      MatchedSet,
      where,
      listOptions(query, ['setNumber', 'partNumber', 'createdAt'], 'setNumber'),
    );
    return { items: await this.rows(sets), total };
  }

  async detail(id: string): Promise<SetDetail> {
    const set = await this.em.findOne(MatchedSet, { id }, { populate: ['replacesSet'] });
    if (!set) throw new NotFoundException('The set');
    const [row] = await this.rows([set]);
    const members = await this.em.find(SetMember, { set }, { orderBy: { position: 'asc' }, populate: ['part.lot'] });
    const replacements = await this.em.find(MatchedSet, { replacesSet: set }, { orderBy: { setNumber: 'asc' } });
    const replacementRows = await this.rows(replacements);
    return {
      ...row!,
      displayUnit: (await this.interchange.specOf(set.partNumber)).displayUnit,
      members: members.map((m) => ({
        partId: m.part.id,
        serial: m.part.serial,
        lotId: m.part.lot.id,
        lotNumber: m.part.lot.lotNumber,
        revision: m.part.lot.spec.revision,
        position: m.position,
        height: m.heightMm,
      })),
      replacesSetId: set.replacesSet?.id ?? null,
      replacements: replacementRows.map((r) => ({ id: r.id, setNumber: r.setNumber, serials: r.serials })),
    };
  }

  /** Per part number with a released revision: free parts inside and outside the interchange window. */
  async stockByPartNumber(): Promise<Stock[]> {
    const specs = await this.em.find(
      Spec,
      { status: 'released' },
      { orderBy: { partNumber: 'asc', createdAt: 'desc' } },
    );
    const seen = new Set<string>();
    const answer: Stock[] = [];
    for (const spec of specs) {
      if (seen.has(spec.partNumber)) continue;
      seen.add(spec.partNumber);
      const [free, state] = await Promise.all([
        this.stock.of(spec.partNumber),
        this.interchange.state(spec.partNumber),
      ]);
      const available = free.filter((p) => insideWindow(state, p.height)).length;
      answer.push({
        partNumber: spec.partNumber,
        revision: spec.revision,
        title: spec.title,
        setSize: spec.setSize,
        matchingBand: spec.matchingBandMm,
        displayUnit: spec.displayUnit,
        available,
        outsideWindow: free.length - available,
        window: state.window,
        windowConflict: state.conflict,
      });
    }
    return answer;
  }

  async propose(request: ProposalRequest): Promise<Proposal> {
    const spec = await this.interchange.specOf(request.partNumber);
    const [free, state] = await Promise.all([
      this.stock.of(request.partNumber),
      this.interchange.state(request.partNumber),
    ]);
    const strip = ({ resultId: _, ...part }: FreeStockPart) => part;
    const all = chooseSets(free, state, spec.setSize, state.band, Number.MAX_SAFE_INTEGER);
    const chosen = chooseSets(free, state, spec.setSize, state.band, request.setCount);
    return {
      partNumber: spec.partNumber,
      setSize: spec.setSize,
      matchingBand: state.band,
      displayUnit: spec.displayUnit,
      requested: request.setCount,
      possible: all.sets.length,
      sets: chosen.sets.map((s) => ({ parts: s.parts.map(strip), spread: s.spread })),
      spare: chosen.spare.map(strip),
      window: state.window,
      explanation: explainProposal(
        request.setCount,
        all.sets.length,
        state.conflict,
        free.filter((p) => !insideWindow(state, p.height)).length,
      ),
    };
  }

  /**
   * Allocates whole sets to a customer's order, all or nothing. Changes to free stock are
   * serialised (`lockFreeStock`), so each allocation checks the window against every set committed
   * before it; the unique part constraint of set_member backs this up.
   */
  async allocate(actor: SessionUser, input: AllocateSetsInput): Promise<{ items: SetRow[] }> {
    const created = await this.em.transactional(async (em) => {
      await lockFreeStock(em);
      const firstNumber = await nextSetNumber(em);
      const customer = await em.findOne(Customer, { id: input.customerId });
      if (!customer)
        throw new AllocationRefusedException('The customer was not found.', [
          { path: 'customerId', message: 'Choose a customer.' },
        ]);
      const spec = await this.interchange.specOf(input.partNumber, em);
      const partIds = input.sets.flatMap((s) => s.partIds);
      if (new Set(partIds).size !== partIds.length)
        throw new AllocationRefusedException('A part appears in more than one set.');
      const free = new Map((await this.stock.of(input.partNumber, partIds)).map((p) => [p.id, p]));
      const missing = partIds.filter((id) => !free.has(id));
      if (missing.length) await this.refuseUnavailable(em, missing, input.partNumber);
      const state = await this.interchange.state(input.partNumber, em);
      if (state.conflict)
        throw new AllocationRefusedException(
          `The sets of ${input.partNumber} sold before already disagree; no part can match them all.`,
        );

      const order =
        (await em.findOne(CustomerOrder, { customer, reference: input.orderReference })) ??
        em.create(CustomerOrder, {
          customer,
          reference: input.orderReference,
          createdById: actor.id,
          createdAt: new Date(),
        });
      em.persist(order);
      let window = state.window;
      let serial = Number(firstNumber.slice(-4));
      const stem = firstNumber.slice(0, -4);
      const sets: MatchedSet[] = [];
      input.sets.forEach(({ partIds: ids }, index) => {
        const parts = ids
          .map((id) => free.get(id)!)
          .sort((a, b) => a.height - b.height || a.serial.localeCompare(b.serial));
        const heights = parts.map((p) => p.height);
        const path = `sets.${index}`;
        if (parts.length !== spec.setSize)
          throw new AllocationRefusedException(
            `Set ${index + 1} has ${parts.length} parts; ${spec.partNumber} sets have ${spec.setSize}.`,
            [{ path, message: `A set holds ${spec.setSize} parts.` }],
          );
        if (!fitsBand(heights[0]!, heights[heights.length - 1]!, state.band))
          throw new AllocationRefusedException(
            `Set ${index + 1} (${parts.map((p) => p.serial).join(', ')}) spreads wider than the matching band.`,
            [{ path, message: 'Spread wider than the matching band.' }],
          );
        const outside = parts.filter((p) => !inWindow(window, p.height));
        if (outside.length)
          throw new AllocationRefusedException(
            `${outside.map((p) => p.serial).join(', ')} would not match the sets sold before${index ? ' or the sets before it in this order' : ''}.`,
            [{ path, message: 'Outside the interchange window.' }],
          );
        window = narrow(window, heights[0]!, heights[heights.length - 1]!, state.band);
        const set = em.create(MatchedSet, {
          setNumber: `${stem}${String(serial++).padStart(4, '0')}`,
          order,
          partNumber: spec.partNumber,
          kind: 'set',
          matchingBandMm: state.band,
          allocatedById: actor.id,
          allocatedByName: actor.displayName,
          createdAt: new Date(),
        });
        em.persist(set);
        parts.forEach((p, i) =>
          em.persist(
            em.create(SetMember, {
              set,
              part: em.getReference(Part, p.id),
              position: i + 1,
              result: em.getReference(InspectionResult, p.resultId),
              heightMm: p.height,
              createdAt: new Date(),
            }),
          ),
        );
        this.audit.record(actor, {
          action: 'set.allocate',
          subjectType: 'matched_set',
          subjectId: set.id,
          after: {
            setNumber: set.setNumber,
            customer: customer.name,
            orderReference: input.orderReference,
            serials: parts.map((p) => p.serial),
            heightsMm: heights,
            spreadMm: setSpread(heights),
          },
        });
        sets.push(set);
      });
      try {
        await em.flush();
      } catch (error) {
        if (error instanceof UniqueConstraintViolationException && /set_member_part_id/.test(error.message))
          throw new PartTakenException(await this.takenSerials(partIds));
        throw error;
      }
      return sets;
    });
    return { items: await this.rows(created) };
  }

  /** Explains why some chosen parts cannot be allocated: not found, taken, or not released. */
  private async refuseUnavailable(em: EntityManager, ids: string[], partNumber: string): Promise<never> {
    const parts = await em.find(Part, { id: { $in: ids } });
    const unknown = ids.length - parts.length;
    const wrong = parts.filter((p) => p.partNumber !== partNumber);
    if (unknown)
      throw new AllocationRefusedException(`${unknown} of the chosen parts ${unknown > 1 ? 'were' : 'was'} not found.`);
    if (wrong.length)
      throw new AllocationRefusedException(
        `${wrong.map((p) => p.serial).join(', ')} ${wrong.length > 1 ? 'are' : 'is'} not ${partNumber}.`,
      );
    const taken = await em.find(SetMember, { part: { $in: parts } }, { populate: ['set'] });
    if (taken.length) throw new PartTakenException(taken.map((m) => `${m.part.serial} (set ${m.set.setNumber})`));
    const notReleased = parts.map((p) => p.serial).join(', ');
    throw new AllocationRefusedException(
      `${notReleased} ${parts.length > 1 ? 'are' : 'is'} not released stock with a current result.`,
    );
  }

  private async takenSerials(ids: string[]): Promise<string[]> {
    const taken = await this.em.fork().find(SetMember, { part: { $in: ids } }, { populate: ['part', 'set'] });
    return taken.map((m) => `${m.part.serial} (set ${m.set.setNumber})`);
  }

  private async rows(sets: MatchedSet[]): Promise<SetRow[]> {
    if (!sets.length) return [];
    const members = await this.em.find(SetMember, { set: { $in: sets } }, { orderBy: { position: 'asc' } });
    await this.em.populate(sets, ['replacesSet']);
    return sets.map((set) => {
      const own = members.filter((m) => m.set.id === set.id);
      const heights = own.map((m) => m.heightMm);
      return {
        id: set.id,
        setNumber: set.setNumber,
        kind: set.kind,
        partNumber: set.partNumber,
        customerId: set.order.customer.id,
        customerName: set.order.customer.name,
        orderId: set.order.id,
        orderReference: set.order.reference,
        serials: own.map((m) => m.part.serial),
        spread: heights.length ? setSpread(heights) : 0,
        matchingBand: set.matchingBandMm,
        replacesSetNumber: set.replacesSet?.setNumber ?? null,
        allocatedByName: set.allocatedByName,
        createdAt: set.createdAt.toISOString(),
      };
    });
  }
}

function explainProposal(requested: number, possible: number, conflict: boolean, outside: number): string {
  if (conflict)
    return 'The sets sold before already disagree, so no new set can match them all. Engineering needs to look at this part number.';
  const outsideNote =
    outside > 0
      ? ` ${outside} free part${outside > 1 ? 's' : ''} outside the interchange window ${outside > 1 ? 'are' : 'is'} left out.`
      : '';
  if (possible === 0) return `The free stock cannot make a set that fits the matching band.${outsideNote}`;
  if (possible < requested)
    return `Only ${possible} set${possible > 1 ? 's' : ''} can be made from the free stock, not ${requested}.${outsideNote}`;
  return `${requested} set${requested > 1 ? 's' : ''} proposed; the free stock could make ${possible}.${outsideNote}`;
}
