import SearchOffOutlined from '@mui/icons-material/SearchOffOutlined';
import Box from '@mui/material/Box';
import Container from '@mui/material/Container';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useParams } from 'react-router-dom';
import { LoadFailed } from '../../components/load-failed';
import { NoticePanel } from '../../components/notice-panel';
import { PageLoading } from '../../components/page-loading';
import { EvensetMark } from '../../components/layouts/evenset-mark';
import { useVerification } from '../../features/certificates/api/certificates';
import { VerificationResult } from '../../features/certificates/components/verification-result';
import { ApiError } from '../../lib/api-client';
import { ochre, slate, granite } from '../../theme/tokens';

/** The public page behind a certificate's QR code: no sign-in, no navigation, one clear answer. */
export function VerifyRoute() {
  const { code = '' } = useParams();
  const request = useVerification(code);
  return (
    <Box sx={{ minHeight: '100dvh', bgcolor: 'background.default' }}>
      <title>{`Certificate check ${code} — Evenset`}</title>
      <Stack
        component="header"
        direction="row"
        spacing={1.5}
        sx={{
          alignItems: 'center',
          bgcolor: slate[900],
          color: granite[0],
          borderBottom: `3px solid ${ochre[500]}`,
          px: { xs: 2, md: 4 },
          py: 1.5,
        }}
      >
        <EvensetMark size={32} />
        <Typography component="p" sx={{ fontWeight: 700, fontSize: '1.25rem' }}>
          Evenset certificate check
        </Typography>
      </Stack>
      <Container component="main" maxWidth="lg" sx={{ py: { xs: 3, md: 5 } }}>
        <Typography sx={{ color: 'text.secondary', mb: 2 }}>
          Verification code <strong>{code}</strong>
        </Typography>
        {request.data ? (
          <VerificationResult verification={request.data} />
        ) : request.error instanceof ApiError && request.error.status === 404 ? (
          <NoticePanel icon={<SearchOffOutlined />} title="No certificate has this code">
            {request.error.message}
          </NoticePanel>
        ) : request.error ? (
          <LoadFailed what="certificate check" error={request.error} onRetry={() => void request.mutate()} />
        ) : (
          <PageLoading label="Checking the certificate…" />
        )}
      </Container>
    </Box>
  );
}
