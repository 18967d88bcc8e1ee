import type { AllocatedReplacement, ReplacementCandidate, ReplacementCheck } from '@evenset/contracts';
import SearchOutlined from '@mui/icons-material/SearchOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState, type FormEvent } from 'react';
import { Link as RouterLink, useNavigate, useSearchParams } from 'react-router-dom';
import { PageHeader } from '../../components/page-header';
import { paths } from '../../config/paths';
import { WRITE_ROLES } from '../../config/permissions';
import { useMay } from '../../features/auth/hooks/use-may';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { useReplacementLookup, useRevalidateReplacements } from '../../features/replacements/api/replacements';
import { AllocateReplacementDialog } from '../../features/replacements/components/allocate-replacement-dialog';
import { GrindRequestConfirmDialog } from '../../features/replacements/components/grind-request-confirm-dialog';
import { ReplacementCheckResult } from '../../features/replacements/components/replacement-check-result';
import { describeError } from '../../lib/errors';

/** Customer service: from a certificate number or serial to the set, its window and the parts that fit. */
export function ReplacementCheckRoute() {
  const [params, setParams] = useSearchParams();
  const q = params.get('q')?.trim() ?? '';
  const [text, setText] = useState(q);
  const { data, error, isLoading, mutate } = useReplacementLookup(q);
  const { displayUnit } = useSignedInUser();
  const mayAllocate = useMay(WRITE_ROLES.replacements);
  const mayGrind = useMay(WRITE_ROLES.grindRequests);
  const revalidate = useRevalidateReplacements();
  const navigate = useNavigate();
  const [allocating, setAllocating] = useState<ReplacementCandidate | null>(null);
  const [grinding, setGrinding] = useState<ReplacementCandidate | null>(null);
  const [made, setMade] = useState<AllocatedReplacement | null>(null);

  const search = (value: string) => {
    setMade(null);
    setText(value);
    setParams(value.trim() ? { q: value.trim() } : {});
  };
  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    search(text);
  };
  const check: ReplacementCheck | null = data?.match === 'set' ? data : null;

  return (
    <>
      <PageHeader
        title="Replacement check"
        description="Enter the number on the customer's certificate, or the serial of a part of their set, to see the set, the heights a replacement must have and the released parts that fit."
      />
      <Box component="form" role="search" onSubmit={onSubmit} sx={{ mb: 3 }}>
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5} sx={{ maxWidth: 640 }}>
          <TextField
            label="Certificate number or serial"
            value={text}
            onChange={(event) => setText(event.target.value)}
            placeholder="EC-2026-0012 or RB40-0417"
            autoFocus
            fullWidth
            slotProps={{ htmlInput: { 'aria-describedby': 'replacement-search-help' } }}
          />
          <Button type="submit" variant="contained" startIcon={<SearchOutlined />} sx={{ flexShrink: 0 }}>
            Check
          </Button>
        </Stack>
        <Typography id="replacement-search-help" variant="caption" sx={{ color: 'text.secondary' }}>
          A set number (S-2026-0007) works too.
        </Typography>
      </Box>

      {isLoading ? <LinearProgress aria-label="Looking up" sx={{ mb: 2 }} /> : null}
      {error ? (
        <Alert
          severity={error.status === 404 ? 'info' : 'error'}
          action={
            error.status === 404 ? null : (
              <Button color="inherit" onClick={() => void mutate()}>
                Try again
              </Button>
            )
          }
        >
          {describeError(error)}
        </Alert>
      ) : null}
      {data?.match === 'choices' ? (
        <Alert severity="info">
          <Typography sx={{ mb: 1 }}>{data.message}</Typography>
          <Stack spacing={1}>
            {data.choices.map((c) => (
              <Button
                key={c.setId}
                variant="outlined"
                sx={{ alignSelf: 'flex-start' }}
                onClick={() => search(c.setNumber)}
              >
                {c.partNumber} {c.serial} — set {c.setNumber}, {c.customerName}
              </Button>
            ))}
          </Stack>
        </Alert>
      ) : null}
      {made ? (
        <Alert severity="success" sx={{ mb: 3 }}>
          Replacement{' '}
          <Link component={RouterLink} to={paths.set.getHref(made.id)} sx={{ fontWeight: 600 }}>
            {made.setNumber}
          </Link>{' '}
          made: {made.serial} goes to {made.customerName} on order {made.orderReference}, matching set{' '}
          {made.originalSetNumber}. Open it to issue its certificate.
        </Alert>
      ) : null}
      {check ? (
        <ReplacementCheckResult
          check={check}
          unit={displayUnit}
          onAllocate={mayAllocate ? setAllocating : null}
          onGrind={mayGrind ? setGrinding : null}
        />
      ) : null}

      {check && allocating ? (
        <AllocateReplacementDialog
          originalSetId={check.set.id}
          setNumber={check.set.setNumber}
          customerName={check.set.customerName}
          part={allocating}
          unit={displayUnit}
          onClose={() => setAllocating(null)}
          onDone={async (replacement) => {
            // The list is fetched again before the dialog closes, so the part sent is gone from it.
            await revalidate();
            setMade(replacement);
            setAllocating(null);
          }}
        />
      ) : null}
      {check && grinding && check.centre !== null ? (
        <GrindRequestConfirmDialog
          originalSetId={check.set.id}
          setNumber={check.set.setNumber}
          part={grinding}
          centre={check.centre}
          unit={displayUnit}
          onClose={() => setGrinding(null)}
          onDone={async (request) => {
            await revalidate();
            void navigate(paths.grindRequest.getHref(request.id));
          }}
        />
      ) : null}
    </>
  );
}
