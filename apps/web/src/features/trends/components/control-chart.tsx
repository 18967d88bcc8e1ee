import type { DisplayUnit, TrendLimits } from '@evenset/contracts';
import { displayResolution, formatFixed, fromMillimetres } from '@evenset/metrology';
import {
  CartesianGrid,
  Line,
  LineChart,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
  type DotItemDotProps,
} from 'recharts';
import { formatCount } from '../../../lib/format';
import { granite, ochre, slate, status } from '../../../theme/tokens';
import { ChartFrame } from './chart-frame';

export interface ChartPoint {
  label: string;
  /** mm */
  value: number;
  /** Part of a run-rule signal. */
  signal: boolean;
}

interface ControlChartProps {
  title: string;
  fileName: string;
  /** What is plotted, e.g. "Subgroup mean". */
  quantity: string;
  points: readonly ChartPoint[];
  /** mm */
  limits: TrendLimits;
  /** The spec band (absolute, mm), drawn on charts of heights only. */
  band?: { lower: number; upper: number } | null;
  unit: DisplayUnit;
}

/** The mark of a point in a run-rule signal: an ochre diamond, apart from the round slate points. */
export function SignalMark({ cx, cy, size = 7 }: { cx: number; cy: number; size?: number }) {
  return (
    <path
      d={`M ${cx} ${cy - size} L ${cx + size} ${cy} L ${cx} ${cy + size} L ${cx - size} ${cy} Z`}
      fill={ochre[500]}
      stroke={granite[900]}
      strokeWidth={1.5}
    />
  );
}

/** Above this many points a dot per point hides the line and slows the page: only signals keep a mark. */
const DOTS_UP_TO = 400;

function dotRenderer(everyPoint: boolean) {
  return function renderDot(props: DotItemDotProps) {
    const { cx, cy, index } = props;
    const payload = props.payload as { signal?: boolean } | undefined;
    if (typeof cx !== 'number' || typeof cy !== 'number') return <g key={index} />;
    if (payload?.signal) return <SignalMark key={index} cx={cx} cy={cy} />;
    return everyPoint ? <circle key={index} cx={cx} cy={cy} r={3.5} fill={slate[800]} /> : <g key={index} />;
  };
}

/** A control chart: the values in order, centre line, control limits and (for heights) the band. */
export function ControlChart({ title, fileName, quantity, points, limits, band, unit }: ControlChartProps) {
  const { decimals, symbol } = displayResolution(unit, 'fine');
  const inUnit = (mm: number) => fromMillimetres(mm, unit);
  const format = (value: number) => formatFixed(value, decimals);
  const data = points.map((p) => ({ label: p.label, value: inUnit(p.value), signal: p.signal }));
  const lines = { upper: inUnit(limits.upper), centre: inUnit(limits.centre), lower: inUnit(limits.lower) };
  const bandIn = band ? { lower: inUnit(band.lower), upper: inUnit(band.upper) } : null;
  // A loop, not Math.min(...values): 20,000 arguments are near the engine's limit.
  let [low, high] = [
    Math.min(lines.lower, bandIn?.lower ?? Infinity),
    Math.max(lines.upper, bandIn?.upper ?? -Infinity),
  ];
  for (const { value } of data) [low, high] = [Math.min(low, value), Math.max(high, value)];
  const pad = (high - low || Math.abs(high) || 1) * 0.08;
  const signals = data.filter((d) => d.signal).length;

  return (
    <ChartFrame
      title={title}
      fileName={fileName}
      summary={`${title}: ${formatCount(data.length)} points, centre line ${format(lines.centre)}, control limits ${format(lines.lower)} to ${format(lines.upper)} ${symbol}${signals ? `, ${signals} in run-rule signals` : ''}`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 16, right: 96, bottom: 8, left: 24 }}>
          <CartesianGrid stroke={granite[200]} />
          <XAxis dataKey="label" stroke={granite[700]} interval="preserveStartEnd" minTickGap={24} />
          <YAxis
            type="number"
            // Ranges are never negative: their axis starts at zero at the lowest.
            domain={[low >= 0 ? Math.max(0, low - pad) : low - pad, high + pad]}
            tickFormatter={format}
            width={90}
            stroke={granite[700]}
            label={{ value: `${quantity} (${symbol})`, angle: -90, position: 'insideLeft', fill: granite[700] }}
          />
          {bandIn ? (
            <ReferenceArea y1={bandIn.lower} y2={bandIn.upper} fill={slate[50]} fillOpacity={0.9} ifOverflow="hidden" />
          ) : null}
          {bandIn ? (
            <ReferenceLine
              y={bandIn.upper}
              stroke={status.error}
              strokeDasharray="2 3"
              label={{ value: 'Upper limit', position: 'insideTopLeft', fill: status.error }}
            />
          ) : null}
          {bandIn ? (
            <ReferenceLine
              y={bandIn.lower}
              stroke={status.error}
              strokeDasharray="2 3"
              label={{ value: 'Lower limit', position: 'insideBottomLeft', fill: status.error }}
            />
          ) : null}
          <ReferenceLine
            y={lines.upper}
            stroke={slate[600]}
            strokeDasharray="8 4"
            label={{ value: `UCL ${format(lines.upper)}`, position: 'right', fill: slate[800], dy: -7 }}
          />
          <ReferenceLine
            y={lines.centre}
            stroke={ochre[700]}
            label={{ value: `CL ${format(lines.centre)}`, position: 'right', fill: ochre[700] }}
          />
          <ReferenceLine
            y={lines.lower}
            stroke={slate[600]}
            strokeDasharray="8 4"
            label={{ value: `LCL ${format(lines.lower)}`, position: 'right', fill: slate[800], dy: 7 }}
          />
          <Tooltip formatter={(value) => (typeof value === 'number' ? `${format(value)} ${symbol}` : String(value))} />
          <Line
            type="linear"
            dataKey="value"
            name={quantity}
            stroke={slate[600]}
            strokeWidth={1.5}
            dot={dotRenderer(data.length <= DOTS_UP_TO)}
            isAnimationActive={false}
          />
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
