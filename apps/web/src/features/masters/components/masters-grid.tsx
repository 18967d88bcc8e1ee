import type { DisplayUnit, Master } from '@evenset/contracts';
import { formatFixed } from '@evenset/metrology';
import type { GridColDef } from '@mui/x-data-grid';
import { useMemo } from 'react';
import { useNavigate } from 'react-router-dom';
import { AppDataGrid } from '../../../components/app-data-grid';
import { figuresColumn, lengthColumn } from '../../../components/data-grid/length-column';
import { linkColumn } from '../../../components/data-grid/link-column';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { GAUGE_STATUS_LABELS, GaugeStatusLabel } from '../../../components/display/gauge-status';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { useMasters } from '../api/get-masters';

function masterColumns(unit: DisplayUnit): GridColDef<Master>[] {
  return [
    linkColumn<Master>({ field: 'code', headerName: 'Id code', width: 150 }, (row) => paths.master.getHref(row.id)),
    { field: 'description', headerName: 'Description', flex: 1, minWidth: 240 },
    lengthColumn<Master>('nominal', 'Nominal', unit, (row) => row.nominal),
    lengthColumn<Master>('calibratedSize', 'Calibrated size', unit, (row) => row.current?.calibratedSize, {
      level: 'fine',
      width: 170,
    }),
    lengthColumn<Master>('expandedUncertainty', 'U', unit, (row) => row.current?.expandedUncertainty, {
      small: true,
    }),
    figuresColumn<Master>({
      field: 'coverageFactor',
      headerName: 'k',
      width: 70,
      sortable: false,
      valueGetter: (_value, row) => (row.current ? formatFixed(row.current.coverageFactor, 1) : '—'),
    }),
    {
      field: 'dueOn',
      headerName: 'Calibration due',
      width: 150,
      sortable: false,
      valueGetter: (_value, row) => (row.current ? formatDate(row.current.dueOn) : '—'),
    },
    {
      field: 'status',
      headerName: 'Status',
      width: 150,
      sortable: false,
      valueGetter: (status: Master['status']) => GAUGE_STATUS_LABELS[status],
      renderCell: ({ row }) => <GaugeStatusLabel status={row.status} />,
    },
  ];
}

/** Master gauges with their calibration in force; a row opens the gauge's page. */
export function MastersGrid({ unit, canEdit }: { unit: DisplayUnit; canEdit: boolean }) {
  const navigate = useNavigate();
  const list = useGridListQuery([{ field: 'code', sort: 'asc' }]);
  const request = useMasters(list.query);
  const columns = useMemo(() => masterColumns(unit), [unit]);
  return (
    <AppDataGrid
      label="Master gauges"
      columns={columns}
      request={request}
      list={list}
      searchLabel="Search masters"
      emptyState={{
        title: 'No master gauges yet',
        hint: canEdit
          ? 'Add the first master with “Add master” above, then record its calibration.'
          : 'An engineer adds them.',
      }}
      csvFileName="evenset-masters"
      onRowClick={(row) => void navigate(paths.master.getHref(row.id))}
    />
  );
}
