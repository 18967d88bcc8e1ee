import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

interface SectionCardProps {
  title: string;
  description?: ReactNode;
  /** Commands of this section, on the right of its title. */
  actions?: ReactNode;
  children: ReactNode;
}

/** One titled part of a detail page or a long form. */
export function SectionCard({ title, description, actions, children }: SectionCardProps) {
  return (
    <Paper component="section" variant="outlined" aria-label={title} sx={{ p: { xs: 2, md: 3 } }}>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'flex-start', justifyContent: 'space-between', mb: 2 }}>
        <div>
          <Typography variant="h2">{title}</Typography>
          {description ? (
            <Typography sx={{ color: 'text.secondary', mt: 0.5, maxWidth: '80ch' }}>{description}</Typography>
          ) : null}
        </div>
        {actions ? (
          <Stack direction="row" spacing={1} sx={{ flexShrink: 0 }}>
            {actions}
          </Stack>
        ) : null}
      </Stack>
      {children}
    </Paper>
  );
}
