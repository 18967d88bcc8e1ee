import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, Navigate, useSearchParams } from 'react-router-dom';
import { EvensetMark } from '../../components/layouts/evenset-mark';
import { PageLoading } from '../../components/page-loading';
import { useRenderMark } from '../../components/use-render-mark';
import { paths } from '../../config/paths';
import { MatchedSetArt } from '../../features/auth/components/matched-set-art';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { useAuth } from '../../features/auth/hooks/use-auth';
import { granite, ochre, slate } from '../../theme/tokens';

/** Only paths inside this app: a crafted link must not bounce people to another site after sign-in. */
function safeNext(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') && !next.startsWith('/\\')
    ? next
    : paths.home.getHref();
}

export function SignInRoute() {
  const { state } = useAuth();
  const [params] = useSearchParams();
  useRenderMark('sign-in', state.status === 'signed-out');
  if (state.status === 'signed-in') return <Navigate to={safeNext(params.get('next'))} replace />;
  if (state.status === 'loading') return <PageLoading label="Checking your sign-in…" />;

  return (
    <Box
      sx={{
        minHeight: '100dvh',
        display: 'grid',
        gridTemplateColumns: { xs: '1fr', md: 'minmax(360px, 5fr) 7fr' },
        gridTemplateRows: { xs: 'auto 1fr', md: '1fr' },
      }}
    >
      <title>Sign in — Evenset</title>
      <Stack
        component="header"
        sx={{
          bgcolor: slate[900],
          color: granite[0],
          borderBottom: { xs: `3px solid ${ochre[500]}`, md: 'none' },
          borderRight: { md: `3px solid ${ochre[500]}` },
          px: { xs: 3, md: 6 },
          py: { xs: 3, md: 6 },
          gap: { xs: 1.5, md: 4 },
          justifyContent: 'space-between',
        }}
      >
        <Stack direction="row" spacing={1.5} sx={{ alignItems: 'center' }}>
          <EvensetMark size={40} sx={{ outline: `1px solid ${slate[600]}`, borderRadius: '8px' }} />
          <Typography component="p" sx={{ fontSize: '1.625rem', fontWeight: 700, letterSpacing: '0.01em' }}>
            Evenset
          </Typography>
        </Stack>
        <Typography
          component="p"
          sx={{
            color: slate[100],
            fontSize: { xs: '1rem', md: '1.625rem' },
            fontWeight: { md: 500 },
            lineHeight: 1.35,
            maxWidth: { md: '22ch' },
          }}
        >
          Every reading kept, every set matched, every certificate checkable.
        </Typography>
        <Box sx={{ display: { xs: 'none', md: 'block' } }}>
          <MatchedSetArt />
        </Box>
      </Stack>

      <Box
        component="main"
        sx={{
          display: 'flex',
          alignItems: { xs: 'flex-start', md: 'center' },
          justifyContent: 'center',
          px: 2,
          py: { xs: 3, md: 8 },
        }}
      >
        <Paper variant="outlined" sx={{ width: '100%', maxWidth: 420, p: { xs: 3, sm: 4 } }}>
          <Typography variant="h1" sx={{ mb: 0.5 }}>
            Sign in
          </Typography>
          <Typography sx={{ color: 'text.secondary', mb: 3 }}>Use your work e-mail address.</Typography>
          <SignInForm />
          <Typography variant="body2" sx={{ mt: 3 }}>
            <Link component={RouterLink} to={paths.forgotPassword.getHref()}>
              Forgot your password?
            </Link>
          </Typography>
        </Paper>
      </Box>
    </Box>
  );
}
