import type { Components, Theme } from '@mui/material/styles';
import { granite } from '../tokens';

export const surfacesCustomizations: Components<Theme> = {
  MuiPaper: {
    styleOverrides: {
      root: { backgroundImage: 'none' },
      outlined: { borderColor: granite[200] },
    },
  },
  MuiCard: {
    defaultProps: { variant: 'outlined' },
  },
  MuiDialogTitle: {
    styleOverrides: { root: { fontSize: '1.25rem', fontWeight: 500, paddingBlock: 20 } },
  },
  MuiDialogActions: {
    styleOverrides: { root: { paddingInline: 24, paddingBlock: 16, gap: 8 } },
  },
};
