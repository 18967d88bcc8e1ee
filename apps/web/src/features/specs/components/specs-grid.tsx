import type { Spec, SpecStatus } from '@evenset/contracts';
import type { GridColDef } from '@mui/x-data-grid';
import { useNavigate } from 'react-router-dom';
import { AppDataGrid } from '../../../components/app-data-grid';
import { figuresColumn } from '../../../components/data-grid/length-column';
import { linkColumn } from '../../../components/data-grid/link-column';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { useSpecs } from '../api/get-specs';
import { specBand, specLength } from '../spec-format';
import { SPEC_STATUS_LABELS, SpecStatusLabel } from './spec-status';

// Each spec has its own unit, so the length cells carry it.
const columns: GridColDef<Spec>[] = [
  linkColumn<Spec>({ field: 'partNumber', headerName: 'Part number', width: 140 }, (row) => paths.spec.getHref(row.id)),
  { field: 'revision', headerName: 'Rev.', width: 80 },
  {
    field: 'title',
    headerName: 'Title',
    flex: 1,
    minWidth: 220,
    valueGetter: (_value, row) => row.definition.title,
  },
  {
    field: 'status',
    headerName: 'Status',
    width: 140,
    valueGetter: (status: SpecStatus) => SPEC_STATUS_LABELS[status],
    renderCell: ({ row }) => <SpecStatusLabel status={row.status} />,
  },
  figuresColumn<Spec>({
    field: 'nominal',
    headerName: 'Nominal',
    width: 140,
    sortable: false,
    valueGetter: (_value, row) => specLength(row.definition, row.definition.nominal),
  }),
  figuresColumn<Spec>({
    field: 'band',
    headerName: 'Band',
    width: 210,
    sortable: false,
    valueGetter: (_value, row) => specBand(row.definition),
  }),
  figuresColumn<Spec>({
    field: 'setSize',
    headerName: 'Set size',
    width: 90,
    sortable: false,
    valueGetter: (_value, row) => row.definition.setSize,
  }),
  { field: 'updatedAt', headerName: 'Updated', width: 130, valueFormatter: (value: string) => formatDate(value) },
];

/** Every revision of every part number; a row opens the revision. */
export function SpecsGrid({ canEdit }: { canEdit: boolean }) {
  const navigate = useNavigate();
  const list = useGridListQuery([{ field: 'partNumber', sort: 'asc' }]);
  const request = useSpecs(list.query);
  return (
    <AppDataGrid
      label="Specs"
      columns={columns}
      request={request}
      list={list}
      searchLabel="Search part number or title"
      emptyState={{
        title: 'No specs yet',
        hint: canEdit ? 'Create the first part spec with “New spec” above.' : 'An engineer creates them.',
      }}
      csvFileName="evenset-specs"
      onRowClick={(row) => void navigate(paths.spec.getHref(row.id))}
    />
  );
}
