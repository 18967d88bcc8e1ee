import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { AuditEntry as AuditEntryView, AuditFacets, AuditListQuery, Page } from '@evenset/contracts';
import { addDays } from '../common/gauges/gauge-status';
import { AuditEntry } from './audit-entry.entity';

const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

export function auditView(entry: AuditEntry): AuditEntryView {
  return {
    id: entry.id,
    createdAt: entry.createdAt.toISOString(),
    actorId: entry.actorId ?? null,
    actorName: entry.actorName,
    action: entry.action,
    subjectType: entry.subjectType,
    subjectId: entry.subjectId,
    reason: entry.reason ?? null,
    before: entry.before ?? null,
    after: entry.after ?? null,
  };
}

/** Reads the audit log (written only by the changes themselves, through AuditService). */
@Injectable()
export class AuditLogService {
  constructor(private readonly em: EntityManager) {}

  async list(query: AuditListQuery): Promise<Page<AuditEntryView>> {
    const qb = this.em.createQueryBuilder(AuditEntry, 'a');
    if (query.action) qb.andWhere({ action: query.action });
    if (query.actorId) qb.andWhere({ actorId: query.actorId });
    if (query.subjectType) qb.andWhere({ subjectType: query.subjectType });
    if (query.subjectId) qb.andWhere({ subjectId: query.subjectId });
    // Calendar days in UTC, both ends included.
    if (query.from) qb.andWhere({ createdAt: { $gte: new Date(`${query.from}T00:00:00Z`) } });
    if (query.to) qb.andWhere({ createdAt: { $lt: new Date(`${addDays(query.to, 1)}T00:00:00Z`) } });
    if (query.q) {
      // The text may be anywhere: who, what, the subject, the reason, or a value before or after.
      const pattern = `%${escapeLike(query.q)}%`;
      qb.andWhere(
        `(a.actor_name ilike ? or a.action ilike ? or a.subject_type ilike ? or a.subject_id ilike ? or a.reason ilike ? or a.before::text ilike ? or a.after::text ilike ?)`,
        Array<string>(7).fill(pattern),
      );
    }
    const ascending = query.sort === 'createdAt:asc';
    qb.orderBy([{ createdAt: ascending ? 'asc' : 'desc' }, { id: ascending ? 'asc' : 'desc' }])
      .limit(query.pageSize)
      .offset(query.page * query.pageSize);
    const [entries, total] = await qb.getResultAndCount();
    return { items: entries.map(auditView), total };
  }

  async facets(): Promise<AuditFacets> {
    const connection = this.em.getConnection();
    const [actions, subjectTypes, actors] = await Promise.all([
      connection.execute<{ action: string }[]>('select distinct action from audit_entry order by action'),
      connection.execute<{ subject_type: string }[]>(
        'select distinct subject_type from audit_entry order by subject_type',
      ),
      // The name at the time of the newest entry, one row per person.
      connection.execute<{ id: string; name: string }[]>(
        `select distinct on (actor_id) actor_id as id, actor_name as name from audit_entry
         where actor_id is not null order by actor_id, created_at desc`,
      ),
    ]);
    return {
      actions: actions.map((r) => r.action),
      subjectTypes: subjectTypes.map((r) => r.subject_type),
      actors: actors.sort((a, b) => a.name.localeCompare(b.name)).map((r) => ({ id: r.id, name: r.name })),
    };
  }
}
