import Box from '@mui/material/Box';
import type { ReactNode } from 'react';
import { monoFontFamily } from '../../theme/tokens';

/** Numbers that are read against each other: monospaced tabular figures. */
export function Figures({ children }: { children: ReactNode }) {
  return (
    <Box component="span" sx={{ fontFamily: monoFontFamily, fontVariantNumeric: 'tabular-nums' }}>
      {children}
    </Box>
  );
}
