import { AuditEntry } from '../audit/audit-entry.entity';
import { User } from '../users/user.entity';

/** Every entity, listed once so the app, the CLI and the tests see the same schema. */
export const ENTITIES = [User, AuditEntry];
