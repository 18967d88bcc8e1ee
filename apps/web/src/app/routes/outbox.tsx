import Stack from '@mui/material/Stack';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import { useState } from 'react';
import { PageHeader } from '../../components/page-header';
import { ReceivedMailGrid } from '../../features/outbox/components/received-mail-grid';
import { SentMessagesGrid } from '../../features/outbox/components/sent-messages-grid';

type OutboxTab = 'sent' | 'received';

export function OutboxRoute() {
  const [tab, setTab] = useState<OutboxTab>('sent');
  return (
    <>
      <PageHeader
        title="Outbox"
        description="Every message Evenset has sent or tried to send, and what the local mail catcher received. A message that did not go out can be retried."
      />
      <Stack sx={{ flexGrow: 1, gap: 2 }}>
        <Tabs value={tab} onChange={(_, value: OutboxTab) => setTab(value)} aria-label="Outbox sections">
          <Tab value="sent" label="Sent by Evenset" id="outbox-tab-sent" aria-controls="outbox-panel-sent" />
          <Tab
            value="received"
            label="Received by the local mail catcher"
            id="outbox-tab-received"
            aria-controls="outbox-panel-received"
          />
        </Tabs>
        <Stack
          role="tabpanel"
          id={`outbox-panel-${tab}`}
          aria-labelledby={`outbox-tab-${tab}`}
          sx={{ flexGrow: 1, display: 'flex' }}
        >
          {tab === 'sent' ? <SentMessagesGrid /> : <ReceivedMailGrid />}
        </Stack>
      </Stack>
    </>
  );
}
