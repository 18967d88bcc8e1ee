import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { BackLink } from '../../components/back-link';
import { Figures } from '../../components/display/figures';
import { SectionCard } from '../../components/display/section-card';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { paths } from '../../config/paths';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { CertificatesPanel } from '../../features/certificates/components/certificates-panel';
import { useSet } from '../../features/sets/api/sets';
import { SetMembersTable } from '../../features/sets/components/set-members-table';
import { SetSummary } from '../../features/sets/components/set-summary';
import { SpreadBar } from '../../features/sets/components/spread-bar';

export function SetDetailRoute() {
  const { setId = '' } = useParams();
  const { displayUnit } = useSignedInUser();
  const { data: set, error, mutate } = useSet(setId);

  if (error) return <LoadFailed what="set" error={error} onRetry={() => void mutate()} />;
  if (!set) return <PageLoading />;
  const isReplacement = set.kind === 'replacement';
  return (
    <>
      <BackLink to={paths.sets.getHref()} label="All sets" />
      <PageHeader
        title={`${isReplacement ? 'Replacement' : 'Set'} ${set.setNumber}`}
        description={
          <>
            {set.partNumber} for {set.customerName}, order {set.orderReference}
          </>
        }
      />
      <Stack spacing={3}>
        {isReplacement && set.replacesSetId ? (
          <SectionCard title="Replaces">
            <Typography>
              Sent to match set{' '}
              <Link component={RouterLink} to={paths.set.getHref(set.replacesSetId)} sx={{ fontWeight: 500 }}>
                {set.replacesSetNumber ?? 'the original set'}
              </Link>
              .
            </Typography>
          </SectionCard>
        ) : null}
        <SectionCard title="Details">
          <SetSummary set={set} unit={displayUnit} />
        </SectionCard>
        <SectionCard
          title="Spread against the matching band"
          description="Highest minus lowest height of the parts in this set."
        >
          <SpreadBar spread={set.spread} band={set.matchingBand} unit={displayUnit} />
        </SectionCard>
        <SectionCard title="Parts" description="Heights as measured when the parts were allocated.">
          <SetMembersTable members={set.members} unit={displayUnit} />
        </SectionCard>
        {!isReplacement ? (
          <SectionCard title="Replacement parts" description="Parts sent later to match this set.">
            {set.replacements.length === 0 ? (
              <Typography sx={{ color: 'text.secondary' }}>None sent so far.</Typography>
            ) : (
              <Stack component="ul" spacing={0.5} sx={{ m: 0, pl: 2.5 }}>
                {set.replacements.map((r) => (
                  <li key={r.id}>
                    <Link component={RouterLink} to={paths.set.getHref(r.id)} sx={{ fontWeight: 500 }}>
                      {r.setNumber}
                    </Link>{' '}
                    — <Figures>{r.serials.join(', ')}</Figures>
                  </li>
                ))}
              </Stack>
            )}
          </SectionCard>
        ) : null}
        <CertificatesPanel setId={set.id} />
      </Stack>
    </>
  );
}
