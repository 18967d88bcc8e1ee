import Alert, { type AlertColor } from '@mui/material/Alert';
import Snackbar from '@mui/material/Snackbar';
import { createContext, useCallback, useContext, useState, type ReactNode } from 'react';

interface Notice {
  key: number;
  message: string;
  severity: AlertColor;
}

type Notify = (message: string, severity?: AlertColor) => void;

const NotifyContext = createContext<Notify | null>(null);

/** Results of finished actions ("Ana Ruiz was added."), one at a time at the bottom of the screen. */
export function NotificationsProvider({ children }: { children: ReactNode }) {
  const [notice, setNotice] = useState<Notice | null>(null);
  const [open, setOpen] = useState(false);

  const notify = useCallback<Notify>((message, severity = 'success') => {
    setNotice({ key: Date.now(), message, severity });
    setOpen(true);
  }, []);

  return (
    <NotifyContext.Provider value={notify}>
      {children}
      <Snackbar
        key={notice?.key}
        open={open}
        // Problems stay up longer: they take longer to read and act on.
        autoHideDuration={notice?.severity === 'success' ? 5000 : 10000}
        onClose={(_, reason) => {
          if (reason !== 'clickaway') setOpen(false);
        }}
        anchorOrigin={{ vertical: 'bottom', horizontal: 'center' }}
      >
        <Alert
          variant="filled"
          severity={notice?.severity ?? 'success'}
          role={notice?.severity === 'success' ? 'status' : 'alert'}
          onClose={() => setOpen(false)}
          sx={{ minWidth: 320, boxShadow: 6 }}
        >
          {notice?.message}
        </Alert>
      </Snackbar>
    </NotifyContext.Provider>
  );
}

export function useNotify(): Notify {
  const notify = useContext(NotifyContext);
  if (!notify) throw new Error('useNotify must be used inside <NotificationsProvider>.');
  return notify;
}
