import type { DisplayUnit, InspectionResult } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { granite, monoFontFamily, slate } from '../../../theme/tokens';

type Flatness = NonNullable<InspectionResult['flatness']>;

const SIZE = { width: 520, height: 360, pad: 48 };
/** From the zone's lower plane (cool) to its upper plane (warm); both ends keep white labels legible. */
const LOW = [0x0f, 0x4c, 0x5c] as const;
const HIGH = [0xa8, 0x6e, 0x12] as const;

function shade(share: number): string {
  const mix = LOW.map((low, i) => Math.round(low + ((HIGH[i] ?? low) - low) * share));
  return `rgb(${mix.join(',')})`;
}

/**
 * The top face seen from above: each station coloured by its height above the minimum zone's
 * lower plane, the stations touching the zone ringed and listed.
 */
export function FaceMap({ flatness, unit }: { flatness: Flatness; unit: DisplayUnit }) {
  const { deviations, contacts } = flatness;
  const xs = deviations.map((d) => d.x);
  const ys = deviations.map((d) => d.y);
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const span = Math.max(maxX - minX, maxY - minY) || 1;
  const scale = Math.min((SIZE.width - 2 * SIZE.pad) / span, (SIZE.height - 2 * SIZE.pad) / span);
  const cx = SIZE.width / 2 - ((minX + maxX) / 2) * scale;
  const cy = SIZE.height / 2 + ((minY + maxY) / 2) * scale;
  // A zero-flatness face (all points on one plane) is drawn in one colour.
  const top = Math.max(...deviations.map((d) => d.deviation), 1e-9);
  const length = (mm: number) => formatLength(mm, unit, { level: 'fine' });

  return (
    <Stack spacing={1.5}>
      <Box
        component="svg"
        viewBox={`0 0 ${SIZE.width} ${SIZE.height}`}
        role="img"
        aria-label={`Face map: ${deviations.length} stations; the zone touches ${contacts.join(', ')}.`}
        sx={{ width: '100%', maxWidth: 640, height: 'auto', display: 'block', fontFamily: monoFontFamily }}
      >
        <rect
          x={8}
          y={8}
          width={SIZE.width - 16}
          height={SIZE.height - 16}
          rx={6}
          fill={granite[50]}
          stroke={granite[300]}
        />
        {deviations.map((d) => {
          const touching = contacts.includes(d.station);
          const [x, y] = [cx + d.x * scale, cy - d.y * scale];
          return (
            <g key={d.station} data-kind={touching ? 'contact' : 'station'} data-station={d.station}>
              {touching ? (
                <circle
                  cx={x}
                  cy={y}
                  r={20}
                  fill="none"
                  stroke={granite[900]}
                  strokeWidth={2.5}
                  strokeDasharray="4 3"
                />
              ) : null}
              <circle cx={x} cy={y} r={14} fill={shade(d.deviation / top)} />
              <text x={x} y={y + 4} fontSize={11} textAnchor="middle" fill={granite[0]} fontWeight={600}>
                {d.station}
              </text>
            </g>
          );
        })}
      </Box>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Typography variant="caption" sx={{ fontFamily: monoFontFamily }}>
          {length(0)}
        </Typography>
        <Box
          aria-hidden="true"
          sx={{
            width: 160,
            height: 12,
            borderRadius: 1,
            background: `linear-gradient(90deg, ${shade(0)}, ${shade(1)})`,
          }}
        />
        <Typography variant="caption" sx={{ fontFamily: monoFontFamily }}>
          {length(top)}
        </Typography>
        <Typography variant="caption" sx={{ color: 'text.secondary' }}>
          height above the zone&apos;s lower plane
        </Typography>
        <Stack direction="row" spacing={0.75} sx={{ alignItems: 'center' }}>
          <svg width={20} height={20} aria-hidden="true">
            <circle cx={10} cy={10} r={8} fill="none" stroke={slate[900]} strokeWidth={2} strokeDasharray="3 2" />
          </svg>
          <Typography variant="caption">Touches the zone: {contacts.join(', ')}</Typography>
        </Stack>
      </Stack>
    </Stack>
  );
}
