import type { Components, Theme } from '@mui/material/styles';
import { granite } from '../tokens';

export const feedbackCustomizations: Components<Theme> = {
  MuiAlert: {
    styleOverrides: {
      root: { alignItems: 'center', fontSize: '0.9375rem' },
      standard: { border: '1px solid currentColor' },
    },
  },
  MuiTooltip: {
    styleOverrides: {
      tooltip: { backgroundColor: granite[900], fontSize: '0.8125rem', padding: '6px 10px' },
    },
  },
};
