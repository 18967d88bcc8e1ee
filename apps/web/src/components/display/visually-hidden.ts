import type { SxProps, Theme } from '@mui/material/styles';

/** Read by screen readers, not shown: e.g. the name of a column of remove buttons. */
export const visuallyHidden: SxProps<Theme> = {
  position: 'absolute',
  width: '1px',
  height: '1px',
  overflow: 'hidden',
  clip: 'rect(0 0 0 0)',
  whiteSpace: 'nowrap',
  m: '-1px',
  p: 0,
  border: 0,
};
