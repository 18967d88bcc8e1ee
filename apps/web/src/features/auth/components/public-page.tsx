import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { EvensetMark } from '../../../components/layouts/evenset-mark';
import { granite, ochre, slate } from '../../../theme/tokens';

/** The frame of the pages used before signing in (forgotten password, new password): mark, card. */
export function PublicPage({ title, intro, children }: { title: string; intro: string; children: ReactNode }) {
  return (
    <Box sx={{ minHeight: '100dvh', display: 'grid', gridTemplateRows: 'auto 1fr' }}>
      <title>{`${title} — Evenset`}</title>
      <Stack
        component="header"
        direction="row"
        spacing={1.5}
        sx={{
          alignItems: 'center',
          bgcolor: slate[900],
          color: granite[0],
          borderBottom: `3px solid ${ochre[500]}`,
          px: { xs: 3, md: 6 },
          py: 2.5,
        }}
      >
        <EvensetMark size={36} sx={{ outline: `1px solid ${slate[600]}`, borderRadius: '8px' }} />
        <Typography component="p" sx={{ fontSize: '1.5rem', fontWeight: 700, letterSpacing: '0.01em' }}>
          Evenset
        </Typography>
      </Stack>
      <Box
        component="main"
        sx={{ display: 'flex', justifyContent: 'center', alignItems: 'flex-start', px: 2, py: { xs: 3, md: 8 } }}
      >
        <Paper variant="outlined" sx={{ width: '100%', maxWidth: 440, p: { xs: 3, sm: 4 } }}>
          <Typography variant="h1" sx={{ mb: 0.5 }}>
            {title}
          </Typography>
          <Typography sx={{ color: 'text.secondary', mb: 3 }}>{intro}</Typography>
          {children}
        </Paper>
      </Box>
    </Box>
  );
}
