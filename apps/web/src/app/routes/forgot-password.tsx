import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../config/paths';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';
import { PublicPage } from '../../features/auth/components/public-page';

export function ForgotPasswordRoute() {
  return (
    <PublicPage
      title="Forgotten password"
      intro="Enter the e-mail address you sign in with. If it belongs to an active account, we e-mail you a link to choose a new password."
    >
      <ForgotPasswordForm />
      <Typography variant="body2" sx={{ mt: 3 }}>
        <Link component={RouterLink} to={paths.signIn.getHref()}>
          Back to sign in
        </Link>
      </Typography>
    </PublicPage>
  );
}
