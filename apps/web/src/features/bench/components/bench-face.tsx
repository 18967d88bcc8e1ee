import Box from '@mui/material/Box';
import { planExtent } from '../../specs/components/plan-drawing/plan-geometry';
import { granite, monoFontFamily, ochre, slate } from '../../../theme/tokens';
import type { BenchStation } from '../bench-stations';

const W = 420;
const H = 300;
const PAD = 28;

/** The face seen from above: stations done (filled), the current one (large ochre ring), the rest (open). */
export function BenchFace({ stations, current }: { stations: readonly BenchStation[]; current: number }) {
  const extent = planExtent(stations, []);
  const scale = Math.min((W - 2 * PAD) / (extent.maxX - extent.minX), (H - 2 * PAD) / (extent.maxY - extent.minY));
  const ox = W / 2 - ((extent.minX + extent.maxX) / 2) * scale;
  const oy = H / 2 + ((extent.minY + extent.maxY) / 2) * scale;
  const circles = [...new Set(stations.flatMap((s) => (s.circle ? [s.circle] : [])))];
  const now = stations[current];
  return (
    <Box
      component="svg"
      viewBox={`0 0 ${W} ${H}`}
      role="img"
      aria-label={now ? `Face drawing, current station ${now.name}` : 'Face drawing, every station read'}
      sx={{ width: '100%', height: 'auto', display: 'block', fontFamily: monoFontFamily }}
    >
      <rect x={4} y={4} width={W - 8} height={H - 8} rx={8} fill={granite[50]} stroke={granite[300]} />
      {circles.map((name) => {
        const first = stations.find((s) => s.circle === name);
        const r = first ? Math.hypot(first.x, first.y) * scale : 0;
        return <circle key={name} cx={ox} cy={oy} r={r} fill="none" stroke={granite[500]} strokeDasharray="6 4" />;
      })}
      {stations.map((s, i) => {
        const [x, y] = [ox + s.x * scale, oy - s.y * scale];
        const state = i < current ? 'done' : i === current ? 'current' : 'todo';
        const label = s.kind === 'runout' ? (s.name.split(':')[1] ?? s.name) : s.name;
        // Runout positions are labelled outside their circle, face stations inside, so names never collide.
        const away = Math.hypot(s.x, s.y) || 1;
        const push = (s.kind === 'runout' ? 26 : -26) / away;
        const [lx, ly] = [x + s.x * push, y - s.y * push + 5];
        return (
          <g key={s.name} data-state={state}>
            {state === 'current' ? (
              <circle cx={x} cy={y} r={20} fill="none" stroke={ochre[600]} strokeWidth={4} />
            ) : null}
            <circle
              cx={x}
              cy={y}
              r={state === 'current' ? 12 : 9}
              fill={state === 'todo' ? granite[0] : state === 'current' ? ochre[500] : slate[800]}
              stroke={s.kind === 'datum' ? ochre[700] : slate[800]}
              strokeWidth={2}
            />
            <text
              x={lx}
              y={ly}
              textAnchor="middle"
              fontSize={state === 'current' ? 18 : 13}
              fontWeight={state === 'current' ? 700 : 500}
              fill={s.kind === 'runout' ? granite[700] : granite[900]}
            >
              {label}
            </text>
          </g>
        );
      })}
    </Box>
  );
}
