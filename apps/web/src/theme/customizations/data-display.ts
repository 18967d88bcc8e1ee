import type { Components, Theme } from '@mui/material/styles';
import { granite, slate } from '../tokens';

export const dataDisplayCustomizations: Components<Theme> = {
  MuiChip: {
    styleOverrides: {
      // Squarer than MUI's pills: the chips read as labels, not buttons.
      root: {
        borderRadius: 4,
        fontWeight: 500,
        variants: [
          { props: { variant: 'filled', color: 'default' }, style: { backgroundColor: slate[100], color: slate[900] } },
          { props: { variant: 'outlined' }, style: { borderColor: granite[300], backgroundColor: granite[0] } },
        ],
      },
    },
  },
};
