import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

export interface DetailItem {
  label: string;
  value: ReactNode;
}

/** Label and value pairs, in as many columns as the width allows. */
export function DetailList({ items }: { items: readonly DetailItem[] }) {
  return (
    <Box
      component="dl"
      sx={{
        display: 'grid',
        gridTemplateColumns: 'repeat(auto-fill, minmax(220px, 1fr))',
        columnGap: 3,
        rowGap: 2,
        m: 0,
      }}
    >
      {items.map((item) => (
        <div key={item.label}>
          <Typography component="dt" variant="caption" sx={{ color: 'text.secondary', display: 'block' }}>
            {item.label}
          </Typography>
          <Typography component="dd" sx={{ m: 0 }}>
            {item.value}
          </Typography>
        </div>
      ))}
    </Box>
  );
}
