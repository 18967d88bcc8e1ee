import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

interface PageHeaderProps {
  title: string;
  /** The browser tab's name, when the heading is not a good one (e.g. a greeting). */
  documentTitle?: string;
  description?: ReactNode;
  /** The page's main commands, shown on the right on wide screens. */
  actions?: ReactNode;
}

export function PageHeader({ title, documentTitle = title, description, actions }: PageHeaderProps) {
  return (
    <Stack
      direction={{ xs: 'column', sm: 'row' }}
      spacing={2}
      sx={{ alignItems: { xs: 'stretch', sm: 'flex-end' }, justifyContent: 'space-between', mb: 3 }}
    >
      <title>{`${documentTitle} — Evenset`}</title>
      <div>
        <Typography variant="h1">{title}</Typography>
        {description ? (
          <Typography sx={{ color: 'text.secondary', mt: 0.75, maxWidth: '70ch' }}>{description}</Typography>
        ) : null}
      </div>
      {actions ? (
        <Stack direction="row" spacing={1.5} sx={{ flexShrink: 0 }}>
          {actions}
        </Stack>
      ) : null}
    </Stack>
  );
}
