import type { CapturedMail } from '@evenset/contracts';
import type { GridColDef } from '@mui/x-data-grid';
import { useState } from 'react';
import { AppDataGrid } from '../../../components/app-data-grid';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { useCapturedMail } from '../api/outbox';
import { CapturedMailDialog } from './captured-mail-dialog';
import { formatDateTime } from './format';

const columns: GridColDef<CapturedMail>[] = [
  {
    field: 'receivedAt',
    headerName: 'Received',
    width: 170,
    sortable: false,
    valueFormatter: (value: string) => formatDateTime(value),
  },
  { field: 'from', headerName: 'From', flex: 1, minWidth: 200, sortable: false },
  {
    field: 'to',
    headerName: 'To',
    flex: 1,
    minWidth: 200,
    sortable: false,
    valueGetter: (to: string[]) => to.join(', '),
  },
  { field: 'subject', headerName: 'Subject', flex: 1.4, minWidth: 240, sortable: false },
  {
    field: 'attachments',
    headerName: 'Attachments',
    flex: 0.8,
    minWidth: 160,
    sortable: false,
    valueGetter: (files: CapturedMail['attachments']) => files.map((f) => f.filename).join(', '),
  },
];

/** What the local mail catcher received, newest first; a row opens the message. */
export function ReceivedMailGrid() {
  const list = useGridListQuery();
  const request = useCapturedMail(list.query);
  const [openId, setOpenId] = useState<string | null>(null);
  return (
    <>
      <AppDataGrid
        label="Received by the local mail catcher"
        columns={columns}
        request={request}
        list={list}
        searchLabel="Search subject"
        emptyState={{
          title: 'Nothing received',
          hint: 'When Evenset runs with its local mail catcher, every message it sends lands here instead of a real mailbox.',
        }}
        csvFileName="evenset-received-mail"
        onRowClick={(row) => setOpenId(row.id)}
      />
      {openId ? <CapturedMailDialog id={openId} onClose={() => setOpenId(null)} /> : null}
    </>
  );
}
