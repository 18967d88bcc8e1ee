import type { CertificateFacts, Verification } from '@evenset/contracts';
import BlockOutlined from '@mui/icons-material/BlockOutlined';
import GppBadOutlined from '@mui/icons-material/GppBadOutlined';
import VerifiedOutlined from '@mui/icons-material/VerifiedOutlined';
import type { SvgIconComponent } from '@mui/icons-material';
import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { DetailList } from '../../../components/display/detail-list';
import { Figures } from '../../../components/display/figures';
import { formatDate } from '../../../lib/format';
import { status as hues } from '../../../theme/tokens';

interface Verdict {
  icon: SvgIconComponent;
  color: string;
  title: string;
  text: (v: Verification) => string;
}

const VERDICTS: Record<Verification['status'], Verdict> = {
  genuine: {
    icon: VerifiedOutlined,
    color: hues.success,
    title: 'Genuine certificate',
    text: () =>
      'The signature holds: these are the facts exactly as the shop issued them, and the certificate has not been withdrawn.',
  },
  revoked: {
    icon: BlockOutlined,
    color: hues.warning,
    title: 'Revoked certificate',
    text: (v) =>
      `The shop withdrew this certificate on ${formatDate(v.revocation!.at)}. Reason: ${v.revocation!.reason}`,
  },
  altered: {
    icon: GppBadOutlined,
    color: hues.error,
    title: 'Altered record — do not rely on this certificate',
    text: (v) =>
      'The stored certificate no longer matches the shop’s signature: it was changed after it was issued. Contact the issuer before relying on it.' +
      (v.revocation ? ` It was also withdrawn on ${formatDate(v.revocation.at)}: ${v.revocation.reason}` : ''),
  },
};

/** The outcome of the public check, large and in words, then the certificate's facts. */
export function VerificationResult({ verification }: { verification: Verification }) {
  const verdict = VERDICTS[verification.status];
  const Icon = verdict.icon;
  return (
    <Stack spacing={3}>
      <Paper
        variant="outlined"
        role="status"
        aria-label={verdict.title}
        sx={{ p: { xs: 2.5, md: 3.5 }, borderColor: verdict.color, borderWidth: 2, borderLeftWidth: 8 }}
      >
        <Stack direction="row" spacing={2} sx={{ alignItems: 'flex-start' }}>
          <Icon sx={{ fontSize: 56, color: verdict.color }} aria-hidden />
          <div>
            <Typography variant="h1" component="h1" sx={{ color: verdict.color }}>
              {verdict.title}
            </Typography>
            <Typography sx={{ mt: 1, maxWidth: '70ch' }}>{verdict.text(verification)}</Typography>
            <Typography variant="body2" sx={{ mt: 1, color: 'text.secondary' }}>
              Checked {new Date(verification.checkedAt).toLocaleString()}
            </Typography>
          </div>
        </Stack>
      </Paper>
      {verification.facts ? (
        <CertificateFactsView facts={verification.facts} altered={verification.status === 'altered'} />
      ) : (
        <Typography>The stored facts cannot be read.</Typography>
      )}
    </Stack>
  );
}

function both(p: { value: string; mm: string }, unit: 'in' | 'mm') {
  return unit === 'mm' ? `${p.mm} mm` : `${p.value} in (${p.mm} mm)`;
}

function CertificateFactsView({ facts: f, altered }: { facts: CertificateFacts; altered: boolean }) {
  const u = f.part.unit;
  return (
    <Paper variant="outlined" component="section" aria-label="Certificate facts" sx={{ p: { xs: 2, md: 3 } }}>
      <Typography variant="h2" sx={{ mb: 0.5 }}>
        Certificate of conformance {f.certificateNumber}
      </Typography>
      {altered ? (
        <Typography sx={{ color: hues.error, mb: 2 }}>Shown as stored now, which is not what was signed.</Typography>
      ) : (
        <Typography sx={{ color: 'text.secondary', mb: 2 }}>As issued by {f.shop.name}.</Typography>
      )}
      <DetailList
        items={[
          { label: 'Issued by', value: `${f.issuer}, ${f.shop.name}` },
          { label: 'Issued on', value: formatDate(f.issuedOn) },
          { label: 'Customer', value: f.customer.name },
          { label: 'Order reference', value: f.customer.orderReference },
          { label: 'Part number', value: `${f.part.partNumber} rev ${f.part.specRevision}` },
          { label: f.set.kind === 'replacement' ? 'Replacement set' : 'Matched set', value: f.set.setNumber },
          {
            label: 'Tolerance band',
            value: (
              <Figures>
                {f.part.bandLower.value} to {f.part.bandUpper.value} {u}
              </Figures>
            ),
          },
          {
            label: 'Set spread / matching band',
            value: (
              <Figures>
                {both(f.set.spread, u)} / {both(f.set.matchingBand, u)}
              </Figures>
            ),
          },
        ]}
      />
      <Box sx={{ overflowX: 'auto', mt: 3 }}>
        <Table size="small" aria-label="Measured heights">
          <TableHead>
            <TableRow>
              <TableCell>Serial</TableCell>
              <TableCell>Lot</TableCell>
              <TableCell align="right">Height ({u})</TableCell>
              {u === 'mm' ? null : <TableCell align="right">Height (mm)</TableCell>}
              <TableCell align="right">U (k = {f.members[0]?.coverageFactor ?? '2'})</TableCell>
              <TableCell>Inspected</TableCell>
              <TableCell>Part / master °C</TableCell>
              <TableCell>Verdict</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {f.members.map((m) => (
              <TableRow key={m.serial}>
                <TableCell>{m.serial}</TableCell>
                <TableCell>{m.lotNumber}</TableCell>
                <TableCell align="right">
                  <Figures>{m.height.value}</Figures>
                </TableCell>
                {u === 'mm' ? null : (
                  <TableCell align="right">
                    <Figures>{m.height.mm}</Figures>
                  </TableCell>
                )}
                <TableCell align="right">
                  <Figures>{both(m.expandedUncertainty, u)}</Figures>
                </TableCell>
                <TableCell>{formatDate(m.inspectedOn)}</TableCell>
                <TableCell>
                  <Figures>
                    {m.partTemperature} / {m.masterTemperature}
                  </Figures>
                </TableCell>
                <TableCell>{m.verdict}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </Box>
      {f.replaces ? (
        <Typography sx={{ mt: 2 }}>
          Replacement for set {f.replaces.setNumber}:{' '}
          {f.replaces.members.map((m) => `${m.serial} ${both(m.height, u)}`).join('; ')}.
        </Typography>
      ) : null}
      <Typography variant="h3" sx={{ mt: 3, mb: 1 }}>
        Master gauges
      </Typography>
      <Box component="ul" sx={{ m: 0, pl: 3 }}>
        {f.masters.map((m) => (
          <li key={`${m.code}-${m.calibrationCertificate}`}>
            {m.code} ({m.description}): calibration certificate {m.calibrationCertificate}, calibrated{' '}
            {formatDate(m.calibratedOn)}, due {formatDate(m.dueOn)}
          </li>
        ))}
      </Box>
      <Stack spacing={1} sx={{ mt: 3, maxWidth: '90ch' }}>
        <Typography>{f.decisionRule.text}</Typography>
        <Typography>{f.uncertaintyStatement}</Typography>
        <Typography sx={{ fontWeight: 600 }}>{f.accreditationStatement}</Typography>
      </Stack>
    </Paper>
  );
}
