import type { DisplayUnit, ReplacementCheck } from '@evenset/contracts';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { granite, monoFontFamily, ochre, slate, status } from '../../../theme/tokens';
import { formatHeight } from '../../sets/set-format';

const WIDTH = 860;
const LEFT = 150;
const RIGHT = 24;
const ROWS = { band: 28, set: 70, fits: 102, grind: 134 } as const;

/**
 * One horizontal height axis: the spec's tolerance band, the heights that match the set, the
 * replacement window (both at once) with its centre, the set's own heights, and the candidates —
 * fitting parts as circles, parts to grind as triangles. Every row is named in words.
 */
export function ReplacementWindowDrawing({ check, unit }: { check: ReplacementCheck; unit: DisplayUnit }) {
  const { tolerance, setWindow, window, centre, set, fits, grindable } = check;
  const heights = set.members.map((m) => m.height);
  const values = [
    tolerance.low,
    tolerance.high,
    ...heights,
    ...(setWindow ? [setWindow.low, setWindow.high] : []),
    ...fits.map((p) => p.height),
    ...grindable.slice(0, 12).map((p) => p.height),
  ];
  const low = Math.min(...values);
  const high = Math.max(...values);
  const margin = Math.max((high - low) * 0.06, 1e-6);
  const x = (mm: number) => LEFT + ((mm - (low - margin)) / (high - low + 2 * margin)) * (WIDTH - LEFT - RIGHT);
  const show = (mm: number) => formatHeight(mm, unit);
  const label = (y: number, text: string) => (
    <text x={8} y={y + 4} fontSize={12} fill={granite[700]}>
      {text}
    </text>
  );
  const summary = window
    ? `Replacement window ${show(window.low)} to ${show(window.high)}, centre ${show(centre!)}; the set's heights from ${show(Math.min(...heights))} to ${show(Math.max(...heights))}; ${fits.length} fitting part${fits.length === 1 ? '' : 's'}, ${grindable.length} above the window.`
    : `No replacement window: ${check.explanation}`;

  return (
    <Box sx={{ overflowX: 'auto' }}>
      <svg
        role="img"
        aria-label={summary}
        viewBox={`0 0 ${WIDTH} 166`}
        width="100%"
        style={{ minWidth: 560, fontFamily: monoFontFamily, display: 'block' }}
      >
        <title>{summary}</title>
        <defs>
          <pattern
            id="set-window-hatch"
            width="6"
            height="6"
            patternUnits="userSpaceOnUse"
            patternTransform="rotate(45)"
          >
            <line x1="0" y1="0" x2="0" y2="6" stroke={slate[600]} strokeWidth="1.5" />
          </pattern>
        </defs>
        {label(ROWS.band, 'Tolerance band')}
        <rect
          x={x(tolerance.low)}
          y={ROWS.band - 10}
          width={x(tolerance.high) - x(tolerance.low)}
          height={20}
          fill={granite[100]}
          stroke={granite[500]}
        />
        {setWindow ? (
          <rect
            x={x(setWindow.low)}
            y={ROWS.band - 6}
            width={x(setWindow.high) - x(setWindow.low)}
            height={12}
            fill="url(#set-window-hatch)"
            opacity={0.55}
          >
            <title>{`Matches the set: ${show(setWindow.low)} to ${show(setWindow.high)}`}</title>
          </rect>
        ) : null}
        {window ? (
          <>
            <rect
              x={x(window.low)}
              y={ROWS.band - 14}
              width={Math.max(2, x(window.high) - x(window.low))}
              height={ROWS.grind - ROWS.band + 28}
              fill={slate[100]}
              opacity={0.6}
              stroke={slate[800]}
              strokeWidth={1.5}
            />
            <line
              x1={x(centre!)}
              x2={x(centre!)}
              y1={ROWS.band - 14}
              y2={ROWS.grind + 14}
              stroke={ochre[600]}
              strokeWidth={2}
              strokeDasharray="5 3"
            />
            <text x={x(centre!)} y={160} fontSize={11} fill={ochre[700]} textAnchor="middle">
              centre {show(centre!)}
            </text>
          </>
        ) : null}
        {label(ROWS.set, `Set ${set.setNumber}`)}
        {set.members.map((m) => (
          <g key={m.partId}>
            <rect
              x={x(m.height) - 5}
              y={ROWS.set - 5}
              width={10}
              height={10}
              fill={slate[900]}
              transform={`rotate(45 ${x(m.height)} ${ROWS.set})`}
            />
            <title>{`${m.serial}: ${show(m.height)}`}</title>
          </g>
        ))}
        {label(ROWS.fits, 'Fitting parts')}
        {fits.map((p) => (
          <circle key={p.id} cx={x(p.height)} cy={ROWS.fits} r={5} fill={status.success}>
            <title>{`${p.serial}: ${show(p.height)}`}</title>
          </circle>
        ))}
        {label(ROWS.grind, 'To grind')}
        {grindable.slice(0, 12).map((p) => (
          <polygon
            key={p.id}
            points={`${x(p.height)},${ROWS.grind + 6} ${x(p.height) - 6},${ROWS.grind - 5} ${x(p.height) + 6},${ROWS.grind - 5}`}
            fill={status.warning}
          >
            <title>{`${p.serial}: ${show(p.height)}, ${show(p.stockToCentre ?? 0)} to grind off`}</title>
          </polygon>
        ))}
      </svg>
      <Typography variant="caption" component="p" sx={{ color: 'text.secondary', mt: 0.5 }}>
        Grey bar: the spec's tolerance band. Hatched: heights that match the set. Framed: the replacement window, dashed
        line at its centre. Diamonds: the set's parts; circles: parts that fit; triangles: parts above the window, to
        grind.
      </Typography>
    </Box>
  );
}
