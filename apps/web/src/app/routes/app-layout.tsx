import { Suspense, useState } from 'react';
import { Outlet } from 'react-router-dom';
import { useNotify } from '../../components/feedback/notifications';
import { AppFrame } from '../../components/layouts/app-frame';
import { PageLoading } from '../../components/page-loading';
import { navigationFor } from '../../config/navigation';
import { useAuth } from '../../features/auth/hooks/use-auth';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { describeError } from '../../lib/errors';

/** The frame of every signed-in page; the page itself loads inside it. */
export function AppLayoutRoute() {
  const user = useSignedInUser();
  const { signOut } = useAuth();
  const notify = useNotify();
  const [signingOut, setSigningOut] = useState(false);

  const handleSignOut = async () => {
    setSigningOut(true);
    try {
      await signOut();
    } catch (error) {
      notify(`You are still signed in. ${describeError(error)}`, 'error');
      setSigningOut(false);
    }
  };

  return (
    <AppFrame
      user={user}
      items={navigationFor(user.roles)}
      onSignOut={() => void handleSignOut()}
      signingOut={signingOut}
    >
      <Suspense fallback={<PageLoading />}>
        <Outlet />
      </Suspense>
    </AppFrame>
  );
}
