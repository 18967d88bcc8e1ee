import type { Spec } from '@evenset/contracts';
import { DetailList } from '../../../components/display/detail-list';
import { Figures } from '../../../components/display/figures';
import { formatDate } from '../../../lib/format';
import { specBand, specLength } from '../spec-format';
import { SpecStatusLabel } from './spec-status';

const HEIGHT_WORDS = { mean: 'Mean of the stations', highest: 'Highest station', station: 'Station' } as const;
const RULE_WORDS = {
  simple: 'Simple acceptance — inside the band conforms',
  guarded: 'Guarded acceptance — inside the band shrunk by the expanded uncertainty',
} as const;

/** Every decision of a revision except the plan, as label and value. */
export function SpecSummary({ spec }: { spec: Spec }) {
  const d = spec.definition;
  const length = (mm: number | null | undefined) =>
    mm == null ? 'Not checked' : <Figures>{specLength(d, mm)}</Figures>;
  const grinding = d.grinding;
  return (
    <DetailList
      items={[
        { label: 'Status', value: <SpecStatusLabel status={spec.status} /> },
        { label: 'Unit', value: d.displayUnit === 'in' ? 'Inch' : 'Millimetre' },
        { label: 'Nominal height', value: length(d.nominal) },
        { label: 'Tolerance band', value: <Figures>{specBand(d)}</Figures> },
        { label: 'Matching band', value: length(d.matchingBand) },
        { label: 'Set size', value: <Figures>{d.setSize}</Figures> },
        { label: 'Flatness', value: length(d.flatness) },
        { label: 'Parallelism', value: length(d.parallelism) },
        { label: 'Runout', value: length(d.runout) },
        {
          label: 'Part height',
          value: d.heightStatistic === 'station' ? `Station ${d.heightStation ?? ''}` : HEIGHT_WORDS[d.heightStatistic],
        },
        { label: 'Decision rule', value: RULE_WORDS[d.decisionRule] },
        {
          label: 'Material',
          // A released revision keeps the coefficient it was released with, whatever the table says now.
          value: spec.frozenExpansion
            ? `${spec.material.name}, ${spec.frozenExpansion.expansionPerK.toFixed(1)} × 10⁻⁶/K as released (${spec.frozenExpansion.source})`
            : `${spec.material.name}, ${spec.material.expansionPerK.toFixed(1)} × 10⁻⁶/K (${spec.material.source})`,
        },
        {
          label: 'Master-check drift limit',
          value: (
            <>
              <Figures>{specLength(d, spec.effectiveMasterDriftLimit)}</Figures>
              {d.masterDriftLimit == null ? ' (shop default)' : ''}
            </>
          ),
        },
        {
          label: 'Grinding parameters',
          value: grinding ? (
            <Figures>
              rough {specLength(d, grinding.roughDepth)}, finish {specLength(d, grinding.finishDepth)} of{' '}
              {specLength(d, grinding.finishAllowance)}, {grinding.sparkOutPasses} spark-out
            </Figures>
          ) : (
            'None'
          ),
        },
        { label: 'Released', value: spec.releasedAt ? formatDate(spec.releasedAt) : 'Not yet' },
        { label: 'Last changed', value: formatDate(spec.updatedAt) },
      ]}
    />
  );
}
