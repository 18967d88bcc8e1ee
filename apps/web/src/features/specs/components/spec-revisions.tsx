import type { Spec } from '@evenset/contracts';
import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { Figures } from '../../../components/display/figures';
import { paths } from '../../../config/paths';
import { describeError } from '../../../lib/errors';
import { formatDate } from '../../../lib/format';
import { useSpecComparison } from '../api/compare-specs';
import { useSpecRevisions } from '../api/get-spec-revisions';
import { changeLabel, changeValue } from '../spec-changes';
import { SpecStatusLabel } from './spec-status';

/** A value of the comparison; numbers in tabular figures so the columns read against each other. */
function ChangedValue({ field, value, spec }: { field: string; value: unknown; spec: Spec }) {
  const text = changeValue(field, value, spec.definition);
  return typeof value === 'number' ? <Figures>{text}</Figures> : <>{text}</>;
}

/** Revision order: A … Z, then AA, AB, … */
function isLater(a: string, b: string): boolean {
  return a.length !== b.length ? a.length > b.length : a > b;
}

/** All revisions of the part number, and what changed between this one and another, side by side. */
export function SpecRevisions({ spec }: { spec: Spec }) {
  const { revisions } = useSpecRevisions(spec.partNumber);
  const others = revisions.filter((r) => r.id !== spec.id);
  const [chosen, setChosen] = useState<string | null>(null);
  const otherId = chosen ?? spec.previousId ?? others.at(-1)?.id ?? null;
  const other = others.find((r) => r.id === otherId);
  // Older revision on the left, whichever one is open.
  const [from, to] = other && isLater(other.revision, spec.revision) ? [spec, other] : [other, spec];
  const comparison = useSpecComparison(from?.id ?? null, to?.id ?? null);

  return (
    <Stack spacing={3}>
      <Table size="small" aria-label={`Revisions of ${spec.partNumber}`}>
        <TableHead>
          <TableRow>
            <TableCell>Revision</TableCell>
            <TableCell>Status</TableCell>
            <TableCell>Released</TableCell>
            <TableCell>Last changed</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {revisions.map((r) => (
            <TableRow key={r.id} selected={r.id === spec.id}>
              <TableCell>
                {r.id === spec.id ? (
                  <strong>Rev. {r.revision} (this page)</strong>
                ) : (
                  <Link component={RouterLink} to={paths.spec.getHref(r.id)}>
                    Rev. {r.revision}
                  </Link>
                )}
              </TableCell>
              <TableCell>
                <SpecStatusLabel status={r.status} />
              </TableCell>
              <TableCell>{r.releasedAt ? formatDate(r.releasedAt) : '—'}</TableCell>
              <TableCell>{formatDate(r.updatedAt)}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      {others.length === 0 ? (
        <Typography sx={{ color: 'text.secondary' }}>
          This is the only revision so far; there is nothing to compare.
        </Typography>
      ) : (
        <Stack spacing={2}>
          <TextField
            select
            label="Compare with"
            value={otherId ?? ''}
            onChange={(event) => setChosen(event.target.value)}
            sx={{ maxWidth: 280 }}
          >
            {others.map((r) => (
              <MenuItem key={r.id} value={r.id}>
                Rev. {r.revision}
              </MenuItem>
            ))}
          </TextField>
          {comparison.error ? <Alert severity="error">{describeError(comparison.error)}</Alert> : null}
          {comparison.data && from && to ? (
            comparison.data.changes.length === 0 ? (
              <Typography>
                Rev. {from.revision} and rev. {to.revision} are the same.
              </Typography>
            ) : (
              <Table size="small" aria-label={`Changes from rev. ${from.revision} to rev. ${to.revision}`}>
                <TableHead>
                  <TableRow>
                    <TableCell>What changed</TableCell>
                    <TableCell>Rev. {from.revision}</TableCell>
                    <TableCell>Rev. {to.revision}</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {comparison.data.changes.map((change) => (
                    <TableRow key={change.field}>
                      <TableCell>{changeLabel(change.field)}</TableCell>
                      <TableCell sx={{ color: 'text.secondary' }}>
                        <ChangedValue field={change.field} value={change.before} spec={from} />
                      </TableCell>
                      <TableCell sx={{ fontWeight: 500 }}>
                        <ChangedValue field={change.field} value={change.after} spec={to} />
                      </TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
            )
          ) : null}
        </Stack>
      )}
    </Stack>
  );
}
