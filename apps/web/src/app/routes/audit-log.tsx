import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '../../components/page-header';
import { AuditLogGrid } from '../../features/audit/components/audit-log-grid';
import { NO_AUDIT_FILTERS, type AuditFilterValues } from '../../features/audit/components/audit-filters';

export function AuditLogRoute() {
  const [params] = useSearchParams();
  const [filters, setFilters] = useState<AuditFilterValues>({
    ...NO_AUDIT_FILTERS,
    subjectId: params.get('subjectId') ?? '',
  });
  return (
    <>
      <PageHeader
        title="Audit log"
        description="Who changed what, and when. Open an entry to see the record before and after the change."
      />
      <AuditLogGrid filters={filters} onFiltersChange={setFilters} />
    </>
  );
}
