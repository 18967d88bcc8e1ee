import CssBaseline from '@mui/material/CssBaseline';
import { ThemeProvider } from '@mui/material/styles';
import type { ReactNode } from 'react';
import { SWRConfig } from 'swr';
import { RootErrorBoundary } from '../components/errors/root-error-boundary';
import { NotificationsProvider } from '../components/feedback/notifications';
import { AuthProvider } from '../features/auth/components/auth-provider';
import { swrConfig } from '../lib/swr';
import { theme } from '../theme/theme';

export function AppProvider({ children }: { children: ReactNode }) {
  return (
    <ThemeProvider theme={theme}>
      <CssBaseline />
      <RootErrorBoundary>
        <SWRConfig value={swrConfig}>
          <NotificationsProvider>
            <AuthProvider>{children}</AuthProvider>
          </NotificationsProvider>
        </SWRConfig>
      </RootErrorBoundary>
    </ThemeProvider>
  );
}
