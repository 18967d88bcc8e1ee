import type { Proposal, Stock } from '@evenset/contracts';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { SWRConfig } from 'swr';
import { NotificationsProvider } from '../../../components/feedback/notifications';
import { setCsrfToken } from '../../../lib/api-client';
import { swrConfig } from '../../../lib/swr';
import { installFakeFetch } from '../../../testing/fake-fetch';
import { SetBuilder } from './set-builder';

// Invented demo heights (mm) against a 0.005 mm band; spreads worked by hand: 38.103 − 38.100 =
// 0.003 mm within the band, and with 38.097 in place of 38.100, 38.103 − 38.097 = 0.006 mm over it.
const part = (serial: string, height: number) => ({
  id: `id-${serial}`,
  serial,
  lotNumber: 'L-1',
  revision: 'B',
  height,
});

const stock: Stock[] = [
  {
    partNumber: 'RB-40',
    revision: 'B',
    title: 'Riser block',
    setSize: 4,
    matchingBand: 0.005,
    displayUnit: 'mm',
    available: 6,
    outsideWindow: 0,
    window: null,
    windowConflict: false,
  },
];

const proposal: Proposal = {
  partNumber: 'RB-40',
  setSize: 4,
  matchingBand: 0.005,
  displayUnit: 'mm',
  requested: 1,
  possible: 1,
  sets: [{ parts: [part('A1', 38.1), part('A2', 38.101), part('A3', 38.102), part('A4', 38.103)], spread: 0.003 }],
  spare: [part('S1', 38.097), part('S2', 38.1015)],
  window: null,
  explanation: '1 set proposed; the free stock could make 1.',
};

function renderBuilder() {
  return render(
    <MemoryRouter>
      <SWRConfig value={{ ...swrConfig, provider: () => new Map(), dedupingInterval: 0 }}>
        <NotificationsProvider>
          <SetBuilder stock={stock} unit="mm" />
        </NotificationsProvider>
      </SWRConfig>
    </MemoryRouter>,
  );
}

describe('the set builder', () => {
  beforeEach(() => {
    setCsrfToken('token');
    installFakeFetch((request) => {
      if (request.url.startsWith('/api/sets/proposal')) return { status: 200, body: proposal };
      if (request.url.startsWith('/api/interchange/'))
        return {
          status: 200,
          body: {
            partNumber: 'RB-40',
            matchingBand: 0.005,
            displayUnit: 'mm',
            soldSets: [],
            window: null,
            conflicting: [],
            explanation: 'No sets of this part number have been sold yet.',
          },
        };
      if (request.url.startsWith('/api/customers')) return { status: 200, body: { items: [], total: 0 } };
      return { status: 404, body: { code: 'NOT_FOUND', message: 'Not found.' } };
    });
  });

  it('marks a set pushed over the band by a swap and holds back the allocation until it is fixed', async () => {
    const user = userEvent.setup();
    renderBuilder();
    await user.click(screen.getByRole('button', { name: 'Propose sets' }));

    const set = await screen.findByRole('article', { name: 'Set 1' });
    expect(within(set).getByRole('img', { name: /^Spread 0\.00300* mm .*within the band$/ })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Allocate 1 set' })).toBeEnabled();

    // The menu says what each spare would do before it is chosen.
    await user.click(within(set).getByRole('button', { name: 'Swap A1' }));
    const over = await screen.findByRole('menuitem', { name: /S1 .* would be 0\.00600* mm — over the band/ });
    await user.click(over);

    expect(within(set).getByText('Cannot be allocated as it is')).toBeInTheDocument();
    expect(
      within(set).getByRole('img', { name: /^Spread 0\.00600* mm .*over the band by 0\.00100* mm$/ }),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Allocate 1 set' })).toBeDisabled();
    expect(screen.getByText(/Set 1 needs a change first/)).toBeInTheDocument();

    // Swapping back (A1 is now a spare) puts it right again.
    await user.click(within(set).getByRole('button', { name: 'Swap S1' }));
    await user.click(await screen.findByRole('menuitem', { name: /A1 .* would be 0\.00300* mm/ }));
    expect(within(set).queryByText('Cannot be allocated as it is')).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Allocate 1 set' })).toBeEnabled();

    // A removed set goes back to the spares; with no set left there is nothing to allocate.
    await user.click(within(set).getByRole('button', { name: 'Remove set 1' }));
    expect(screen.queryByRole('article', { name: 'Set 1' })).not.toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Spare parts' })).toHaveTextContent('A4');
    expect(screen.getByRole('button', { name: 'Allocate 0 sets' })).toBeDisabled();
  });
});
