import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { ListQuery, Material as MaterialView, MaterialInput, Page, SessionUser } from '@evenset/contracts';
import { AuditService } from '../audit/audit.service';
import { NotFoundException } from '../common/errors/domain.exception';
import { listOptions, searchAny } from '../common/list-query';
import { MaterialNameTakenException } from './materials.exception';
import { Material } from './material.entity';

@Injectable()
export class MaterialsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async list(query: ListQuery): Promise<Page<MaterialView>> {
    const [items, total] = await this.em.findAndCount(
      Material,
      searchAny<Material>(query.q, ['name', 'source']),
      listOptions(query, ['name', 'expansionPerK', 'createdAt'], 'name'),
    );
    return { items: items.map((m) => m.toView()), total };
  }

  async create(actor: SessionUser, input: MaterialInput): Promise<MaterialView> {
    const material = this.em.create(Material, { ...input, createdAt: new Date(), updatedAt: new Date() });
    this.em.persist(material);
    this.audit.record(actor, {
      action: 'material.create',
      subjectType: 'material',
      subjectId: material.id,
      after: material.toView(),
    });
    await this.flush(input.name);
    return material.toView();
  }

  async update(actor: SessionUser, id: string, input: MaterialInput): Promise<MaterialView> {
    const material = await this.get(id);
    const before = material.toView();
    this.em.assign(material, input);
    this.audit.record(actor, {
      action: 'material.update',
      subjectType: 'material',
      subjectId: material.id,
      before,
      after: material.toView(),
    });
    await this.flush(input.name);
    return material.toView();
  }

  async get(id: string): Promise<Material> {
    const material = await this.em.findOne(Material, { id });
    if (!material) throw new NotFoundException('This material');
    return material;
  }

  private async flush(name: string): Promise<void> {
    try {
      await this.em.flush();
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException) throw new MaterialNameTakenException(name);
      throw error;
    }
  }
}
