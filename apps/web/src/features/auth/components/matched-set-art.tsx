import Box from '@mui/material/Box';
import { ochre, slate } from '../../../theme/tokens';

const BLOCKS = [24, 118, 212, 306];

/** Decoration for the sign-in page: a matched set of four blocks on the plate, one level line across. */
export function MatchedSetArt() {
  return (
    <Box
      component="svg"
      viewBox="0 0 400 210"
      aria-hidden="true"
      sx={{ width: '100%', maxWidth: 440, display: 'block' }}
    >
      {BLOCKS.map((x) => (
        <rect
          key={x}
          x={x}
          y={72}
          width={70}
          height={118}
          rx={3}
          fill={slate[950]}
          stroke={slate[600]}
          strokeWidth={2}
        />
      ))}
      <rect x={8} y={62} width={384} height={6} rx={2} fill={ochre[500]} />
      <rect x={0} y={190} width={400} height={12} rx={2} fill={slate[800]} />
      <path
        d="M392 76 V186 M388 80 L392 74 L396 80 M388 182 L392 188 L396 182"
        stroke={slate[200]}
        strokeWidth={1.5}
        fill="none"
      />
    </Box>
  );
}
