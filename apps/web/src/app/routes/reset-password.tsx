import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { paths } from '../../config/paths';
import { PublicPage } from '../../features/auth/components/public-page';
import { ResetPasswordForm } from '../../features/auth/components/reset-password-form';

export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const [done, setDone] = useState(false);

  return (
    <PublicPage title="Choose a new password" intro="The link from your e-mail works once, for 30 minutes.">
      {done ? (
        <Alert severity="success" role="status">
          Your password is changed, and any other sign-ins of yours have ended. Sign in with the new password.
        </Alert>
      ) : token ? (
        <ResetPasswordForm token={token} onDone={() => setDone(true)} />
      ) : (
        <Alert severity="error">
          This page needs the link from your e-mail. Open the link again, or ask for a new one.
        </Alert>
      )}
      <Typography variant="body2" sx={{ mt: 3, display: 'flex', gap: 2, flexWrap: 'wrap' }}>
        <Link component={RouterLink} to={paths.signIn.getHref()}>
          Go to sign in
        </Link>
        {done ? null : (
          <Link component={RouterLink} to={paths.forgotPassword.getHref()}>
            Ask for a new link
          </Link>
        )}
      </Typography>
    </PublicPage>
  );
}
