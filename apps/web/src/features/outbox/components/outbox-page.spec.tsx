import type { OutboxMessage } from '@evenset/contracts';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { SWRConfig } from 'swr';
import { OutboxRoute } from '../../../app/routes/outbox';
import { NotificationsProvider } from '../../../components/feedback/notifications';
import { setCsrfToken } from '../../../lib/api-client';
import { swrConfig } from '../../../lib/swr';
import { installFakeFetch } from '../../../testing/fake-fetch';

const REASON = 'The mail server at 127.0.0.1:2525 did not answer (ECONNREFUSED).';

function message(overrides: Partial<OutboxMessage>): OutboxMessage {
  return {
    id: '11111111-1111-4111-8111-111111111111',
    kind: 'certificate',
    recipient: 'buyer@customer.test',
    subject: 'Certificate for set S-0001',
    createdAt: '2026-12-01T09:00:00.000Z',
    status: 'failed',
    lastError: REASON,
    lastAttemptAt: '2026-12-01T09:00:01.000Z',
    attempts: 1,
    attachments: ['S-0001.pdf'],
    ...overrides,
  };
}

function renderOutbox(rows: OutboxMessage[]) {
  let current = rows;
  const requests = installFakeFetch((request) => {
    if (request.url === '/api/auth/csrf') return { status: 200, body: { csrfToken: 't' } };
    if (request.url.startsWith('/api/outbox/messages?')) return { status: 200, body: { items: current, total: 1 } };
    if (request.url.endsWith('/retry')) {
      current = current.map((m) => ({ ...m, status: 'sent', lastError: null, attempts: 2 }));
      return { status: 200, body: { messageId: current[0]!.id, status: 'sent', error: null } };
    }
    return { status: 404 };
  });
  render(
    <SWRConfig value={{ ...swrConfig, provider: () => new Map(), shouldRetryOnError: false }}>
      <NotificationsProvider>
        <OutboxRoute />
      </NotificationsProvider>
    </SWRConfig>,
  );
  return { requests, user: userEvent.setup() };
}

// jsdom lays nothing out; the grid renders only the rows and columns that fit its measured size.
const SIZES = ['clientWidth', 'clientHeight', 'offsetWidth', 'offsetHeight'] as const;
const original = SIZES.map((key) => Object.getOwnPropertyDescriptor(HTMLElement.prototype, key));
beforeAll(() => {
  for (const key of SIZES) Object.defineProperty(HTMLElement.prototype, key, { configurable: true, get: () => 1600 });
});
afterAll(() => {
  SIZES.forEach((key, i) => {
    const descriptor = original[i];
    if (descriptor) Object.defineProperty(HTMLElement.prototype, key, descriptor);
  });
});

beforeEach(() => setCsrfToken(null));

describe('the Outbox page', () => {
  it('shows a message that did not go out with its reason, and retries it', async () => {
    const { requests, user } = renderOutbox([message({})]);
    const grid = await screen.findByRole('grid', { name: 'Sent by Evenset' });
    expect(await within(grid).findByText('Not sent')).toBeInTheDocument();
    expect(within(grid).getByText(REASON)).toBeInTheDocument();

    await user.click(within(grid).getByRole('button', { name: 'Retry the message to buyer@customer.test' }));
    expect(await screen.findByText('The message to buyer@customer.test was sent.')).toBeInTheDocument();
    expect(requests.filter((r) => r.method === 'POST').map((r) => r.url)).toEqual([
      '/api/outbox/messages/11111111-1111-4111-8111-111111111111/retry',
    ]);
    expect(await within(grid).findByText('Sent')).toBeInTheDocument();
  });

  it('offers no retry for a message that was sent', async () => {
    renderOutbox([message({ status: 'sent', lastError: null })]);
    const grid = await screen.findByRole('grid', { name: 'Sent by Evenset' });
    expect(await within(grid).findByText('Sent')).toBeInTheDocument();
    expect(within(grid).queryByRole('button', { name: /Retry/ })).not.toBeInTheDocument();
  });
});
