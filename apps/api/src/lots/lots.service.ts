import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import type { FilterQuery } from '@mikro-orm/core';
import { Injectable } from '@nestjs/common';
import {
  PART_STATUSES,
  type CreateLotInput,
  type CreatePartsInput,
  type Lot as LotView,
  type LotDetail,
  type LotListQuery,
  type Page,
  type PartListQuery,
  type PartRow,
  type PartStatus,
  type SerialPattern,
  type SerialPreview,
  type SessionUser,
} from '@evenset/contracts';
import { AuditService } from '../audit/audit.service';
import { NotFoundException, ValidationFailedException } from '../common/errors/domain.exception';
import { listOptions, searchAny } from '../common/list-query';
import { Spec } from '../specs/spec.entity';
import { Lot } from './lot.entity';
import { LotFullException, LotNumberTakenException, SerialsTakenException } from './lots.exception';
import { Part } from './part.entity';
import { computedOf, lotPartFacts } from './lot-part-facts';
import { partRow, PartStatusService, rowFactsOf } from './part-status';
import { InterchangeService } from '../sets/interchange.service';

/** Compares like `localeCompare`, without building a collator per call (a lot holds up to 10,000 parts). */
const { compare } = new Intl.Collator();

/** Columns a lot's part list sorts on; nulls (not inspected) go last either way. */
const PART_SORTS = ['serial', 'status', 'height', 'flatness', 'parallelism', 'runout', 'expandedUncertainty'] as const;

