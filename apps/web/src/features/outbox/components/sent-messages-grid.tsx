import type { OutboxMessage } from '@evenset/contracts';
import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import ErrorOutlineOutlined from '@mui/icons-material/ErrorOutlineOutlined';
import ReplayOutlined from '@mui/icons-material/ReplayOutlined';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { GridColDef } from '@mui/x-data-grid';
import { useMemo, useState } from 'react';
import { AppDataGrid } from '../../../components/app-data-grid';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { StatusLabel } from '../../../components/display/status-label';
import { useNotify } from '../../../components/feedback/notifications';
import { describeError } from '../../../lib/errors';
import { retryMessage, useOutboxMessages, useRevalidateOutbox } from '../api/outbox';
import { formatDateTime, MAIL_KIND_LABELS } from './format';

function RetryButton({ message }: { message: OutboxMessage }) {
  const notify = useNotify();
  const revalidate = useRevalidateOutbox();
  const [busy, setBusy] = useState(false);
  const retry = async () => {
    setBusy(true);
    try {
      const delivery = await retryMessage(message.id);
      if (delivery.status === 'sent') notify(`The message to ${message.recipient} was sent.`);
      else notify(`Still not sent: ${delivery.error ?? 'no reason given.'}`, 'error');
    } catch (error) {
      notify(describeError(error), 'error');
    } finally {
      setBusy(false);
      await revalidate();
    }
  };
  return (
    <Button
      size="small"
      variant="outlined"
      startIcon={<ReplayOutlined />}
      loading={busy}
      onClick={() => void retry()}
      aria-label={`Retry the message to ${message.recipient}`}
    >
      Retry
    </Button>
  );
}

const columns: GridColDef<OutboxMessage>[] = [
  {
    field: 'createdAt',
    headerName: 'Written',
    width: 170,
    sortable: false,
    valueFormatter: (value: string) => formatDateTime(value),
  },
  {
    field: 'kind',
    headerName: 'Kind',
    width: 150,
    sortable: false,
    valueGetter: (kind: OutboxMessage['kind']) => MAIL_KIND_LABELS[kind],
  },
  { field: 'recipient', headerName: 'To', flex: 1, minWidth: 200, sortable: false },
  { field: 'subject', headerName: 'Subject', flex: 1.4, minWidth: 240, sortable: false },
  {
    field: 'status',
    headerName: 'Status',
    flex: 1.2,
    minWidth: 240,
    sortable: false,
    valueGetter: (_value, row) => (row.status === 'sent' ? 'Sent' : `Not sent: ${row.lastError ?? ''}`),
    renderCell: ({ row }) =>
      row.status === 'sent' ? (
        <StatusLabel icon={CheckCircleOutlined} label="Sent" tone="success" />
      ) : (
        <Stack sx={{ justifyContent: 'center', height: '100%', py: 0.5 }}>
          <StatusLabel icon={ErrorOutlineOutlined} label="Not sent" tone="error" />
          <Typography
            variant="caption"
            title={row.lastError ?? undefined}
            sx={{ color: 'text.secondary', overflow: 'hidden', textOverflow: 'ellipsis', whiteSpace: 'nowrap' }}
          >
            {row.lastError}
          </Typography>
        </Stack>
      ),
  },
  { field: 'attempts', headerName: 'Tries', type: 'number', width: 70, sortable: false },
  {
    field: 'attachments',
    headerName: 'Attachments',
    flex: 0.8,
    minWidth: 160,
    sortable: false,
    valueGetter: (files: string[]) => files.join(', '),
  },
  {
    field: 'retry',
    headerName: '',
    width: 120,
    sortable: false,
    disableExport: true,
    renderCell: ({ row }) => (
      <Stack sx={{ justifyContent: 'center', height: '100%' }}>
        {row.status === 'failed' ? <RetryButton message={row} /> : null}
      </Stack>
    ),
  },
];

/** Every message Evenset wanted to send, newest first, with whether it went out and why not. */
export function SentMessagesGrid() {
  const list = useGridListQuery();
  const request = useOutboxMessages(list.query);
  const memoColumns = useMemo(() => columns, []);
  return (
    <AppDataGrid
      label="Sent by Evenset"
      columns={memoColumns}
      request={request}
      list={list}
      searchLabel="Search recipient or subject"
      emptyState={{
        title: 'No mail yet',
        hint: 'Certificates sent to customers, password reset links and the calibration digest appear here.',
      }}
      csvFileName="evenset-outbox"
    />
  );
}
