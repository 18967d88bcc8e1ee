import Box from '@mui/material/Box';
import type { ReactNode } from 'react';

/** Form fields side by side, as many per line as the width allows. */
export function FieldGrid({ children, min = 200 }: { children: ReactNode; min?: number }) {
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: `repeat(auto-fill, minmax(${min}px, 1fr))`, gap: 2 }}>
      {children}
    </Box>
  );
}
