import Stack from '@mui/material/Stack';
import { useParams } from 'react-router-dom';
import { BackLink } from '../../components/back-link';
import { SectionCard } from '../../components/display/section-card';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { useRenderMark } from '../../components/use-render-mark';
import { paths } from '../../config/paths';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { useLot, useLotParts } from '../../features/lots/api/get-lot';
import { LotHeightsChart } from '../../features/lots/components/lot-heights-chart';
import { InterchangeNotice } from '../../features/lots/components/interchange-notice';
import { LotSummary } from '../../features/lots/components/lot-summary';
import { PartsGrid } from '../../features/lots/components/parts-grid';

// The largest page the API serves: a lot of up to 500 parts is charted whole, a bigger one in part (the chart says so).
const CHART_PARTS = { page: 0, pageSize: 500, sort: 'serial:asc' } as const;

export function LotReviewRoute() {
  const { lotId = '' } = useParams();
  const { displayUnit } = useSignedInUser();
  const { data: lot, error, mutate } = useLot(lotId);
  const chartParts = useLotParts(lotId, CHART_PARTS);
  useRenderMark('lot-review', Boolean(lot && chartParts.data));

  if (error) return <LoadFailed what="lot" error={error} onRetry={() => void mutate()} />;
  if (!lot) return <PageLoading />;
  return (
    <>
      <BackLink to={paths.lots.getHref()} label="All lots" />
      <PageHeader title={`Lot review — ${lot.lotNumber}`} description={lot.notes ?? undefined} />
      <Stack spacing={3}>
        <SectionCard title="Lot">
          <LotSummary lot={lot} unit={displayUnit} />
        </SectionCard>
        <SectionCard
          title="Heights against the band"
          description="Each part's height with its expanded uncertainty U (k = 2) as an error bar; the shaded band holds the heights that match sets sold before."
        >
          <LotHeightsChart
            spec={lot.spec}
            window={lot.interchange.window}
            parts={chartParts.data?.items ?? []}
            total={chartParts.data?.total ?? 0}
            unit={displayUnit}
          />
        </SectionCard>
        <InterchangeNotice lot={lot} unit={displayUnit} />
        <PartsGrid lotId={lot.id} unit={displayUnit} />
      </Stack>
    </>
  );
}
