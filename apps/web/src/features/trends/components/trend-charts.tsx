import type { DisplayUnit, Trend } from '@evenset/contracts';
import Stack from '@mui/material/Stack';
import { ControlChart } from './control-chart';
import { SubgroupNotes } from './subgroup-notes';

function signalIndexes(trend: Trend, chart: 'xbar' | 'individuals'): Set<number> {
  return new Set(trend.signals.filter((s) => s.chart === chart).flatMap((s) => s.indexes));
}

/** X-bar and R charts of the subgroups, with the band on the X-bar chart. */
export function SubgroupCharts({ trend, unit }: { trend: Trend; unit: DisplayUnit }) {
  const { subgroups } = trend;
  const marked = signalIndexes(trend, 'xbar');
  const name = trend.partNumber;
  return (
    <Stack spacing={3}>
      <SubgroupNotes chart={subgroups} />
      {subgroups.xbar && subgroups.range ? (
        <>
          <ControlChart
            title="X-bar chart"
            fileName={`${name}-xbar`}
            quantity="Subgroup mean"
            points={subgroups.subgroups.map((g, i) => ({ label: g.label, value: g.mean, signal: marked.has(i) }))}
            limits={subgroups.xbar}
            band={trend.spec}
            unit={unit}
          />
          <ControlChart
            title="R chart"
            fileName={`${name}-range`}
            quantity="Subgroup range"
            points={subgroups.subgroups.map((g) => ({ label: g.label, value: g.range, signal: false }))}
            limits={subgroups.range}
            unit={unit}
          />
        </>
      ) : null}
    </Stack>
  );
}

/** Individuals and moving-range charts of every height in order, with the band on the first. */
export function IndividualsCharts({ trend, unit }: { trend: Trend; unit: DisplayUnit }) {
  const chart = trend.individuals;
  const marked = signalIndexes(trend, 'individuals');
  const name = trend.partNumber;
  if (!chart) return null;
  return (
    <Stack spacing={3}>
      <ControlChart
        title="Individuals chart"
        fileName={`${name}-individuals`}
        quantity="Height"
        points={trend.points.serial.map((serial, i) => ({
          label: serial,
          value: trend.points.height[i]!,
          signal: marked.has(i),
        }))}
        limits={chart.individuals}
        band={trend.spec}
        unit={unit}
      />
      <ControlChart
        title="Moving range chart"
        fileName={`${name}-moving-range`}
        quantity="Moving range"
        points={chart.movingRanges.map((value, i) => ({ label: trend.points.serial[i + 1]!, value, signal: false }))}
        limits={chart.movingRange}
        unit={unit}
      />
    </Stack>
  );
}
