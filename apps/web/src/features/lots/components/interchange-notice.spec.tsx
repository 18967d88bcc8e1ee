import { PART_STATUSES, type LotDetail } from '@evenset/contracts';
import { render, screen } from '@testing-library/react';
import { formatCount } from '../../../lib/format';
import { InterchangeNotice } from './interchange-notice';

function lotWithOutside(count: number): LotDetail {
  return {
    id: 'lot-1',
    lotNumber: 'L-1',
    spec: {
      id: 'spec-1',
      partNumber: 'PP-6',
      revision: 'A',
      title: 'Parallel pair',
      displayUnit: 'mm',
      nominal: 25.4,
      band: { lower: -0.005, upper: 0.005 },
      matchingBand: 0.002,
      flatness: null,
      parallelism: null,
      runout: null,
      decisionRule: 'simple',
    },
    quantity: count,
    grindDate: '2026-11-20',
    notes: null,
    partCount: count,
    createdAt: '2026-11-20T08:00:00.000Z',
    counts: Object.fromEntries(PART_STATUSES.map((status) => [status, 0])) as LotDetail['counts'],
    heightSpread: null,
    interchange: {
      window: { low: 25.401, high: 25.402 },
      conflict: false,
      soldSets: 1,
      outsideSerials: Array.from({ length: count }, (_, i) => `S-${String(i + 1).padStart(5, '0')}`),
    },
  };
}

describe('InterchangeNotice', () => {
  it('names every part outside the window when they are few', () => {
    render(<InterchangeNotice lot={lotWithOutside(3)} unit="mm" />);
    expect(screen.getByRole('alert')).toHaveTextContent(/^S-00001, S-00002, S-00003 would not match PP-6 sets/);
  });

  it('names the first ten of a big lot and counts the rest', () => {
    render(<InterchangeNotice lot={lotWithOutside(10000)} unit="mm" />);
    const notice = screen.getByRole('alert');
    // The count is grouped in the reader's locale: 9,990 in en-US.
    expect(notice).toHaveTextContent(
      new RegExp(`^S-00001, .*, S-00010 and ${formatCount(9990)} more parts would not match PP-6 sets`),
    );
    expect(notice).not.toHaveTextContent('S-00011');
  });
});
