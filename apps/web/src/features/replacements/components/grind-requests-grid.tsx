import type { DisplayUnit, GrindRequestRow } from '@evenset/contracts';
import { useMemo } from 'react';
import type { GridColDef } from '@mui/x-data-grid';
import { useNavigate } from 'react-router-dom';
import { AppDataGrid } from '../../../components/app-data-grid';
import { linkColumn } from '../../../components/data-grid/link-column';
import { lengthColumn } from '../../../components/data-grid/length-column';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { paths } from '../../../config/paths';
import { useSignedInUser } from '../../auth/hooks/use-signed-in-user';
import { formatDateTime } from '../../sets/set-format';
import { useGrindRequests } from '../api/replacements';
import { GRIND_STATUS_LABELS, GrindRequestStatusLabel } from './grind-request-status';

function columnsIn(unit: DisplayUnit): GridColDef<GrindRequestRow>[] {
  return [
    linkColumn<GrindRequestRow>({ field: 'requestNumber', headerName: 'Request', width: 130 }, (row) =>
      paths.grindRequest.getHref(row.id),
    ),
    { field: 'serial', headerName: 'Serial', width: 110 },
    { field: 'partNumber', headerName: 'Part number', width: 110 },
    {
      field: 'status',
      headerName: 'Status',
      width: 170,
      sortable: false,
      valueFormatter: (value: GrindRequestRow['status']) => GRIND_STATUS_LABELS[value],
      renderCell: ({ row }) => <GrindRequestStatusLabel status={row.status} />,
    },
    lengthColumn<GrindRequestRow>('targetHeight', 'Target', unit, (r) => r.targetHeight, {
      level: 'fine',
      sortable: true,
      width: 130,
    }),
    lengthColumn<GrindRequestRow>('stock', 'Stock to remove', unit, (r) => r.stock, {
      level: 'fine',
      sortable: true,
      width: 150,
    }),
    { field: 'originalSetNumber', headerName: 'For set', width: 120, sortable: false },
    { field: 'createdAt', headerName: 'Raised', width: 160, valueGetter: (value: string) => formatDateTime(value) },
  ];
}

/** Grind-to-target requests, newest first; a row opens the request. */
export function GrindRequestsGrid() {
  const navigate = useNavigate();
  const { displayUnit } = useSignedInUser();
  const columns = useMemo(() => columnsIn(displayUnit), [displayUnit]);
  const list = useGridListQuery([{ field: 'createdAt', sort: 'desc' }]);
  const request = useGrindRequests(list.query);
  return (
    <AppDataGrid
      label="Grind requests"
      columns={columns}
      request={request}
      list={list}
      searchLabel="Search by request or serial"
      emptyState={{
        title: 'No grind requests yet',
        hint: 'Customer service raises one from a replacement check when no released part fits the set.',
      }}
      csvFileName="evenset-grind-requests"
      onRowClick={(row) => void navigate(paths.grindRequest.getHref(row.id))}
    />
  );
}
