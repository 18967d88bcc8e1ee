import type { DisplayUnit, LotDetail, PartRow } from '@evenset/contracts';
import { displayResolution, formatFixed, fromMillimetres } from '@evenset/metrology';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import {
  CartesianGrid,
  ErrorBar,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  Scatter,
  ScatterChart,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { formatCount } from '../../../lib/format';
import { granite, monoFontFamily, ochre, slate, status } from '../../../theme/tokens';

interface LotHeightsChartProps {
  spec: LotDetail['spec'];
  /** Heights that still match sets sold before; null when none are sold or they disagree. */
  window: LotDetail['interchange']['window'];
  parts: readonly PartRow[];
  /** How many parts the lot has; more than `parts` when only the first page of them is charted. */
  total: number;
  unit: DisplayUnit;
}

/**
 * Each inspected part's height with its U as an error bar, against the band, the nominal and the
 * interchange window (shaded).
 */
export function LotHeightsChart({ spec, window, parts, total, unit }: LotHeightsChartProps) {
  const { decimals, symbol } = displayResolution(unit, 'fine');
  const inUnit = (mm: number) => fromMillimetres(mm, unit);
  const lower = inUnit(spec.nominal + spec.band.lower);
  const upper = inUnit(spec.nominal + spec.band.upper);
  const nominal = inUnit(spec.nominal);
  const points = parts.flatMap((part, index) =>
    part.height === null
      ? []
      : [
          {
            index: index + 1,
            serial: part.serial,
            height: inUnit(part.height),
            u: inUnit(part.expandedUncertainty ?? 0),
          },
        ],
  );
  const values = [lower, upper, nominal, ...points.flatMap((p) => [p.height - p.u, p.height + p.u])];
  const margin = (upper - lower) * 0.25;
  const domain = [Math.min(...values) - margin, Math.max(...values) + margin];
  const format = (value: number) => formatFixed(value, decimals);

  if (points.length === 0)
    return <Typography sx={{ color: 'text.secondary' }}>No part of this lot has been inspected yet.</Typography>;
  const chart = (
    <Box
      role="img"
      aria-label={`Heights of ${formatCount(points.length)} parts against the band ${format(lower)} to ${format(upper)} ${symbol}`}
      sx={{ height: 320, fontFamily: monoFontFamily, fontSize: 12 }}
    >
      <ResponsiveContainer width="100%" height="100%">
        {/* Room on the right for the last serial, which sits centred on the axis's end. */}
        <ScatterChart margin={{ top: 16, right: 48, bottom: 8, left: 24 }}>
          <CartesianGrid stroke={granite[200]} />
          <XAxis
            type="number"
            dataKey="index"
            domain={[0, points.length + 1]}
            allowDecimals={false}
            tickFormatter={(i: number) => points.find((p) => p.index === i)?.serial ?? ''}
            ticks={points.map((p) => p.index)}
            // A big lot has hundreds of serials: show as many as fit without running into each other.
            interval="preserveStartEnd"
            minTickGap={24}
            stroke={granite[700]}
          />
          <YAxis
            type="number"
            dataKey="height"
            domain={domain}
            tickFormatter={format}
            width={90}
            stroke={granite[700]}
            label={{ value: `Height (${symbol})`, angle: -90, position: 'insideLeft', fill: granite[700] }}
          />
          {window ? (
            <ReferenceArea
              y1={inUnit(window.low)}
              y2={inUnit(window.high)}
              fill={slate[100]}
              fillOpacity={0.6}
              ifOverflow="hidden"
              label={{ value: 'Matches sets sold before', position: 'insideBottomLeft', fill: slate[800] }}
            />
          ) : null}
          <ReferenceLine
            y={upper}
            stroke={status.error}
            strokeDasharray="6 3"
            label={{ value: 'Upper limit', position: 'insideTopRight', fill: status.error }}
          />
          <ReferenceLine
            y={nominal}
            stroke={ochre[700]}
            label={{ value: 'Nominal', position: 'insideTopLeft', fill: ochre[700] }}
          />
          <ReferenceLine
            y={lower}
            stroke={status.error}
            strokeDasharray="6 3"
            label={{ value: 'Lower limit', position: 'insideBottomRight', fill: status.error }}
          />
          <Tooltip
            formatter={(value) => (typeof value === 'number' ? `${format(value)} ${symbol}` : String(value))}
            labelFormatter={() => ''}
          />
          <Scatter name="Height" data={points} fill={slate[800]} isAnimationActive={false}>
            <ErrorBar dataKey="u" direction="y" width={6} stroke={slate[600]} />
          </Scatter>
        </ScatterChart>
      </ResponsiveContainer>
    </Box>
  );
  if (total <= parts.length) return chart;
  return (
    <>
      {chart}
      <Typography variant="body2" sx={{ color: 'text.secondary', mt: 1 }}>
        Charted: the first {formatCount(parts.length)} parts by serial of {formatCount(total)}; the parts list below
        holds them all.
      </Typography>
    </>
  );
}
