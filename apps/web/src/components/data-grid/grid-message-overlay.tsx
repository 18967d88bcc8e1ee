import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { GridSlotProps } from '@mui/x-data-grid';

declare module '@mui/x-data-grid' {
  interface NoRowsOverlayPropsOverrides {
    title: string;
    hint: string;
    onRetry?: (() => void) | undefined;
  }
}

/** What the grid says when it has no rows: nothing yet, nothing matches, or it could not load. */
export function GridMessageOverlay({ title, hint, onRetry }: GridSlotProps['noRowsOverlay']) {
  return (
    <Stack
      spacing={1}
      role="status"
      sx={{ height: '100%', alignItems: 'center', justifyContent: 'center', textAlign: 'center', px: 3 }}
    >
      <Typography variant="h3" component="p">
        {title}
      </Typography>
      <Typography sx={{ color: 'text.secondary', maxWidth: '52ch' }}>{hint}</Typography>
      {onRetry ? (
        <Button variant="outlined" onClick={onRetry} sx={{ mt: 1 }}>
          Try again
        </Button>
      ) : null}
    </Stack>
  );
}
