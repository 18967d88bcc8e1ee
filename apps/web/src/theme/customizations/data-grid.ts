import type { Components, Theme } from '@mui/material/styles';
import type {} from '@mui/x-data-grid/themeAugmentation';
import { granite, monoFontFamily, slate } from '../tokens';

export const dataGridCustomizations: Components<Theme> = {
  MuiDataGrid: {
    styleOverrides: {
      root: { backgroundColor: granite[0], borderColor: granite[200] },
      columnHeaderTitle: { fontWeight: 700, color: granite[900] },
      row: { '&:hover': { backgroundColor: slate[50] } },
      // Columns of lengths and other figures (see lengthColumn): monospaced, aligned on the point.
      cell: { '&.figures': { fontFamily: monoFontFamily, fontVariantNumeric: 'tabular-nums' } },
      // On narrow screens the search takes its own line above the buttons.
      toolbar: {
        flex: '0 0 auto',
        minHeight: 64,
        paddingInline: 12,
        paddingBlock: 8,
        gap: 8,
        flexWrap: 'wrap',
        borderBottomColor: granite[200],
      },
    },
  },
};
