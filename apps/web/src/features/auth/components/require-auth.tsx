import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { PageLoading } from '../../../components/page-loading';
import { paths } from '../../../config/paths';
import { useAuth } from '../hooks/use-auth';
import { SessionUnavailable } from './session-unavailable';

/** Lets signed-in people through; sends everyone else to sign in, remembering where they were going. */
export function RequireAuth({ children }: { children: ReactNode }) {
  const { state, retry } = useAuth();
  const location = useLocation();
  switch (state.status) {
    case 'signed-in':
      return children;
    case 'loading':
      return <PageLoading label="Checking your sign-in…" />;
    case 'unavailable':
      return <SessionUnavailable error={state.error} onRetry={retry} />;
    case 'signed-out': {
      const wanted = `${location.pathname}${location.search}${location.hash}`;
      const next = state.byChoice || wanted === paths.home.getHref() ? undefined : wanted;
      return <Navigate to={paths.signIn.getHref(next)} replace />;
    }
  }
}
