import {
  auditEntrySchema,
  auditFacetsSchema,
  pageOf,
  type AuditEntry,
  type AuditFacets,
  type AuditListQuery,
  type Page,
} from '@evenset/contracts';
import { apiKey, useApi } from '../../../lib/swr';

const AUDIT_PATH = '/audit';
const auditPageSchema = pageOf(auditEntrySchema);

export function useAuditEntries(query: AuditListQuery) {
  return useApi<Page<AuditEntry>>(apiKey(AUDIT_PATH, auditPageSchema, query), { keepPreviousData: true });
}

export function useAuditFacets() {
  return useApi<AuditFacets>(apiKey(`${AUDIT_PATH}/facets`, auditFacetsSchema));
}
