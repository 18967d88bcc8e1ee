import type { DisplayUnit, Instrument, InstrumentKind } from '@evenset/contracts';
import DoNotDisturbOnOutlined from '@mui/icons-material/DoNotDisturbOnOutlined';
import EditOutlined from '@mui/icons-material/EditOutlined';
import { GridActionsCellItem, type GridColDef } from '@mui/x-data-grid';
import { useMemo, useState } from 'react';
import { AppDataGrid } from '../../../components/app-data-grid';
import { lengthColumn } from '../../../components/data-grid/length-column';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { GAUGE_STATUS_LABELS, GaugeStatusLabel } from '../../../components/display/gauge-status';
import { ReasonDialog } from '../../../components/form/reason-dialog';
import { formatDate } from '../../../lib/format';
import { useInstruments, useRevalidateInstruments } from '../api/get-instruments';
import { retireInstrument } from '../api/retire-instrument';
import { INSTRUMENT_KIND_LABELS } from '../instrument-kinds';
import { InstrumentDialog } from './instrument-dialog';

type InstrumentAction = { kind: 'edit' | 'retire'; instrument: Instrument };

function instrumentColumns(
  unit: DisplayUnit,
  act: ((action: InstrumentAction) => void) | null,
): GridColDef<Instrument>[] {
  const columns: GridColDef<Instrument>[] = [
    { field: 'code', headerName: 'Id code', width: 140 },
    {
      field: 'kind',
      headerName: 'Kind',
      width: 160,
      valueFormatter: (kind: InstrumentKind) => INSTRUMENT_KIND_LABELS[kind],
    },
    { field: 'description', headerName: 'Description', flex: 1, minWidth: 260 },
    lengthColumn<Instrument>('resolution', 'Resolution', unit, (row) => row.resolution, { small: true }),
    {
      field: 'calibrationDueOn',
      headerName: 'Calibration due',
      width: 150,
      valueFormatter: (due: string) => formatDate(due),
    },
    {
      field: 'status',
      headerName: 'Status',
      width: 150,
      sortable: false,
      valueGetter: (status: Instrument['status']) => GAUGE_STATUS_LABELS[status],
      renderCell: ({ row }) => <GaugeStatusLabel status={row.status} />,
    },
  ];
  if (!act) return columns;
  return [
    ...columns,
    {
      field: 'actions',
      type: 'actions',
      headerName: 'Actions',
      width: 90,
      getActions: ({ row }) =>
        row.status === 'retired'
          ? []
          : [
              <GridActionsCellItem
                key="edit"
                showInMenu
                icon={<EditOutlined />}
                label="Edit"
                onClick={() => act({ kind: 'edit', instrument: row })}
              />,
              <GridActionsCellItem
                key="retire"
                showInMenu
                icon={<DoNotDisturbOnOutlined />}
                label="Retire"
                onClick={() => act({ kind: 'retire', instrument: row })}
              />,
            ],
    },
  ];
}

/** Indicators, height gauges and probes with their resolution and calibration due date. */
export function InstrumentsGrid({ unit, canEdit }: { unit: DisplayUnit; canEdit: boolean }) {
  const list = useGridListQuery([{ field: 'code', sort: 'asc' }]);
  const request = useInstruments(list.query);
  const revalidate = useRevalidateInstruments();
  const [action, setAction] = useState<InstrumentAction | null>(null);
  const columns = useMemo(() => instrumentColumns(unit, canEdit ? setAction : null), [unit, canEdit]);
  const close = () => setAction(null);
  return (
    <>
      <AppDataGrid
        label="Instruments"
        columns={columns}
        request={request}
        list={list}
        searchLabel="Search instruments"
        emptyState={{
          title: 'No instruments yet',
          hint: canEdit
            ? 'Add the first indicator or height gauge with “Add instrument” above.'
            : 'An engineer adds them.',
        }}
        csvFileName="evenset-instruments"
      />
      {action?.kind === 'edit' ? <InstrumentDialog instrument={action.instrument} unit={unit} onClose={close} /> : null}
      {action?.kind === 'retire' ? (
        <ReasonDialog
          title={`Retire ${action.instrument.code}?`}
          text="A retired instrument can no longer be chosen at the Bench. Readings already made with it keep their record."
          submitLabel="Retire"
          done={`${action.instrument.code} was retired.`}
          onConfirm={async (input) => {
            await retireInstrument(action.instrument.id, input);
            await revalidate();
          }}
          onClose={close}
        />
      ) : null}
    </>
  );
}
