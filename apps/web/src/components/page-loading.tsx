import Box from '@mui/material/Box';
import CircularProgress from '@mui/material/CircularProgress';
import Typography from '@mui/material/Typography';

/** Shown while a page's code or first data arrives; says what it is waiting for. */
export function PageLoading({ label = 'Loading…' }: { label?: string }) {
  return (
    <Box role="status" sx={{ display: 'flex', flexDirection: 'column', alignItems: 'center', gap: 2, py: 10 }}>
      <CircularProgress aria-hidden="true" />
      <Typography sx={{ color: 'text.secondary' }}>{label}</Typography>
    </Box>
  );
}