@Injectable()
export class LotsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly states: PartStatusService,
    private readonly interchange: InterchangeService,
  ) {}

  async list(query: LotListQuery): Promise<Page<LotView>> {
    const where: FilterQuery<Lot> = {
      $and: [searchAny<Lot>(query.q, ['lotNumber', 'notes']), query.specId ? { spec: query.specId } : {}],
    };
    const [lots, total] = await this.em.findAndCount(
      Lot,
      where,
      listOptions(query, ['lotNumber', 'grindDate', 'quantity', 'createdAt'], 'lotNumber'),
    );
    return { items: await Promise.all(lots.map((lot) => this.view(lot))), total };
  }

  async create(actor: SessionUser, input: CreateLotInput): Promise<LotView> {
    const spec = await this.em.findOne(Spec, { id: input.specId });
    if (!spec || spec.status !== 'released')
      throw new ValidationFailedException([
        {
          path: 'specId',
          message: 'Choose a released spec revision; drafts and superseded revisions take no new lots.',
        },
      ]);
    const lot = this.em.create(Lot, {
      lotNumber: input.lotNumber,
      spec,
      quantity: input.quantity,
      grindDate: input.grindDate,
      notes: input.notes || null,
      createdById: actor.id,
      createdAt: new Date(),
    });
    this.em.persist(lot);
    this.audit.record(actor, {
      action: 'lot.create',
      subjectType: 'lot',
      subjectId: lot.id,
      after: { ...input, partNumber: spec.partNumber, revision: spec.revision },
    });
    try {
      await this.em.flush();
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException) throw new LotNumberTakenException(input.lotNumber);
      throw error;
    }
    return this.view(lot);
  }

  async detail(id: string): Promise<LotDetail> {
    const lot = await this.get(id);
    const facts = await lotPartFacts(this.em, lot.id);
    const counts = Object.fromEntries(PART_STATUSES.map((s) => [s, 0])) as Record<PartStatus, number>;
    for (const f of facts) counts[f.status] += 1;
    const heights = facts.flatMap((f) => (f.height === null ? [] : [f.height]));
    const window = await this.interchange.summary(lot.spec.partNumber);
    const spec = lot.spec;
    return {
      ...(await this.view(lot)),
      spec: {
        ...summary(spec),
        nominal: spec.nominalMm,
        band: { lower: spec.bandLowerMm, upper: spec.bandUpperMm },
        matchingBand: spec.matchingBandMm,
        flatness: spec.flatnessMm,
        parallelism: spec.parallelismMm,
        runout: spec.runoutMm,
        decisionRule: spec.decisionRule,
      },
      counts,
      interchange: {
        ...window.summary,
        outsideSerials: facts
          .filter((f) => window.outside(f.height))
          .map((f) => f.serial)
          .sort(),
      },
      heightSpread: heights.length
        ? {
            lowest: Math.min(...heights),
            highest: Math.max(...heights),
            spread: Math.max(...heights) - Math.min(...heights),
            parts: heights.length,
          }
        : null,
    };
  }

  /**
   * A lot's parts with their current results, filtered, sorted and paged here: status is derived
   * from the newest records (`lotPartFacts`, one SQL pass over the lot), and only the rows of the
   * page read their full computed answer.
   */
  async parts(id: string, query: PartListQuery): Promise<Page<PartRow>> {
    const lot = await this.get(id);
    const q = query.q?.trim().toUpperCase();
    const { outside } = await this.interchange.summary(lot.spec.partNumber);
    const facts = (await lotPartFacts(this.em, lot.id)).filter(
      (f) => (!q || f.serial.includes(q)) && (!query.status || f.status === query.status),
    );
    const [field, direction] = (query.sort ?? 'serial:asc').split(':') as [string, string];
    const key = (PART_SORTS as readonly string[]).includes(field) ? (field as (typeof PART_SORTS)[number]) : 'serial';
    const sign = direction === 'desc' ? -1 : 1;
    facts.sort((a, b) => {
      const [x, y] = [a[key], b[key]];
      if (x === y) return compare(a.serial, b.serial);
      if (x === null) return 1;
      if (y === null) return -1;
      return sign * (typeof x === 'number' && typeof y === 'number' ? x - y : compare(String(x), String(y)));
    });
    const start = query.page * query.pageSize;
    const page = facts.slice(start, start + query.pageSize);
    const computed = await computedOf(
      this.em,
      page.flatMap((f) => (f.resultId ? [f.resultId] : [])),
    );
    return {
      items: page.map((f) =>
        partRow({ ...f, computed: (f.resultId && computed.get(f.resultId)) || null, runoutMm: f.runout }, outside),
      ),
      total: facts.length,
    };
  }

  async previewSerials(id: string, pattern: SerialPattern): Promise<SerialPreview> {
    const lot = await this.get(id);
    const serials = serialsOf(pattern);
    return { serials, taken: await this.taken(lot, serials) };
  }

  /** Adds parts to a lot, all or none: a serial already used for the part number refuses the lot. */
  async createParts(actor: SessionUser, id: string, input: CreatePartsInput): Promise<{ items: PartRow[] }> {
    const lot = await this.get(id);
    const serials = input.pattern ? serialsOf(input.pattern) : (input.serials ?? []);
    const taken = await this.taken(lot, serials);
    if (taken.length) throw new SerialsTakenException(lot.spec.partNumber, taken);
    const existing = await this.em.count(Part, { lot });
    if (existing + serials.length > lot.quantity) throw new LotFullException(lot.lotNumber, lot.quantity, existing);
    const parts = serials.map((serial) =>
      this.em.create(Part, { lot, partNumber: lot.spec.partNumber, serial, createdAt: new Date() }),
    );
    this.em.persist(parts);
    this.audit.record(actor, {
      action: 'lot.add-parts',
      subjectType: 'lot',
      subjectId: lot.id,
      after: { serials, pattern: input.pattern },
    });
    try {
      await this.em.flush();
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException)
        throw new SerialsTakenException(lot.spec.partNumber, serials);
      throw error;
    }
    // New parts have no results yet, so none can be outside the window.
    return { items: (await this.states.states(parts)).map((state) => partRow(rowFactsOf(state), () => null)) };
  }

  private async taken(lot: Lot, serials: string[]): Promise<string[]> {
    const parts = await this.em.find(Part, { partNumber: lot.spec.partNumber, serial: { $in: serials } });
    return parts.map((p) => p.serial).sort();
  }

  private async get(id: string): Promise<Lot> {
    const lot = await this.em.findOne(Lot, { id });
    if (!lot) throw new NotFoundException('This lot');
    return lot;
  }

  private async view(lot: Lot): Promise<LotView> {
    return {
      id: lot.id,
      lotNumber: lot.lotNumber,
      spec: summary(lot.spec),
      quantity: lot.quantity,
      grindDate: lot.grindDate,
      notes: lot.notes,
      partCount: await this.em.count(Part, { lot }),
      createdAt: lot.createdAt.toISOString(),
    };
  }
}

function summary(spec: Spec) {
  return {
    id: spec.id,
    partNumber: spec.partNumber,
    revision: spec.revision,
    title: spec.title,
    displayUnit: spec.displayUnit,
  };
}

/** prefix + start…start+count−1, zero-padded to `digits`. */
export function serialsOf(pattern: SerialPattern): string[] {
  return Array.from(
    { length: pattern.count },
    (_, i) => `${pattern.prefix}${String(pattern.start + i).padStart(pattern.digits, '0')}`,
  );
}
