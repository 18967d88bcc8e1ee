import { randomUUID } from 'node:crypto';
import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { SessionUser } from '@evenset/contracts';
import { AuditEntry } from './audit-entry.entity';

export interface AuditRecord {
  action: string;
  subjectType: string;
  subjectId: string;
  before?: Record<string, unknown>;
  after?: Record<string, unknown>;
  reason?: string;
}

/** Writes audit entries inside the caller's unit of work, so the entry and the change commit together. */
@Injectable()
export class AuditService {
  constructor(private readonly em: EntityManager) {}

  record(actor: Pick<SessionUser, 'id' | 'displayName'> | null, entry: AuditRecord): void {
    this.em.persist(
      this.em.create(AuditEntry, {
        ...entry,
        actorId: actor?.id,
        actorName: actor?.displayName ?? 'system',
        createdAt: new Date(),
      }),
    );
  }

  /**
   * Inserts many entries at once, outside the unit of work, for bulk writes (a CSV import of
   * thousands of inspections). Call it inside the transaction that makes the changes.
   */
  async recordMany(
    em: EntityManager,
    actor: Pick<SessionUser, 'id' | 'displayName'> | null,
    entries: AuditRecord[],
  ): Promise<void> {
    if (!entries.length) return;
    await em.insertMany(
      AuditEntry,
      entries.map((entry) => ({
        ...entry,
        id: randomUUID(),
        actorId: actor?.id,
        actorName: actor?.displayName ?? 'system',
        createdAt: new Date(),
      })),
    );
  }
}
