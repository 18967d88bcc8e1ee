import type { ReactNode } from 'react';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { granite, monoFontFamily, ochre, slate, status } from '../../../../theme/tokens';
import { placedCircles, placedPoints, planExtent, tickStep, ticks, type DraftPlan } from './plan-geometry';

const WIDTH = 560;
const HEIGHT = 420;
const PAD = { left: 56, right: 16, top: 16, bottom: 40 };

interface PlanDrawingProps {
  plan: DraftPlan;
  /** Unit symbol of the coordinates, e.g. "in". */
  unit: string;
}

function decimalsFor(step: number): number {
  return Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
}

/**
 * The face seen from above: top-face stations as filled dots, datum-face stations as open squares,
 * runout circles as dashed circles with their positions as rings; y points up, one scale on both axes.
 */
export function PlanDrawing({ plan, unit }: PlanDrawingProps) {
  const stations = placedPoints(plan.stations);
  const datum = placedPoints(plan.datumStations);
  const circles = placedCircles(plan.runoutCircles);
  const extent = planExtent([...stations, ...datum], circles);
  const plotW = WIDTH - PAD.left - PAD.right;
  const plotH = HEIGHT - PAD.top - PAD.bottom;
  const scale = Math.min(plotW / (extent.maxX - extent.minX), plotH / (extent.maxY - extent.minY));
  // Centre the drawing in the plot area, keeping one scale for x and y.
  const offsetX = PAD.left + (plotW - (extent.maxX - extent.minX) * scale) / 2;
  const offsetY = PAD.top + (plotH - (extent.maxY - extent.minY) * scale) / 2;
  const px = (x: number) => offsetX + (x - extent.minX) * scale;
  const py = (y: number) => offsetY + (extent.maxY - y) * scale;
  const step = tickStep(Math.max(extent.maxX - extent.minX, extent.maxY - extent.minY));
  const decimals = decimalsFor(step);
  const xTicks = ticks(extent.minX, extent.maxX, step);
  const yTicks = ticks(extent.minY, extent.maxY, step);
  const [left, right, top, bottom] = [px(extent.minX), px(extent.maxX), py(extent.maxY), py(extent.minY)];
  const summary = `Measurement plan: ${stations.length} top-face station${stations.length === 1 ? '' : 's'}, ${datum.length} datum station${datum.length === 1 ? '' : 's'}, ${circles.length} runout circle${circles.length === 1 ? '' : 's'}.`;
  const empty = stations.length + datum.length + circles.length === 0;

  return (
    <Stack spacing={1}>
      <Box
        component="svg"
        viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
        role="img"
        aria-label={summary}
        sx={{
          width: '100%',
          height: 'auto',
          display: 'block',
          bgcolor: 'background.paper',
          fontFamily: monoFontFamily,
        }}
      >
        <rect x={left} y={top} width={right - left} height={bottom - top} fill={granite[50]} stroke={granite[300]} />
        {xTicks.map((t) => (
          <g key={`x${t}`}>
            <line x1={px(t)} x2={px(t)} y1={top} y2={bottom} stroke={granite[200]} />
            <line x1={px(t)} x2={px(t)} y1={bottom} y2={bottom + 5} stroke={granite[700]} />
            <text x={px(t)} y={bottom + 18} fontSize={11} textAnchor="middle" fill={granite[700]}>
              {t.toFixed(decimals)}
            </text>
          </g>
        ))}
        {yTicks.map((t) => (
          <g key={`y${t}`}>
            <line x1={left} x2={right} y1={py(t)} y2={py(t)} stroke={granite[200]} />
            <line x1={left - 5} x2={left} y1={py(t)} y2={py(t)} stroke={granite[700]} />
            <text x={left - 8} y={py(t) + 4} fontSize={11} textAnchor="end" fill={granite[700]}>
              {t.toFixed(decimals)}
            </text>
          </g>
        ))}
        <text x={right} y={HEIGHT - 4} fontSize={11} textAnchor="end" fill={granite[700]}>
          x ({unit})
        </text>
        <text x={4} y={top + 10} fontSize={11} fill={granite[700]}>
          y ({unit})
        </text>
        {/* The part's axis: the centre of the runout circles. */}
        <g data-kind="axis" stroke={slate[600]} strokeWidth={1}>
          <line x1={px(0) - 8} x2={px(0) + 8} y1={py(0)} y2={py(0)} />
          <line x1={px(0)} x2={px(0)} y1={py(0) - 8} y2={py(0) + 8} />
        </g>
        {circles.map((circle, index) => (
          <g key={`c${index}`} data-kind="runout-circle" aria-label={`Runout circle ${circle.name}`}>
            <circle
              cx={px(0)}
              cy={py(0)}
              r={circle.radius * scale}
              fill="none"
              stroke={status.info}
              strokeWidth={1.5}
              strokeDasharray="6 4"
            />
            {circle.positions.map((p, k) => (
              <circle
                key={k}
                data-kind="runout-position"
                cx={px(p.x)}
                cy={py(p.y)}
                r={3.5}
                fill={granite[0]}
                stroke={status.info}
                strokeWidth={1.5}
              />
            ))}
            {/* The name sits just above the circle's top, beside its 90° position. */}
            <text x={px(0) + 8} y={py(0) - circle.radius * scale - 8} fontSize={12} fill={status.info}>
              {circle.name}
            </text>
          </g>
        ))}
        {datum.map((p, index) => (
          <g key={`d${index}`} data-kind="datum-station">
            <rect
              x={px(p.x) - 5}
              y={py(p.y) - 5}
              width={10}
              height={10}
              fill={granite[0]}
              stroke={ochre[700]}
              strokeWidth={2}
            />
            <text x={px(p.x) + 9} y={py(p.y) + 16} fontSize={12} fill={ochre[700]}>
              {p.name}
            </text>
          </g>
        ))}
        {stations.map((p, index) => (
          <g key={`s${index}`} data-kind="station">
            <circle cx={px(p.x)} cy={py(p.y)} r={5.5} fill={slate[800]} />
            <text x={px(p.x) + 9} y={py(p.y) - 8} fontSize={13} fontWeight={500} fill={slate[900]}>
              {p.name}
            </text>
          </g>
        ))}
        {empty ? (
          <text x={(left + right) / 2} y={(top + bottom) / 2} textAnchor="middle" fontSize={14} fill={granite[700]}>
            Add stations to see them here
          </text>
        ) : null}
      </Box>
      <Stack direction="row" spacing={2.5} sx={{ flexWrap: 'wrap', color: 'text.secondary' }} aria-hidden="true">
        <Legend symbol={<circle cx={8} cy={8} r={5} fill={slate[800]} />} label="Top-face station" />
        <Legend
          symbol={<rect x={3} y={3} width={10} height={10} fill={granite[0]} stroke={ochre[700]} strokeWidth={2} />}
          label="Datum-face station"
        />
        <Legend
          symbol={<circle cx={8} cy={8} r={4} fill={granite[0]} stroke={status.info} strokeWidth={1.5} />}
          label="Runout position"
        />
        <Legend
          symbol={
            <g stroke={slate[600]}>
              <line x1={2} x2={14} y1={8} y2={8} />
              <line x1={8} x2={8} y1={2} y2={14} />
            </g>
          }
          label="Part axis (0, 0)"
        />
      </Stack>
    </Stack>
  );
}

function Legend({ symbol, label }: { symbol: ReactNode; label: string }) {
  return (
    <Stack direction="row" spacing={0.75} sx={{ alignItems: 'center' }}>
      <svg width={16} height={16} viewBox="0 0 16 16">
        {symbol}
      </svg>
      <Typography variant="caption">{label}</Typography>
    </Stack>
  );
}
