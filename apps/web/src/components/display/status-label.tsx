import type { SvgIconComponent } from '@mui/icons-material';
import Stack from '@mui/material/Stack';

export type StatusTone = 'success' | 'warning' | 'error' | 'info' | 'neutral';

const TONE_COLOR: Record<StatusTone, string> = {
  success: 'success.main',
  warning: 'warning.main',
  error: 'error.main',
  info: 'info.main',
  neutral: 'text.secondary',
};

/** A state as a word and an icon together, so it never rests on colour alone (colours pass AA). */
export function StatusLabel({ icon: Icon, label, tone }: { icon: SvgIconComponent; label: string; tone: StatusTone }) {
  return (
    <Stack
      component="span"
      direction="row"
      spacing={0.75}
      sx={{ alignItems: 'center', height: '100%', color: TONE_COLOR[tone], fontWeight: 500 }}
    >
      <Icon fontSize="small" aria-hidden="true" />
      <span>{label}</span>
    </Stack>
  );
}
