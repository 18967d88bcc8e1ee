import type { DisplayUnit, LotDetail } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import { DetailList } from '../../../components/display/detail-list';
import { Figures } from '../../../components/display/figures';
import { PART_STATUS_LABELS } from '../../../components/display/verdict-label';
import { formatCount, formatDate } from '../../../lib/format';
import { WindowText } from './interchange-notice';

/** The lot's spec in brief, its counts and its height spread. */
export function LotSummary({ lot, unit }: { lot: LotDetail; unit: DisplayUnit }) {
  const { spec, heightSpread } = lot;
  const length = (mm: number) => <Figures>{formatLength(mm, unit, { level: 'fine' })}</Figures>;
  const counted = Object.entries(lot.counts)
    .filter(([, count]) => count > 0)
    .map(
      ([status, count]) =>
        `${formatCount(count)} ${PART_STATUS_LABELS[status as keyof typeof PART_STATUS_LABELS].toLowerCase()}`,
    );
  return (
    <DetailList
      items={[
        { label: 'Part number', value: `${spec.partNumber} rev ${spec.revision} — ${spec.title}` },
        {
          label: 'Band',
          value: (
            <>
              {length(spec.nominal + spec.band.lower)} to {length(spec.nominal + spec.band.upper)}
            </>
          ),
        },
        { label: 'Decision rule', value: spec.decisionRule === 'guarded' ? 'Guarded by U' : 'Simple acceptance' },
        { label: 'Ground', value: formatDate(lot.grindDate) },
        {
          label: 'Parts',
          value: `${formatCount(lot.partCount)} of ${formatCount(lot.quantity)}${counted.length ? ` — ${counted.join(', ')}` : ''}`,
        },
        { label: 'Interchange window', value: <WindowText interchange={lot.interchange} unit={unit} /> },
        {
          label: 'Height spread',
          value: heightSpread ? (
            <>
              {length(heightSpread.spread)} ({length(heightSpread.lowest)} to {length(heightSpread.highest)},{' '}
              {formatCount(heightSpread.parts)} parts)
            </>
          ) : (
            'No part inspected yet'
          ),
        },
      ]}
    />
  );
}
