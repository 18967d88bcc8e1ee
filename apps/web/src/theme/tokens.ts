/**
 * Evenset's own colours: a deep slate-teal for structure, a warm ochre for the one accent
 * (the level line), and granite greys for surfaces. Text colours are chosen for at least
 * WCAG AA contrast on both white and the granite background, for tablets in bright light.
 */
export const slate = {
  950: '#08252D',
  900: '#0B3640',
  800: '#0F4C5C',
  600: '#2D6B7A',
  200: '#BFD6DB',
  100: '#DDEBEE',
  50: '#EEF5F6',
} as const;

export const ochre = {
  700: '#8A5A0B',
  /** The focus ring: at least 3:1 against both white and the slate top bar (WCAG 2.4.13). */
  600: '#A86E12',
  500: '#C98A1E',
  300: '#E4B866',
} as const;

export const granite = {
  900: '#172226',
  700: '#3F4B50',
  500: '#6B777B',
  300: '#C9CFCC',
  200: '#DCE0DD',
  100: '#EBEDEA',
  50: '#F4F5F2',
  0: '#FFFFFF',
} as const;

/** Status hues, each ≥ 4.5:1 against white as text and as a fill behind white text. */
export const status = {
  success: '#1B6B3F',
  warning: '#8A5300',
  error: '#B3261E',
  info: '#1D5B85',
} as const;

export const radius = 6;

/** Figures that must line up in columns: lengths, coefficients, positions. */
export const monoFontFamily = '"Roboto Mono", ui-monospace, "SFMono-Regular", Menlo, monospace';
