import type { DisplayUnit, ReplacementCandidate, ReplacementCheck } from '@evenset/contracts';
import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { DetailList } from '../../../components/display/detail-list';
import { Figures } from '../../../components/display/figures';
import { SectionCard } from '../../../components/display/section-card';
import { UNIT_SYMBOLS } from '../../../components/data-grid/length-column';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { formatHeight } from '../../sets/set-format';
import { CandidateTable } from './candidate-table';
import { GrindRequestStatusLabel } from './grind-request-status';
import { ReplacementWindowDrawing } from './replacement-window-drawing';

interface ReplacementCheckResultProps {
  check: ReplacementCheck;
  unit: DisplayUnit;
  /** Null when the person may not allocate (or raise a grind request). */
  onAllocate: ((part: ReplacementCandidate) => void) | null;
  onGrind: ((part: ReplacementCandidate) => void) | null;
}

/** The original set, its replacement window, and what can be sent or ground to match it. */
export function ReplacementCheckResult({ check, unit, onAllocate, onGrind }: ReplacementCheckResultProps) {
  const { set, window, centre, tolerance, fits, grindable } = check;
  const show = (mm: number) => <Figures>{formatHeight(mm, unit)}</Figures>;
  const symbol = UNIT_SYMBOLS[unit];
  return (
    <Stack spacing={3}>
      <Alert severity="info">{check.foundBy}</Alert>
      <SectionCard title={`Original set ${set.setNumber}`}>
        <DetailList
          items={[
            {
              label: 'Set',
              value: (
                <Link component={RouterLink} to={paths.set.getHref(set.id)}>
                  {set.setNumber}
                </Link>
              ),
            },
            {
              label: 'Customer',
              value: (
                <Link component={RouterLink} to={paths.customer.getHref(set.customerId)}>
                  {set.customerName}
                </Link>
              ),
            },
            { label: 'Order', value: set.orderReference },
            { label: 'Part number', value: `${set.partNumber} rev ${set.revision}` },
            { label: 'Matching band', value: show(set.matchingBand) },
            { label: 'Sold', value: formatDate(set.createdAt) },
          ]}
        />
        <Table size="small" aria-label={`Heights of set ${set.setNumber}`} sx={{ mt: 2, maxWidth: 420 }}>
          <TableHead>
            <TableRow>
              <TableCell>Serial</TableCell>
              <TableCell align="right">Height ({symbol})</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {set.members.map((m) => (
              <TableRow key={m.partId}>
                <TableCell>{m.serial}</TableCell>
                <TableCell align="right">
                  <Figures>{formatHeight(m.height, unit, false)}</Figures>
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </SectionCard>

      <SectionCard
        title="Replacement window"
        description="The heights a replacement may have: within the matching band of every part of the set, and inside the spec's tolerance band."
      >
        {window && centre !== null ? (
          <DetailList
            items={[
              { label: 'Low', value: show(window.low) },
              { label: 'Centre', value: show(centre) },
              { label: 'High', value: show(window.high) },
              {
                label: 'Tolerance band',
                value: (
                  <>
                    {show(tolerance.low)} to {show(tolerance.high)}
                  </>
                ),
              },
            ]}
          />
        ) : (
          <Alert severity="warning">{check.explanation}</Alert>
        )}
        {window ? <Typography sx={{ mt: 2, color: 'text.secondary' }}>{check.explanation}</Typography> : null}
        <Stack sx={{ mt: 2 }}>
          <ReplacementWindowDrawing check={check} unit={unit} />
        </Stack>
      </SectionCard>

      {window ? (
        <SectionCard
          title="Parts that fit"
          description="Released parts in no set whose height lies in the window, closest to its centre first."
        >
          {fits.length ? (
            <CandidateTable
              label="Parts that fit"
              candidates={fits}
              unit={unit}
              measure="distance"
              actionLabel="Use as replacement"
              onAction={onAllocate}
            />
          ) : (
            <Typography>No released part fits this set.</Typography>
          )}
        </SectionCard>
      ) : null}

      {window && fits.length === 0 ? (
        <SectionCard
          title="Parts to grind"
          description="Released parts above the window: grinding can bring one down to the window's centre. Grinding only removes stock, so parts below the window are not listed."
        >
          {grindable.length ? (
            <CandidateTable
              label="Parts to grind"
              candidates={grindable}
              unit={unit}
              measure="stock"
              actionLabel="Ask the shop floor to grind this part"
              onAction={onGrind}
            />
          ) : (
            <Typography>
              No released part lies above the window either. New parts ground to the window are the way left.
            </Typography>
          )}
        </SectionCard>
      ) : null}

      {check.replacements.length || check.grindRequests.length ? (
        <SectionCard title="Earlier replacements and grind requests for this set">
          <Stack spacing={1}>
            {check.replacements.map((r) => (
              <Typography key={r.id}>
                <Link component={RouterLink} to={paths.set.getHref(r.id)}>
                  {r.setNumber}
                </Link>{' '}
                — {r.serial}, {formatDate(r.createdAt)}
              </Typography>
            ))}
            {check.grindRequests.map((r) => (
              <Stack key={r.id} direction="row" spacing={1} sx={{ alignItems: 'center' }}>
                <Link component={RouterLink} to={paths.grindRequest.getHref(r.id)}>
                  {r.requestNumber}
                </Link>
                <span>— {r.serial},</span>
                <GrindRequestStatusLabel status={r.status} />
              </Stack>
            ))}
          </Stack>
        </SectionCard>
      ) : null}
    </Stack>
  );
}
