import type { Trend } from '@evenset/contracts';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { SectionCard } from '../../components/display/section-card';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import {
  NO_FILTERS,
  usePartNumbers,
  useTrend,
  type TrendFilters as Filters,
} from '../../features/trends/api/get-trends';
import { CapabilityCard } from '../../features/trends/components/capability-card';
import { download } from '../../features/trends/components/chart-export';
import { HeightHistogram } from '../../features/trends/components/height-histogram';
import { LimitsTable } from '../../features/trends/components/limits-table';
import { SignalsList } from '../../features/trends/components/signals-list';
import { IndividualsCharts, SubgroupCharts } from '../../features/trends/components/trend-charts';
import { trendCsv } from '../../features/trends/components/trend-csv';
import { TrendFilters } from '../../features/trends/components/trend-filters';
import { ApiError } from '../../lib/api-client';
import { countOf } from '../../lib/format';

function lotCount(trend: Trend): string {
  return countOf(new Set(trend.points.lot).size, 'lot');
}

export function TrendsRoute() {
  const { displayUnit } = useSignedInUser();
  const [search, setSearch] = useSearchParams();
  const [filters, setFilters] = useState<Filters>(NO_FILTERS);
  const partNumbers = usePartNumbers();
  const items = partNumbers.data?.items ?? [];
  const partNumber = search.get('partNumber') ?? items[0]?.partNumber ?? null;
  const trend = useTrend(partNumber, filters);
  const refused = trend.error instanceof ApiError && trend.error.status === 400 ? trend.error : null;
  const errors = Object.fromEntries((refused?.details ?? []).map((d) => [d.path.split('.')[0]!, d.message]));
  const data = trend.data && trend.data.partNumber === partNumber ? trend.data : null;

  if (partNumbers.error)
    return <LoadFailed what="part numbers" error={partNumbers.error} onRetry={() => void partNumbers.mutate()} />;
  if (!partNumbers.data) return <PageLoading />;
  return (
    <>
      <PageHeader
        title="Trends"
        description="Is the grinding holding the band? Control charts, run-rule signals, capability and a histogram of part heights, per part number."
        actions={
          data ? (
            <Button
              variant="outlined"
              startIcon={<FileDownloadOutlined />}
              disabled={!data.points.serial.length}
              onClick={() =>
                download(new Blob([trendCsv(data, displayUnit)], { type: 'text/csv' }), `trend-${data.partNumber}.csv`)
              }
            >
              Export data (CSV)
            </Button>
          ) : null
        }
      />
      <Stack spacing={3}>
        <SectionCard title="What to chart">
          {items.length === 0 ? (
            <Typography>No part number has a released spec yet — release a spec revision first.</Typography>
          ) : (
            <TrendFilters
              partNumbers={items}
              partNumber={partNumber ?? ''}
              onPartNumber={(value) => {
                setFilters((f) => ({ ...NO_FILTERS, subgroup: f.subgroup }));
                setSearch({ partNumber: value });
              }}
              filters={filters}
              onChange={setFilters}
              choices={data?.choices ?? null}
              errors={errors}
            />
          )}
        </SectionCard>
        {trend.error && !refused ? (
          <LoadFailed what="trend" error={trend.error} onRetry={() => void trend.mutate()} />
        ) : null}
        {refused ? <Typography color="error">{refused.message}</Typography> : null}
        {partNumber && !data && !trend.error ? <PageLoading /> : null}
        {data && data.points.serial.length === 0 ? (
          <Typography>
            No measured part of {data.partNumber} matches these filters — widen them or clear them.
          </Typography>
        ) : null}
        {data && data.points.serial.length > 0 ? (
          <>
            <Typography sx={{ color: 'text.secondary' }}>
              {`${countOf(data.points.serial.length, 'height')} of ${data.partNumber} from ${lotCount(data)}, each part's current result.`}
              {data.spec ? ` Band of revision ${data.spec.revision}.` : ' No released revision, so no band.'}
            </Typography>
            <SectionCard
              title="Control limits"
              description="Centre line (CL) and control limits (UCL, LCL) of each chart: 3 sigma from the centre, sigma from the ranges."
            >
              <LimitsTable trend={data} unit={displayUnit} />
            </SectionCard>
            <SectionCard
              title={`X-bar and R — subgroups by ${data.subgroups.basis === 'lot' ? 'lot' : 'sold set'}`}
              description="Mean and range of each subgroup; the shaded band is the spec's tolerance for a single part."
            >
              <SubgroupCharts trend={data} unit={displayUnit} />
            </SectionCard>
            <SectionCard
              title="Individuals and moving range"
              description="Every part's height in order (lots by grind date, parts by inspection time), and the change from one part to the next."
            >
              <IndividualsCharts trend={data} unit={displayUnit} />
            </SectionCard>
            <SectionCard
              title="Run-rule signals"
              description="Patterns that suggest the process has shifted or drifted."
            >
              <SignalsList signals={data.signals} />
            </SectionCard>
            <SectionCard
              title="Capability"
              description="Cp = band width / 6σ and Cpk = distance from the mean to the nearer limit / 3σ, σ the sample standard deviation of the heights."
            >
              <CapabilityCard trend={data} unit={displayUnit} />
            </SectionCard>
            <SectionCard title="Heights against the band">
              <HeightHistogram
                bins={data.histogram}
                spec={data.spec}
                unit={displayUnit}
                fileName={`${data.partNumber}-histogram`}
              />
            </SectionCard>
          </>
        ) : null}
      </Stack>
    </>
  );
}
