import type { Lot } from '@evenset/contracts';
import type { GridColDef } from '@mui/x-data-grid';
import { useNavigate } from 'react-router-dom';
import { AppDataGrid } from '../../../components/app-data-grid';
import { figuresColumn } from '../../../components/data-grid/length-column';
import { linkColumn } from '../../../components/data-grid/link-column';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { useLots } from '../api/get-lots';

const columns: GridColDef<Lot>[] = [
  linkColumn<Lot>({ field: 'lotNumber', headerName: 'Lot', width: 160 }, (row) => paths.lot.getHref(row.id)),
  {
    field: 'partNumber',
    headerName: 'Part number',
    width: 150,
    sortable: false,
    valueGetter: (_value, row) => `${row.spec.partNumber} rev ${row.spec.revision}`,
  },
  {
    field: 'title',
    headerName: 'Part',
    flex: 1,
    minWidth: 200,
    sortable: false,
    valueGetter: (_v, row) => row.spec.title,
  },
  figuresColumn<Lot>({ field: 'quantity', headerName: 'Quantity', width: 110 }),
  figuresColumn<Lot>({ field: 'partCount', headerName: 'Parts registered', width: 150, sortable: false }),
  { field: 'grindDate', headerName: 'Ground', width: 140, valueGetter: (value: string) => formatDate(value) },
];

/** Lots, newest first; a row opens the lot's review. */
export function LotsGrid({ canCreate }: { canCreate: boolean }) {
  const navigate = useNavigate();
  const list = useGridListQuery([{ field: 'grindDate', sort: 'desc' }]);
  const request = useLots(list.query);
  return (
    <AppDataGrid
      label="Lots"
      columns={columns}
      request={request}
      list={list}
      searchLabel="Search lots"
      emptyState={{
        title: 'No lots yet',
        hint: canCreate ? 'Create one with “New lot” above.' : 'An engineer creates lots from a released spec.',
      }}
      csvFileName="evenset-lots"
      onRowClick={(row) => void navigate(paths.lot.getHref(row.id))}
    />
  );
}
