import { createTheme } from '@mui/material/styles';
import type {} from '@mui/x-data-grid/themeAugmentation';
import { dataDisplayCustomizations } from './customizations/data-display';
import { dataGridCustomizations } from './customizations/data-grid';
import { feedbackCustomizations } from './customizations/feedback';
import { inputsCustomizations } from './customizations/inputs';
import { navigationCustomizations } from './customizations/navigation';
import { surfacesCustomizations } from './customizations/surfaces';
import { granite, ochre, radius, slate, status } from './tokens';

const fontFamily = '"Roboto", "Helvetica Neue", Arial, sans-serif';

export const theme = createTheme({
  palette: {
    mode: 'light',
    primary: { main: slate[800], dark: slate[900], light: slate[600], contrastText: granite[0] },
    secondary: { main: ochre[500], dark: ochre[700], light: ochre[300], contrastText: granite[900] },
    success: { main: status.success, contrastText: granite[0] },
    warning: { main: status.warning, contrastText: granite[0] },
    error: { main: status.error, contrastText: granite[0] },
    info: { main: status.info, contrastText: granite[0] },
    text: { primary: granite[900], secondary: granite[700], disabled: granite[500] },
    background: { default: granite[50], paper: granite[0] },
    divider: granite[300],
    DataGrid: { headerBg: granite[100] },
    action: { hover: 'rgba(15, 76, 92, 0.06)', selected: 'rgba(15, 76, 92, 0.10)' },
  },
  shape: { borderRadius: radius },
  spacing: 8,
  // A visible ring for keyboard users; pointer clicks leave no ring.
  focusVisible: { outlineColor: ochre[600], outlineWidth: 3, outlineOffset: 2 },
  typography: {
    fontFamily,
    htmlFontSize: 16,
    h1: { fontSize: '1.75rem', fontWeight: 500, lineHeight: 1.25, letterSpacing: '-0.01em' },
    h2: { fontSize: '1.375rem', fontWeight: 500, lineHeight: 1.3, letterSpacing: '-0.005em' },
    h3: { fontSize: '1.125rem', fontWeight: 500, lineHeight: 1.35 },
    h4: { fontSize: '1rem', fontWeight: 700, lineHeight: 1.4 },
    h5: { fontSize: '0.9375rem', fontWeight: 700, lineHeight: 1.4 },
    h6: { fontSize: '0.875rem', fontWeight: 700, lineHeight: 1.4 },
    subtitle1: { fontSize: '1rem', fontWeight: 500, lineHeight: 1.45 },
    subtitle2: { fontSize: '0.875rem', fontWeight: 500, lineHeight: 1.45 },
    body1: { fontSize: '1rem', lineHeight: 1.55 },
    body2: { fontSize: '0.875rem', lineHeight: 1.5 },
    button: { fontSize: '0.9375rem', fontWeight: 500, textTransform: 'none', letterSpacing: '0.01em' },
    caption: { fontSize: '0.8125rem', lineHeight: 1.4 },
    overline: { fontSize: '0.75rem', fontWeight: 700, letterSpacing: '0.08em', lineHeight: 1.6 },
  },
  components: {
    MuiCssBaseline: {
      styleOverrides: {
        body: { WebkitFontSmoothing: 'antialiased' },
        // Figures line up in columns wherever numbers appear.
        'table, .MuiDataGrid-root': { fontVariantNumeric: 'tabular-nums' },
      },
    },
    ...inputsCustomizations,
    ...navigationCustomizations,
    ...surfacesCustomizations,
    ...feedbackCustomizations,
    ...dataDisplayCustomizations,
    ...dataGridCustomizations,
  },
});
