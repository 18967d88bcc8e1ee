import type { Components, Theme } from '@mui/material/styles';
import { granite, ochre, radius, slate } from '../tokens';

export const navigationCustomizations: Components<Theme> = {
  MuiAppBar: {
    defaultProps: { elevation: 0, color: 'primary' },
    styleOverrides: {
      // The ochre rule under the bar is Evenset's "level line".
      root: { backgroundColor: slate[900], borderBottom: `3px solid ${ochre[500]}` },
    },
  },
  MuiDrawer: {
    styleOverrides: {
      paper: { backgroundColor: granite[0], borderRight: `1px solid ${granite[200]}` },
    },
  },
  MuiListItemButton: {
    styleOverrides: {
      root: {
        minHeight: 48,
        borderRadius: radius,
        marginInline: 8,
        marginBlock: 2,
        color: granite[900],
        '&.Mui-selected': {
          backgroundColor: slate[100],
          color: slate[900],
          fontWeight: 500,
          boxShadow: `inset 4px 0 0 ${ochre[500]}`,
          '&:hover': { backgroundColor: slate[200] },
        },
      },
    },
  },
  MuiListItemIcon: {
    styleOverrides: { root: { minWidth: 40, color: 'inherit' } },
  },
  MuiMenuItem: {
    styleOverrides: { root: { minHeight: 44, '@media (pointer: coarse)': { minHeight: 48 } } },
  },
  MuiLink: {
    defaultProps: { underline: 'always' },
    styleOverrides: { root: { textUnderlineOffset: '0.2em', fontWeight: 500 } },
  },
};
