import type { DisplayUnit, InspectionResult } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import { DetailList, type DetailItem } from '../../../components/display/detail-list';
import { Figures } from '../../../components/display/figures';
import { VerdictLabel } from '../../../components/display/verdict-label';
import { formatSmallLength } from '../../../lib/small-length';

type Decision = InspectionResult['decisions']['height'];

function Characteristic({ value, decision }: { value: string; decision: Decision | null }) {
  return (
    <>
      <Figures>{value}</Figures>
      {decision ? <VerdictLabel verdict={decision.verdict} side={decision.side} /> : null}
    </>
  );
}

/** A stored result: each characteristic with its own verdict, the height with its U. */
export function ResultSummary({ result, unit }: { result: InspectionResult; unit: DisplayUnit }) {
  const length = (mm: number) => formatLength(mm, unit, { level: 'fine' });
  const items: DetailItem[] = [
    { label: 'Verdict', value: <VerdictLabel verdict={result.verdict} side={result.decisions.height.side} /> },
    { label: 'Height', value: <Characteristic value={length(result.height)} decision={result.decisions.height} /> },
    {
      label: `Expanded uncertainty U (k = ${result.coverageFactor})`,
      value: <Figures>{formatSmallLength(result.expandedUncertainty, unit, true)}</Figures>,
    },
  ];
  if (result.flatness)
    items.push({
      label: 'Flatness (minimum zone)',
      value: (
        <Characteristic
          value={`${length(result.flatness.minimumZone)} (least squares ${length(result.flatness.leastSquares)})`}
          decision={result.decisions.flatness}
        />
      ),
    });
  if (result.parallelism)
    items.push({
      label: `Parallelism (to the ${result.parallelism.datum})`,
      value: <Characteristic value={length(result.parallelism.value)} decision={result.decisions.parallelism} />,
    });
  if (result.runout)
    items.push({
      label: 'Runout (largest circle; total)',
      value: (
        <Characteristic
          value={`${length(Math.max(...result.runout.circles.map((c) => c.circularRunout)))}; ${length(result.runout.total)}`}
          decision={result.decisions.runout}
        />
      ),
    });
  return <DetailList items={items} />;
}
