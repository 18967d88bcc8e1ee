import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

interface NoticePanelProps {
  icon: ReactNode;
  title: string;
  children: ReactNode;
  /** Buttons or links that say what to do next. */
  actions?: ReactNode;
}

/** A calm, centred message for pages that cannot show their content (errors, no access, not found). */
export function NoticePanel({ icon, title, children, actions }: NoticePanelProps) {
  return (
    <Stack
      role="region"
      aria-label={title}
      spacing={2}
      sx={{ alignItems: 'center', textAlign: 'center', maxWidth: 560, mx: 'auto', py: { xs: 6, md: 10 }, px: 3 }}
    >
      <title>{`${title} — Evenset`}</title>
      <Box sx={{ color: 'primary.main', '& svg': { fontSize: 48 } }}>{icon}</Box>
      <Typography variant="h1" component="h1">
        {title}
      </Typography>
      <Typography component="div" sx={{ color: 'text.secondary' }}>
        {children}
      </Typography>
      {actions ? (
        <Stack direction="row" spacing={1.5} sx={{ pt: 1, flexWrap: 'wrap', justifyContent: 'center' }}>
          {actions}
        </Stack>
      ) : null}
    </Stack>
  );
}
