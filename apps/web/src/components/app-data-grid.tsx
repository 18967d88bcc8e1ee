import Paper from '@mui/material/Paper';
import type { SWRResponse } from 'swr';
import { DataGrid, type GridColDef, type GridLocaleText, type GridValidRowModel } from '@mui/x-data-grid';
import type { ListQuery } from '@evenset/contracts';
import { describeError } from '../lib/errors';
import { GridMessageOverlay } from './data-grid/grid-message-overlay';
import { GridToolbar } from './data-grid/grid-toolbar';
import { PAGE_SIZE_OPTIONS, type GridListState } from './data-grid/use-grid-list-query';
import { useStoredDensity } from './data-grid/use-stored-density';

// Header buttons must not repeat the column's name: a page (or a dialog over it) then has exactly
// one control called "E-mail", which voice control, screen-reader lists and browser tests rely on.
// The header cell itself still carries the name.
const LOCALE_TEXT: Partial<GridLocaleText> = {
  columnMenuAriaLabel: () => 'Column menu',
  columnHeaderSortIconAriaLabel: (_column, direction) =>
    direction === 'desc' ? 'Sort descending' : direction === 'asc' ? 'Sort ascending' : 'Sort',
  actionsCellMore: 'Actions',
};

interface AppDataGridProps<R extends GridValidRowModel> {
  /** Accessible name of the grid, e.g. "People". */
  label: string;
  columns: readonly GridColDef<R>[];
  /** The SWR request for the current page: its rows, total, loading state and error. */
  request: Pick<
    SWRResponse<{ items: R[]; total: number }, unknown>,
    'data' | 'error' | 'isLoading' | 'isValidating' | 'mutate'
  >;
  /** From useGridListQuery: the models the grid shows and the query they make. */
  list: { query: ListQuery; grid: GridListState };
  searchLabel: string;
  /** Said when there are no rows at all: what to do first. */
  emptyState: { title: string; hint: string };
  csvFileName: string;
  /** Opens a row's own page; rows then read as links (the key column should link too, for keyboards). */
  onRowClick?: ((row: R) => void) | undefined;
}

/** The one DataGrid of the app: paging, sorting and search happen on the server. */
export function AppDataGrid<R extends GridValidRowModel>({
  label,
  columns,
  request,
  list,
  searchLabel,
  emptyState,
  csvFileName,
  onRowClick,
}: AppDataGridProps<R>) {
  const [density, setDensity] = useStoredDensity();
  const { data: page, error } = request;
  const loading = request.isLoading || request.isValidating;
  const onRetry = () => void request.mutate();
  const overlay = error
    ? { title: 'The list could not be loaded', hint: describeError(error), onRetry }
    : list.query.q
      ? {
          title: 'Nothing matches your search',
          hint: `No entries contain “${list.query.q}”. Check the spelling or clear the search.`,
        }
      : emptyState;

  return (
    <Paper variant="outlined" sx={{ flexGrow: 1, minHeight: 420, display: 'flex', overflow: 'hidden' }}>
      <DataGrid<R>
        aria-label={label}
        columns={columns}
        rows={error ? [] : (page?.items ?? [])}
        rowCount={page?.total ?? 0}
        loading={loading}
        paginationMode="server"
        sortingMode="server"
        filterMode="server"
        {...list.grid}
        pageSizeOptions={PAGE_SIZE_OPTIONS}
        // The API filters by one search text only; per-column filters would promise more than it does.
        disableColumnFilter
        disableRowSelectionOnClick
        localeText={LOCALE_TEXT}
        density={density}
        onDensityChange={setDensity}
        showToolbar
        slots={{ toolbar: GridToolbar, noRowsOverlay: GridMessageOverlay }}
        slotProps={{
          toolbar: { searchLabel, csvFileName, density, onDensityChange: setDensity },
          noRowsOverlay: overlay,
          loadingOverlay: { variant: 'linear-progress', noRowsVariant: 'skeleton' },
        }}
        onRowClick={onRowClick ? ({ row }) => onRowClick(row) : undefined}
        sx={{ border: 'none', flexGrow: 1, ...(onRowClick ? { '& .MuiDataGrid-row': { cursor: 'pointer' } } : {}) }}
      />
    </Paper>
  );
}
