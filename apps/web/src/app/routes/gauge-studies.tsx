import AddOutlined from '@mui/icons-material/AddOutlined';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { SectionCard } from '../../components/display/section-card';
import { Figures } from '../../components/display/figures';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { paths } from '../../config/paths';
import { useGaugeStudies } from '../../features/gauge-studies/api';
import { NewStudyDialog } from '../../features/gauge-studies/components/new-study-dialog';
import { useSpecs } from '../../features/specs/api/get-specs';
import { formatDate } from '../../lib/format';

const RELEASED_SPECS = { page: 0, pageSize: 100, status: 'released' } as const;

export function GaugeStudiesRoute() {
  const [creating, setCreating] = useState(false);
  const specs = useSpecs(RELEASED_SPECS);
  const { data, error, mutate } = useGaugeStudies();
  return (
    <>
      <PageHeader
        title="Gauge studies"
        description="Can the gauge and the inspectors be trusted? Several inspectors measure the same parts several times, blind and in a random order; the study splits the spread between the gauge, the people and the parts."
        actions={
          <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setCreating(true)}>
            New study
          </Button>
        }
      />
      {error ? (
        <LoadFailed what="gauge studies" error={error} onRetry={() => void mutate()} />
      ) : !data ? (
        <PageLoading />
      ) : (
        <SectionCard title="Studies">
          {data.items.length === 0 ? (
            <Typography color="text.secondary">No gauge studies yet — set one up with “New study”.</Typography>
          ) : (
            <Table size="small" aria-label="Gauge studies">
              <TableHead>
                <TableRow>
                  <TableCell>Study</TableCell>
                  <TableCell>Part number</TableCell>
                  <TableCell>Inspectors</TableCell>
                  <TableCell align="right">Parts × trials</TableCell>
                  <TableCell align="right">Measured</TableCell>
                  <TableCell>Set up</TableCell>
                </TableRow>
              </TableHead>
              <TableBody>
                {data.items.map((study) => (
                  <TableRow key={study.id} hover>
                    <TableCell>
                      <Link component={RouterLink} to={paths.gaugeStudy.getHref(study.id)}>
                        {study.name}
                      </Link>
                    </TableCell>
                    <TableCell>
                      {study.partNumber} rev {study.revision}
                    </TableCell>
                    <TableCell>{study.inspectors.map((p) => p.displayName).join(', ')}</TableCell>
                    <TableCell align="right">
                      <Figures>
                        {study.parts} × {study.trials}
                      </Figures>
                    </TableCell>
                    <TableCell align="right">
                      <Figures>
                        {study.measured} of {study.planned}
                      </Figures>
                      {study.complete ? ' — complete' : ''}
                    </TableCell>
                    <TableCell>
                      {formatDate(study.createdAt)} by {study.createdBy}
                    </TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          )}
        </SectionCard>
      )}
      {creating ? <NewStudyDialog specs={specs.data?.items ?? []} onClose={() => setCreating(false)} /> : null}
    </>
  );
}
