import type { DisplayUnit, Trend } from '@evenset/contracts';
import { displayResolution, formatFixed, fromMillimetres } from '@evenset/metrology';
import {
  Area,
  AreaChart,
  CartesianGrid,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  XAxis,
  YAxis,
} from 'recharts';
import { formatCount } from '../../../lib/format';
import { granite, ochre, slate, status } from '../../../theme/tokens';
import { ChartFrame } from './chart-frame';

interface HeightHistogramProps {
  bins: Trend['histogram'];
  spec: Trend['spec'];
  unit: DisplayUnit;
  fileName: string;
}

/** How many heights fall in each bin, drawn as steps over a height axis that also holds the band. */
export function HeightHistogram({ bins, spec, unit, fileName }: HeightHistogramProps) {
  const { decimals, symbol } = displayResolution(unit, 'fine');
  const inUnit = (mm: number) => fromMillimetres(mm, unit);
  const format = (value: number) => formatFixed(value, decimals);
  // Steps: each bin's count from its lower edge; a closing point brings the outline back to zero.
  const data = [
    ...bins.map((b) => ({ x: inUnit(b.from), count: b.count })),
    ...(bins.length ? [{ x: inUnit(bins[bins.length - 1]!.to), count: 0 }] : []),
  ];
  const band = spec ? { lower: inUnit(spec.lower), upper: inUnit(spec.upper), nominal: inUnit(spec.nominal) } : null;
  const edges = [...data.map((d) => d.x), ...(band ? [band.lower, band.upper] : [])];
  const low = Math.min(...edges);
  const high = Math.max(...edges);
  const pad = (high - low || 1) * 0.05;
  const total = bins.reduce((sum, b) => sum + b.count, 0);

  return (
    <ChartFrame
      title="Histogram of heights"
      fileName={fileName}
      height={260}
      summary={`${formatCount(total)} heights in ${bins.length} bins${band ? ` against the band ${format(band.lower)} to ${format(band.upper)} ${symbol}` : ''}`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <AreaChart data={data} margin={{ top: 24, right: 24, bottom: 24, left: 24 }}>
          <CartesianGrid stroke={granite[200]} />
          <XAxis
            type="number"
            dataKey="x"
            domain={[low - pad, high + pad]}
            tickFormatter={format}
            stroke={granite[700]}
            label={{ value: `Height (${symbol})`, position: 'insideBottom', offset: -16, fill: granite[700] }}
          />
          <YAxis
            allowDecimals={false}
            tickFormatter={formatCount}
            stroke={granite[700]}
            label={{ value: 'Parts', angle: -90, position: 'insideLeft', fill: granite[700] }}
          />
          {band ? <ReferenceArea x1={band.lower} x2={band.upper} fill={slate[50]} fillOpacity={0.9} /> : null}
          {band ? (
            <ReferenceLine
              x={band.lower}
              stroke={status.error}
              strokeDasharray="2 3"
              label={{ value: 'Lower limit', position: 'top', fill: status.error }}
            />
          ) : null}
          {band ? (
            <ReferenceLine
              x={band.upper}
              stroke={status.error}
              strokeDasharray="2 3"
              label={{ value: 'Upper limit', position: 'top', fill: status.error }}
            />
          ) : null}
          {band ? <ReferenceLine x={band.nominal} stroke={ochre[700]} /> : null}
          <Area
            type="stepAfter"
            dataKey="count"
            stroke={slate[800]}
            fill={slate[200]}
            fillOpacity={0.9}
            isAnimationActive={false}
          />
        </AreaChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
