import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import type { BaseSyntheticEvent, ReactNode } from 'react';

interface FormDialogProps {
  open: boolean;
  title: string;
  submitLabel: string;
  submitting: boolean;
  /** Refusal that belongs to no single field, e.g. "You cannot deactivate your own account." */
  error?: string | undefined;
  /** Red submit button, for actions that take something away. */
  destructive?: boolean;
  onClose: () => void;
  onSubmit: (event: BaseSyntheticEvent) => void;
  children: ReactNode;
}

/** A dialog that is one form: Cancel and one clear action, progress on the button, problems on top. */
export function FormDialog({
  open,
  title,
  submitLabel,
  submitting,
  error,
  destructive = false,
  onClose,
  onSubmit,
  children,
}: FormDialogProps) {
  const theme = useTheme();
  const fullScreen = useMediaQuery(theme.breakpoints.down('sm'));
  const close = () => {
    // Closing mid-request would hide its result.
    if (!submitting) onClose();
  };
  return (
    <Dialog open={open} onClose={close} fullScreen={fullScreen} fullWidth maxWidth="sm">
      {/* display: contents keeps the dialog's own layout, so long forms scroll between title and buttons. */}
      <Box component="form" noValidate onSubmit={onSubmit} sx={{ display: 'contents' }}>
        <DialogTitle>{title}</DialogTitle>
        <DialogContent>
          <Stack spacing={2.5} sx={{ pt: 1 }}>
            {error ? <Alert severity="error">{error}</Alert> : null}
            {children}
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={close} disabled={submitting}>
            Cancel
          </Button>
          <Button type="submit" variant="contained" color={destructive ? 'error' : 'primary'} loading={submitting}>
            {submitLabel}
          </Button>
        </DialogActions>
      </Box>
    </Dialog>
  );
}
