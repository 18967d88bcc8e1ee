import type { DisplayUnit, GaugeStudyDetail } from '@evenset/contracts';
import { chartConstants, displayResolution, formatFixed, fromMillimetres } from '@evenset/metrology';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import {
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Scatter,
  ScatterChart,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { granite, monoFontFamily, ochre, slate, status } from '../../../theme/tokens';

/** Each inspector a colour and a shape, so the charts read without colour too. */
const SERIES = [
  { color: slate[800], shape: 'circle' },
  { color: ochre[700], shape: 'square' },
  { color: status.info, shape: 'triangle' },
  { color: status.success, shape: 'diamond' },
  { color: granite[700], shape: 'cross' },
] as const;

interface ChartsProps {
  study: GaugeStudyDetail;
  unit: DisplayUnit;
}

/** The heights in force, by part (in serial order), inspector (in study order) and trial. */
function cells(study: GaugeStudyDetail): (number | undefined)[][][] {
  const part = new Map(study.partList.map((p, i) => [p.id, i]));
  const inspector = new Map(study.inspectors.map((p, j) => [p.id, j]));
  const values = study.partList.map(() => study.inspectors.map(() => [] as (number | undefined)[]));
  for (const m of study.measurements) {
    if (m.supersededById) continue;
    values[part.get(m.partId)!]![inspector.get(m.inspectorId)!]![m.trial - 1] = m.heightMm;
  }
  return values;
}

function Frame({ label, children }: { label: string; children: ReactNode }) {
  return (
    <Box role="img" aria-label={label} sx={{ height: 300, fontFamily: monoFontFamily, fontSize: 12 }}>
      <ResponsiveContainer width="100%" height="100%">
        {children}
      </ResponsiveContainer>
    </Box>
  );
}

/** Every measurement by part, one series per inspector, each set a little apart so none hides another. */
export function ByPartChart({ study, unit }: ChartsProps) {
  const { decimals, symbol } = displayResolution(unit, 'fine');
  const values = cells(study);
  const offset = (j: number) => (j - (study.inspectors.length - 1) / 2) * 0.12;
  return (
    <Frame label={`Heights of ${study.partList.length} parts, by part and inspector, in ${symbol}`}>
      <ScatterChart margin={{ top: 16, right: 24, bottom: 8, left: 24 }}>
        <CartesianGrid stroke={granite[200]} />
        <XAxis
          type="number"
          dataKey="x"
          domain={[0.5, study.partList.length + 0.5]}
          ticks={study.partList.map((_, i) => i + 1)}
          tickFormatter={(i: number) => study.partList[Math.round(i) - 1]?.serial ?? ''}
          stroke={granite[700]}
        />
        <YAxis
          type="number"
          dataKey="y"
          domain={['auto', 'auto']}
          tickFormatter={(v: number) => formatFixed(v, decimals)}
          width={90}
          stroke={granite[700]}
          label={{ value: `Height (${symbol})`, angle: -90, position: 'insideLeft', fill: granite[700] }}
        />
        <Tooltip formatter={(v) => (typeof v === 'number' ? formatFixed(v, decimals) : String(v))} />
        <Legend />
        {study.inspectors.map((person, j) => (
          <Scatter
            key={person.id}
            name={person.displayName}
            fill={SERIES[j % SERIES.length]!.color}
            shape={SERIES[j % SERIES.length]!.shape}
            isAnimationActive={false}
            data={values.flatMap((part, i) =>
              part[j]!.flatMap((mm) =>
                mm === undefined ? [] : [{ x: i + 1 + offset(j), y: fromMillimetres(mm, unit) }],
              ),
            )}
          />
        ))}
      </ScatterChart>
    </Frame>
  );
}

/** Every measurement by inspector, with each inspector's mean as a line across their column. */
export function ByInspectorChart({ study, unit }: ChartsProps) {
  const { decimals, symbol } = displayResolution(unit, 'fine');
  const values = cells(study);
  return (
    <Frame label={`Heights by inspector, in ${symbol}`}>
      <ScatterChart margin={{ top: 16, right: 24, bottom: 8, left: 24 }}>
        <CartesianGrid stroke={granite[200]} />
        <XAxis
          type="number"
          dataKey="x"
          domain={[0.5, study.inspectors.length + 0.5]}
          ticks={study.inspectors.map((_, j) => j + 1)}
          tickFormatter={(j: number) => study.inspectors[Math.round(j) - 1]?.displayName ?? ''}
          stroke={granite[700]}
        />
        <YAxis
          type="number"
          dataKey="y"
          domain={['auto', 'auto']}
          tickFormatter={(v: number) => formatFixed(v, decimals)}
          width={90}
          stroke={granite[700]}
          label={{ value: `Height (${symbol})`, angle: -90, position: 'insideLeft', fill: granite[700] }}
        />
        <Tooltip formatter={(v) => (typeof v === 'number' ? formatFixed(v, decimals) : String(v))} />
        {study.inspectors.map((person, j) => {
          const own = values.flatMap((part) => part[j]!.filter((v): v is number => v !== undefined));
          const mean = own.length ? own.reduce((a, b) => a + b, 0) / own.length : null;
          return (
            <Scatter
              key={person.id}
              name={person.displayName}
              fill={SERIES[j % SERIES.length]!.color}
              shape={SERIES[j % SERIES.length]!.shape}
              isAnimationActive={false}
              data={[
                ...own.map((mm, k) => ({ x: j + 1 + ((k % 9) - 4) * 0.03, y: fromMillimetres(mm, unit) })),
                ...(mean === null
                  ? []
                  : [
                      { x: j + 0.7, y: fromMillimetres(mean, unit) },
                      { x: j + 1.3, y: fromMillimetres(mean, unit) },
                    ]),
              ]}
            />
          );
        })}
      </ScatterChart>
    </Frame>
  );
}

/**
 * The range of each inspector's trials on each part, with the average range R̄ and the upper
 * limit D4·R̄ (the standard range-chart constant for the number of trials). A range above the
 * limit is a measurement the inspector could not repeat.
 */
export function RangeChart({ study, unit }: ChartsProps) {
  const { decimals, symbol } = displayResolution(unit, 'fine');
  const values = cells(study);
  const rows = study.partList.map((part, i) => {
    const row: Record<string, number | string> = { serial: part.serial };
    study.inspectors.forEach((person, j) => {
      const trials = values[i]![j]!.filter((v): v is number => v !== undefined);
      if (trials.length === study.trials)
        row[person.id] = fromMillimetres(Math.max(...trials) - Math.min(...trials), unit);
    });
    return row;
  });
  const ranges = rows.flatMap((row) => study.inspectors.map((p) => row[p.id]).filter((v) => typeof v === 'number'));
  const rBar = ranges.length ? ranges.reduce((a, b) => a + b, 0) / ranges.length : 0;
  const ucl = chartConstants(study.trials).D4 * rBar;
  const format = (v: number) => formatFixed(v, decimals);
  if (!ranges.length) return <Typography color="text.secondary">No part has all its trials yet.</Typography>;
  return (
    <Frame
      label={`Range of the trials per part and inspector, average ${format(rBar)} ${symbol}, upper limit ${format(ucl)} ${symbol}`}
    >
      <LineChart data={rows} margin={{ top: 16, right: 24, bottom: 8, left: 24 }}>
        <CartesianGrid stroke={granite[200]} />
        <XAxis dataKey="serial" stroke={granite[700]} />
        <YAxis
          tickFormatter={format}
          width={90}
          stroke={granite[700]}
          domain={[0, (max: number) => Math.max(max, ucl) * 1.1]}
          label={{ value: `Range (${symbol})`, angle: -90, position: 'insideLeft', fill: granite[700] }}
        />
        <Tooltip formatter={(v) => (typeof v === 'number' ? `${format(v)} ${symbol}` : String(v))} />
        <Legend />
        <ReferenceLine
          y={rBar}
          stroke={slate[600]}
          label={{ value: 'R̄', position: 'insideTopLeft', fill: slate[800] }}
        />
        <ReferenceLine
          y={ucl}
          stroke={status.error}
          strokeDasharray="6 3"
          label={{ value: 'Upper limit', position: 'insideTopRight', fill: status.error }}
        />
        {study.inspectors.map((person, j) => (
          <Line
            key={person.id}
            dataKey={person.id}
            name={person.displayName}
            stroke={SERIES[j % SERIES.length]!.color}
            strokeDasharray={j === 0 ? undefined : j === 1 ? '6 3' : '2 3'}
            isAnimationActive={false}
          />
        ))}
      </LineChart>
    </Frame>
  );
}
