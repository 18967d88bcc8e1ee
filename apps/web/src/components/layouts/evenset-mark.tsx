import Box from '@mui/material/Box';
import type { SxProps, Theme } from '@mui/material/styles';
import { granite, ochre, slate } from '../../theme/tokens';

interface EvensetMarkProps {
  size?: number;
  sx?: SxProps<Theme>;
}

/** Evenset's mark: a level bar resting on two blocks of equal height, on the surface plate. */
export function EvensetMark({ size = 32, sx }: EvensetMarkProps) {
  return (
    <Box
      component="svg"
      viewBox="0 0 32 32"
      width={size}
      height={size}
      aria-hidden="true"
      sx={{ flexShrink: 0, ...sx }}
    >
      <rect width="32" height="32" rx="7" fill={slate[800]} />
      <rect x="5" y="8" width="22" height="4" rx="1" fill={ochre[500]} />
      <rect x="7" y="13.5" width="7" height="10.5" rx="0.75" fill={granite[50]} />
      <rect x="18" y="13.5" width="7" height="10.5" rx="0.75" fill={granite[50]} />
      <rect x="4" y="25.5" width="24" height="1.75" rx="0.5" fill={slate[200]} />
    </Box>
  );
}
