import type { AuditEntry, AuditListQuery } from '@evenset/contracts';
import Stack from '@mui/material/Stack';
import type { GridColDef } from '@mui/x-data-grid';
import { useMemo, useState } from 'react';
import { AppDataGrid } from '../../../components/app-data-grid';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { ApiError } from '../../../lib/api-client';
import { useAuditEntries, useAuditFacets } from '../api/audit';
import { AuditEntryDialog } from './audit-entry-dialog';
import { AuditFilters, type AuditFilterValues } from './audit-filters';
import { formatWhen } from './format';

const columns: GridColDef<AuditEntry>[] = [
  {
    field: 'createdAt',
    headerName: 'When',
    width: 200,
    valueFormatter: (value: string) => formatWhen(value),
  },
  { field: 'actorName', headerName: 'Who', flex: 0.8, minWidth: 160, sortable: false },
  { field: 'action', headerName: 'Action', flex: 0.8, minWidth: 170, sortable: false },
  { field: 'subjectType', headerName: 'Record type', width: 130, sortable: false },
  { field: 'subjectId', headerName: 'Record id', flex: 1, minWidth: 200, sortable: false },
  { field: 'reason', headerName: 'Reason', flex: 1.2, minWidth: 200, sortable: false },
];

/** The audit log, newest first, filtered on the server; a row opens its before and after. */
export function AuditLogGrid({
  filters,
  onFiltersChange,
}: {
  filters: AuditFilterValues;
  onFiltersChange: (filters: AuditFilterValues) => void;
}) {
  const list = useGridListQuery([{ field: 'createdAt', sort: 'desc' }]);
  const [open, setOpen] = useState<AuditEntry | null>(null);
  const facets = useAuditFacets();
  const query = useMemo(
    (): AuditListQuery => ({
      ...list.query,
      action: filters.action || undefined,
      actorId: filters.actorId || undefined,
      subjectType: filters.subjectType || undefined,
      subjectId: filters.subjectId || undefined,
      from: filters.from || undefined,
      to: filters.to || undefined,
    }),
    [list.query, filters],
  );
  const request = useAuditEntries(query);
  const errors = useMemo(
    () =>
      request.error instanceof ApiError
        ? Object.fromEntries(request.error.details.map((d) => [d.path, d.message]))
        : {},
    [request.error],
  );
  const changeFilters = (next: AuditFilterValues) => {
    onFiltersChange(next);
    list.grid.onPaginationModelChange({ ...list.grid.paginationModel, page: 0 });
  };
  return (
    <Stack spacing={2} sx={{ flexGrow: 1 }}>
      <AuditFilters facets={facets.data} value={filters} onChange={changeFilters} errors={errors} />
      <AppDataGrid
        label="Audit log"
        columns={columns}
        request={request}
        list={list}
        searchLabel="Search names, records, reasons and values"
        emptyState={{
          title: 'No entries',
          hint: 'Every change anyone makes in Evenset is written here. Clear the filters to see them all.',
        }}
        csvFileName="evenset-audit-log"
        onRowClick={setOpen}
      />
      {open ? <AuditEntryDialog entry={open} onClose={() => setOpen(null)} /> : null}
    </Stack>
  );
}
