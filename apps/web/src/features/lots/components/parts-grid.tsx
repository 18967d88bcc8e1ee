import type { DisplayUnit, PartRow } from '@evenset/contracts';
import FlagOutlined from '@mui/icons-material/FlagOutlined';
import SwapHorizOutlined from '@mui/icons-material/SwapHorizOutlined';
import type { SvgIconComponent } from '@mui/icons-material';
import Stack from '@mui/material/Stack';
import Tooltip from '@mui/material/Tooltip';
import type { GridColDef } from '@mui/x-data-grid';
import { useMemo } from 'react';
import { useNavigate } from 'react-router-dom';
import { AppDataGrid } from '../../../components/app-data-grid';
import { lengthColumn } from '../../../components/data-grid/length-column';
import { linkColumn } from '../../../components/data-grid/link-column';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { useRenderMark } from '../../../components/use-render-mark';
import {
  PART_STATUS_LABELS,
  PartStatusLabel,
  VerdictLabel,
  verdictText,
} from '../../../components/display/verdict-label';
import { paths } from '../../../config/paths';
import { useLotParts } from '../api/get-lot';

const OUTSIDE_WINDOW_HINT = 'Would not match sets sold before: the height is outside the interchange window.';

function flagTexts(row: PartRow): string[] {
  return [
    ...(row.runFlagged ? ['Drift flag'] : []),
    ...(row.outsideWindow ? ['Would not match sets sold before'] : []),
  ];
}

/** A warning icon with its meaning as tooltip and accessible name. */
function FlagIcon({ icon: Icon, label }: { icon: SvgIconComponent; label: string }) {
  return (
    <Tooltip title={label}>
      <Icon role="img" aria-label={label} fontSize="small" sx={{ color: 'warning.main' }} />
    </Tooltip>
  );
}

function partColumns(unit: DisplayUnit): GridColDef<PartRow>[] {
  const sortable = { sortable: true };
  // Six figures columns side by side: narrower than the default so status stays in view at desk width.
  const narrow = (column: GridColDef<PartRow>): GridColDef<PartRow> => ({ ...column, width: 108 });
  return [
    // Wide enough for a big lot's serials, e.g. BIG-0001-00001.
    linkColumn<PartRow>({ field: 'serial', headerName: 'Serial', width: 150 }, (row) => paths.part.getHref(row.id)),
    narrow(lengthColumn<PartRow>('height', 'Height', unit, (row) => row.height, { level: 'fine', ...sortable })),
    narrow(lengthColumn<PartRow>('flatness', 'Flatness', unit, (row) => row.flatness, { level: 'fine', ...sortable })),
    narrow(
      lengthColumn<PartRow>('parallelism', 'Parallelism', unit, (row) => row.parallelism, {
        level: 'fine',
        ...sortable,
      }),
    ),
    narrow(lengthColumn<PartRow>('runout', 'Runout', unit, (row) => row.runout, { level: 'fine', ...sortable })),
    narrow(
      lengthColumn<PartRow>('expandedUncertainty', 'U', unit, (row) => row.expandedUncertainty, {
        small: true,
        ...sortable,
      }),
    ),
    {
      field: 'verdict',
      headerName: 'Verdict',
      width: 160,
      sortable: false,
      valueGetter: (_value, row) => (row.verdict ? verdictText(row.verdict) : '—'),
      renderCell: ({ row }) => (row.verdict ? <VerdictLabel verdict={row.verdict} /> : '—'),
    },
    {
      field: 'status',
      headerName: 'Status',
      width: 200,
      // Flags ride in the status cell, so the grid fits a desk screen; the CSV spells them out.
      valueGetter: (status: PartRow['status'], row) => [PART_STATUS_LABELS[status], ...flagTexts(row)].join('; '),
      renderCell: ({ row }) => (
        <Stack direction="row" spacing={1} sx={{ height: '100%', alignItems: 'center' }}>
          <PartStatusLabel status={row.status} />
          {row.runFlagged ? (
            <FlagIcon icon={FlagOutlined} label="Drift flag: the run's master check drifted beyond its limit" />
          ) : null}
          {row.outsideWindow ? <FlagIcon icon={SwapHorizOutlined} label={OUTSIDE_WINDOW_HINT} /> : null}
        </Stack>
      ),
    },
  ];
}

/** A lot's parts with their current results; a row opens the part. */
export function PartsGrid({ lotId, unit }: { lotId: string; unit: DisplayUnit }) {
  const navigate = useNavigate();
  const list = useGridListQuery([{ field: 'serial', sort: 'asc' }]);
  const request = useLotParts(lotId, list.query);
  useRenderMark('lot-parts', request.data !== undefined);
  const columns = useMemo(() => partColumns(unit), [unit]);
  return (
    <AppDataGrid
      label="Parts"
      columns={columns}
      request={request}
      list={list}
      searchLabel="Search serials"
      emptyState={{
        title: 'No parts in this lot yet',
        hint: 'An engineer registers the serials when creating the lot.',
      }}
      csvFileName="evenset-lot-parts"
      onRowClick={(row) => void navigate(paths.part.getHref(row.id))}
    />
  );
}
