import type { Components, Theme } from '@mui/material/styles';
import { granite, slate, status } from '../tokens';

// Fingers and gloves on tablets get 48 px targets; a mouse gets a denser 40 px.
const coarsePointer = '@media (pointer: coarse)';

const busy = (backgroundColor: string) => ({ '&.Mui-disabled': { backgroundColor } });

export const inputsCustomizations: Components<Theme> = {
  MuiButton: {
    defaultProps: { disableElevation: true },
    styleOverrides: {
      root: {
        minHeight: 40,
        paddingInline: 18,
        whiteSpace: 'nowrap',
        [coarsePointer]: { minHeight: 48 },
        // A busy button keeps its colour, so it reads "working on it", not "unavailable".
        variants: [
          { props: { loading: true, variant: 'contained', color: 'primary' }, style: busy(slate[800]) },
          { props: { loading: true, variant: 'contained', color: 'error' }, style: busy(status.error) },
          {
            props: { loading: true, variant: 'outlined', color: 'inherit' },
            style: { '&.Mui-disabled': { color: 'inherit', borderColor: 'currentColor' } },
          },
        ],
      },
      loadingIndicator: { variants: [{ props: { variant: 'contained' }, style: { color: granite[0] } }] },
      sizeLarge: { minHeight: 48, fontSize: '1rem', paddingInline: 24 },
      sizeSmall: { minHeight: 32, paddingInline: 10 },
      outlined: { borderColor: granite[500], '&:hover': { borderColor: slate[800], backgroundColor: slate[50] } },
    },
  },
  MuiIconButton: {
    styleOverrides: {
      sizeMedium: { padding: 12 },
    },
  },
  MuiOutlinedInput: {
    styleOverrides: {
      root: {
        backgroundColor: granite[0],
        // Field edges need 3:1 against the page (WCAG 1.4.11), more than MUI's default grey gives.
        '& .MuiOutlinedInput-notchedOutline': { borderColor: granite[500] },
        '&:hover:not(.Mui-disabled, .Mui-error) .MuiOutlinedInput-notchedOutline': { borderColor: granite[900] },
      },
    },
  },
  MuiInputLabel: {
    styleOverrides: { root: { color: granite[700] } },
  },
  MuiFormHelperText: {
    styleOverrides: { root: { marginInline: 2, fontSize: '0.8125rem' } },
  },
  MuiFormLabel: {
    styleOverrides: { root: { color: granite[900], fontWeight: 500 } },
  },
  MuiCheckbox: {
    styleOverrides: { root: { padding: 12 } },
  },
  MuiFormControlLabel: {
    styleOverrides: { root: { minHeight: 48, marginLeft: -12 } },
  },
};
