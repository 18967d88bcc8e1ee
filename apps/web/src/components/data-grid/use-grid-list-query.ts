import type { ListQuery } from '@evenset/contracts';
import type { GridFilterModel, GridPaginationModel, GridSortModel } from '@mui/x-data-grid';
import { useMemo, useState } from 'react';

export const PAGE_SIZE_OPTIONS = [10, 25, 50, 100];

export interface GridListState {
  paginationModel: GridPaginationModel;
  sortModel: GridSortModel;
  filterModel: GridFilterModel;
  onPaginationModelChange: (model: GridPaginationModel) => void;
  onSortModelChange: (model: GridSortModel) => void;
  onFilterModelChange: (model: GridFilterModel) => void;
}

/**
 * Keeps a server-side grid's page, sort and quick search, and turns them into the list query
 * `{ page, pageSize, sort: 'field:dir', q }` that the API and the SWR key use.
 */
export function useGridListQuery(initialSort: GridSortModel = []): { query: ListQuery; grid: GridListState } {
  const [paginationModel, setPaginationModel] = useState<GridPaginationModel>({ page: 0, pageSize: 25 });
  const [sortModel, setSortModel] = useState<GridSortModel>(initialSort);
  const [filterModel, setFilterModel] = useState<GridFilterModel>({ items: [], quickFilterValues: [] });

  const query = useMemo((): ListQuery => {
    const [sort] = sortModel;
    const q = (filterModel.quickFilterValues ?? []).join(' ').trim();
    return {
      page: paginationModel.page,
      pageSize: paginationModel.pageSize,
      sort: sort?.sort ? `${sort.field}:${sort.sort}` : undefined,
      q: q === '' ? undefined : q,
    };
  }, [paginationModel, sortModel, filterModel]);

  // A new order or search starts again from the first page.
  const backToFirstPage = () => setPaginationModel((model) => ({ ...model, page: 0 }));

  return {
    query,
    grid: {
      paginationModel,
      sortModel,
      filterModel,
      onPaginationModelChange: setPaginationModel,
      onSortModelChange: (model) => {
        setSortModel(model);
        backToFirstPage();
      },
      onFilterModelChange: (model) => {
        setFilterModel(model);
        backToFirstPage();
      },
    },
  };
}
