import type { DisplayUnit, MasterDetail } from '@evenset/contracts';
import { formatFixed, formatLength } from '@evenset/metrology';
import { DetailList } from '../../../components/display/detail-list';
import { Figures } from '../../../components/display/figures';
import { GaugeStatusLabel } from '../../../components/display/gauge-status';
import { formatDate } from '../../../lib/format';
import { formatSmallLength } from '../../../lib/small-length';

/** What a master is and the calibration in force. */
export function MasterSummary({ master, unit }: { master: MasterDetail; unit: DisplayUnit }) {
  const current = master.current;
  const fine = { level: 'fine' } as const;
  return (
    <DetailList
      items={[
        { label: 'Status', value: <GaugeStatusLabel status={master.status} /> },
        { label: 'Nominal size', value: <Figures>{formatLength(master.nominal, unit)}</Figures> },
        {
          label: 'Calibrated size',
          value: current ? <Figures>{formatLength(current.calibratedSize, unit, fine)}</Figures> : '—',
        },
        {
          label: 'Expanded uncertainty U (k)',
          value: current ? (
            <Figures>
              {formatSmallLength(current.expandedUncertainty, unit, true)} (k = {formatFixed(current.coverageFactor, 1)}
              )
            </Figures>
          ) : (
            '—'
          ),
        },
        { label: 'Calibration due', value: current ? formatDate(current.dueOn) : 'Not calibrated yet' },
        {
          label: 'Material',
          value: `${master.material.name}, ${master.material.expansionPerK.toFixed(1)} × 10⁻⁶/K`,
        },
        ...(master.retiredAt
          ? [{ label: 'Retired', value: `${formatDate(master.retiredAt)} — ${master.retiredReason ?? ''}` }]
          : []),
      ]}
    />
  );
}
