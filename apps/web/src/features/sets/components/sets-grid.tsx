import type { DisplayUnit, SetRow } from '@evenset/contracts';
import Link from '@mui/material/Link';
import type { GridColDef } from '@mui/x-data-grid';
import { useMemo } from 'react';
import { useNavigate, Link as RouterLink } from 'react-router-dom';
import { AppDataGrid } from '../../../components/app-data-grid';
import { UNIT_SYMBOLS } from '../../../components/data-grid/length-column';
import { linkColumn } from '../../../components/data-grid/link-column';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { paths } from '../../../config/paths';
import { useSets } from '../api/sets';
import { formatDateTime, formatHeight, SET_KIND_LABELS } from '../set-format';
import { SpreadBar } from './spread-bar';

function columns(unit: DisplayUnit): GridColDef<SetRow>[] {
  return [
    linkColumn<SetRow>({ field: 'setNumber', headerName: 'Set', width: 140 }, (row) => paths.set.getHref(row.id)),
    { field: 'partNumber', headerName: 'Part number', width: 115 },
    {
      field: 'customerName',
      headerName: 'Customer',
      flex: 1,
      minWidth: 170,
      sortable: false,
      renderCell: ({ row }) => (
        <Link
          component={RouterLink}
          to={paths.customer.getHref(row.customerId)}
          onClick={(event) => event.stopPropagation()}
        >
          {row.customerName}
        </Link>
      ),
    },
    { field: 'orderReference', headerName: 'Order', width: 125, sortable: false },
    {
      field: 'serials',
      headerName: 'Serials',
      flex: 1,
      minWidth: 220,
      sortable: false,
      valueGetter: (_value, row) => row.serials.join(', '),
    },
    {
      field: 'spread',
      headerName: `Spread / band (${UNIT_SYMBOLS[unit]})`,
      width: 270,
      sortable: false,
      // The CSV gets the same figures as the cell, in the reader's unit.
      valueGetter: (_value, row) =>
        `${formatHeight(row.spread, unit, false)} / ${formatHeight(row.matchingBand, unit, false)}`,
      renderCell: ({ row }) => <SpreadBar spread={row.spread} band={row.matchingBand} unit={unit} dense />,
    },
    {
      field: 'kind',
      headerName: 'Kind',
      width: 120,
      sortable: false,
      valueGetter: (_value, row) => SET_KIND_LABELS[row.kind],
    },
    {
      field: 'replacesSetNumber',
      headerName: 'Replaces',
      width: 130,
      sortable: false,
      valueGetter: (value: string | null) => value ?? '',
    },
    { field: 'allocatedByName', headerName: 'Allocated by', width: 150, sortable: false },
    {
      field: 'createdAt',
      headerName: 'Allocated',
      width: 170,
      valueGetter: (value: string) => formatDateTime(value),
    },
  ];
}

interface SetsGridProps {
  unit: DisplayUnit;
  /** Only this part number's sets; undefined lists every set. */
  partNumber: string | undefined;
  canBuild: boolean;
}

/** Matched sets and replacements, newest first; a row opens the set. */
export function SetsGrid({ unit, partNumber, canBuild }: SetsGridProps) {
  const navigate = useNavigate();
  const list = useGridListQuery([{ field: 'createdAt', sort: 'desc' }]);
  const request = useSets({ ...list.query, partNumber });
  const gridColumns = useMemo(() => columns(unit), [unit]);
  return (
    <AppDataGrid
      label="Sets"
      columns={gridColumns}
      request={request}
      list={list}
      searchLabel="Search sets, customers, orders"
      emptyState={
        partNumber
          ? { title: `No sets of ${partNumber} yet`, hint: 'Choose another part number, or clear the filter.' }
          : {
              title: 'No sets yet',
              hint: canBuild
                ? 'Build the first ones from released parts with “Build sets” above.'
                : 'Sales builds sets from released parts and allocates them to customers’ orders.',
            }
      }
      csvFileName="evenset-sets"
      onRowClick={(row) => void navigate(paths.set.getHref(row.id))}
    />
  );
}
