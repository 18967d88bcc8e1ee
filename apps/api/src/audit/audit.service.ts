import { randomUUID } from 'node:crypto';
import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { SessionUser } from '@evenset/contracts';
import { insertAll, type TableRows } from '../database/bulk-insert';
import { AuditEntry } from './audit-entry.entity';

export interface AuditRecord {
  action: string;
  subjectType: string;
  subjectId: string;
  before?: Record<string, unknown>;
  after?: Record<string, unknown>;
  reason?: string;
}

// audit_entry's columns with their SQL types (as in the migration), for `insertAll`.
const AUDIT_COLUMNS = {
  id: 'uuid',
  created_at: 'timestamptz',
  actor_id: 'uuid',
  actor_name: 'text',
  action: 'text',
  subject_type: 'text',
  subject_id: 'text',
  before: 'jsonb',
  after: 'jsonb',
  reason: 'text',
};

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
   * Inserts many entries at once, outside the unit of work. Call it inside the transaction that
   * makes the changes (or put `rows` in the statement that writes them).
   */
  async recordMany(
    em: EntityManager,
    actor: Pick<SessionUser, 'id' | 'displayName'> | null,
    entries: AuditRecord[],
  ): Promise<void> {
    await insertAll(em, [this.rows(actor, entries)]);
  }

  /**
   * Entries as rows for `insertAll` (database/bulk-insert.ts), written in the very statement that
   * writes the records they describe: both are stored, or neither.
   */
  rows(actor: Pick<SessionUser, 'id' | 'displayName'> | null, entries: AuditRecord[]): TableRows {
    const createdAt = new Date();
    return {
      table: 'audit_entry',
      columns: AUDIT_COLUMNS,
      rows: entries.map((entry) => ({
        id: randomUUID(),
        created_at: createdAt,
        actor_id: actor?.id ?? null,
        actor_name: actor?.displayName ?? 'system',
        action: entry.action,
        subject_type: entry.subjectType,
        subject_id: entry.subjectId,
        before: entry.before ?? null,
        after: entry.after ?? null,
        reason: entry.reason ?? null,
      })),
    };
  }
}
