import ArrowBackOutlined from '@mui/icons-material/ArrowBackOutlined';
import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';

/** The way back from a record's page to its list. */
export function BackLink({ to, label }: { to: string; label: string }) {
  return (
    <Button
      component={RouterLink}
      to={to}
      startIcon={<ArrowBackOutlined />}
      sx={{ mb: 1, alignSelf: 'flex-start', ml: -1 }}
    >
      {label}
    </Button>
  );
}
