import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import type { FilterQuery } from '@mikro-orm/core';
import { Injectable } from '@nestjs/common';
import type {
  CreateSpecInput,
  Page,
  SessionUser,
  SpecComparison,
  SpecDefinition,
  SpecListQuery,
  Spec as SpecView,
} from '@evenset/contracts';
import { AuditService } from '../audit/audit.service';
import { NotFoundException, ValidationFailedException } from '../common/errors/domain.exception';
import { listOptions, searchAny } from '../common/list-query';
import { Material } from '../materials/material.entity';
import { compareFields } from './spec-comparison';
import { latestRevision, nextRevision } from './spec-revision';
import { Spec } from './spec.entity';
import {
  SpecFrozenException,
  SpecNotDraftException,
  SpecPartNumberTakenException,
  SpecRevisionRefusedException,
} from './specs.exception';

@Injectable()
export class SpecsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async list(query: SpecListQuery): Promise<Page<SpecView>> {
    const where: FilterQuery<Spec> = {
      $and: [searchAny<Spec>(query.q, ['partNumber', 'title']), query.status ? { status: query.status } : {}],
    };
    const [specs, total] = await this.em.findAndCount(
      Spec,
      where,
      listOptions(query, ['partNumber', 'revision', 'title', 'status', 'createdAt', 'updatedAt'], 'partNumber', [
        'partNumber',
        'revision',
      ]),
    );
    return { items: specs.map((s) => s.toView()), total };
  }

  async view(id: string): Promise<SpecView> {
    return (await this.get(id)).toView();
  }

  async create(actor: SessionUser, input: CreateSpecInput): Promise<SpecView> {
    if (await this.em.count(Spec, { partNumber: input.partNumber }))
      throw new SpecPartNumberTakenException(input.partNumber);
    const material = await this.material(input.definition);
    const spec = Spec.revision({ partNumber: input.partNumber, revision: 'A' }, input.definition, material);
    this.em.persist(spec);
    this.audit.record(actor, {
      action: 'spec.create',
      subjectType: 'spec',
      subjectId: spec.id,
      after: summary(spec),
    });
    await this.flush(() => new SpecPartNumberTakenException(input.partNumber));
    return spec.toView();
  }

  async update(actor: SessionUser, id: string, definition: SpecDefinition): Promise<SpecView> {
    const spec = await this.get(id);
    if (spec.status !== 'draft') throw new SpecFrozenException(spec.partNumber, spec.revision);
    const before = summary(spec);
    spec.applyDefinition(definition, await this.material(definition));
    this.audit.record(actor, {
      action: 'spec.update',
      subjectType: 'spec',
      subjectId: spec.id,
      before,
      after: summary(spec),
    });
    await this.em.flush();
    return spec.toView();
  }

  /** Releases a draft; the revision released before it is superseded in the same transaction. */
  async release(actor: SessionUser, id: string): Promise<SpecView> {
    const spec = await this.get(id);
    if (spec.status !== 'draft') throw new SpecNotDraftException(spec.partNumber, spec.revision);
    await this.em.transactional(async (em) => {
      for (const older of await em.find(Spec, { partNumber: spec.partNumber, status: 'released' })) {
        older.status = 'superseded';
        this.audit.record(actor, {
          action: 'spec.supersede',
          subjectType: 'spec',
          subjectId: older.id,
          before: { status: 'released' },
          after: { status: 'superseded', by: spec.revision },
        });
      }
      // Superseding first keeps "one released revision per part number" true at every statement.
      await em.flush();
      spec.status = 'released';
      spec.releasedAt = new Date();
      spec.releasedById = actor.id;
      spec.freezeExpansion();
      this.audit.record(actor, {
        action: 'spec.release',
        subjectType: 'spec',
        subjectId: spec.id,
        before: { status: 'draft' },
        after: {
          status: 'released',
          revision: spec.revision,
          expansionPerK: spec.frozenExpansionPerK,
          expansionSource: spec.frozenExpansionSource,
        },
      });
    });
    return spec.toView();
  }

  /** A change to a released spec: a new draft revision copying the latest one. */
  async newRevision(actor: SessionUser, id: string): Promise<SpecView> {
    const source = await this.get(id);
    const latest = latestRevision(await this.em.find(Spec, { partNumber: source.partNumber }));
    if (latest && latest.id !== source.id)
      throw new SpecRevisionRefusedException(
        `Rev ${source.revision} is not the latest revision of ${source.partNumber}; start from rev ${latest.revision}.`,
      );
    if (source.status === 'draft')
      throw new SpecRevisionRefusedException(
        `${source.partNumber} rev ${source.revision} is still a draft; edit it instead.`,
      );
    const revision = nextRevision(source.revision);
    if (!revision) throw new SpecRevisionRefusedException(`${source.partNumber} has run out of revision letters.`);
    const spec = Spec.revision(
      { partNumber: source.partNumber, revision, previous: source },
      source.definition(),
      source.material,
    );
    this.em.persist(spec);
    this.audit.record(actor, {
      action: 'spec.revise',
      subjectType: 'spec',
      subjectId: spec.id,
      after: { ...summary(spec), from: source.revision },
    });
    await this.flush(
      () => new SpecRevisionRefusedException(`${source.partNumber} already has a draft revision; edit that one.`),
    );
    return spec.toView();
  }

  async compare(id: string, otherId: string): Promise<SpecComparison> {
    const [from, to] = [await this.get(id), await this.get(otherId)];
    const content = (spec: Spec) => {
      const { unit: _unit, materialId: _materialId, ...rest } = spec.definition();
      return { material: spec.material.name, ...rest };
    };
    return {
      from: { id: from.id, partNumber: from.partNumber, revision: from.revision },
      to: { id: to.id, partNumber: to.partNumber, revision: to.revision },
      changes: compareFields(content(from), content(to)),
    };
  }

  private async get(id: string): Promise<Spec> {
    const spec = await this.em.findOne(Spec, { id }, { populate: ['previous'] });
    if (!spec) throw new NotFoundException('This spec');
    return spec;
  }

  private async material(definition: SpecDefinition): Promise<Material> {
    const material = await this.em.findOne(Material, { id: definition.materialId });
    if (!material)
      throw new ValidationFailedException([{ path: 'definition.materialId', message: 'There is no such material.' }]);
    return material;
  }

  private async flush(onDuplicate: () => Error): Promise<void> {
    try {
      await this.em.flush();
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException) throw onDuplicate();
      throw error;
    }
  }
}

function summary(spec: Spec): Record<string, unknown> {
  return { partNumber: spec.partNumber, revision: spec.revision, status: spec.status, ...spec.definition() };
}
