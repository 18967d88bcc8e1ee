import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { formatLength } from '@evenset/metrology';
import { useParams } from 'react-router-dom';
import { BackLink } from '../../components/back-link';
import { DetailList } from '../../components/display/detail-list';
import { Figures } from '../../components/display/figures';
import { SectionCard } from '../../components/display/section-card';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { paths } from '../../config/paths';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { useGaugeStudy } from '../../features/gauge-studies/api';
import { ByInspectorChart, ByPartChart, RangeChart } from '../../features/gauge-studies/components/study-charts';
import { StudyResult } from '../../features/gauge-studies/components/study-result';
import { formatDate } from '../../lib/format';

export function GaugeStudyRoute() {
  const { studyId = '' } = useParams();
  const { displayUnit: unit } = useSignedInUser();
  const { data: study, error, mutate } = useGaugeStudy(studyId);
  if (error) return <LoadFailed what="gauge study" error={error} onRetry={() => void mutate()} />;
  if (!study) return <PageLoading />;
  const length = (mm: number) => <Figures>{formatLength(mm, unit, { level: 'fine', withSymbol: true })}</Figures>;
  const inspectorName = new Map(study.inspectors.map((p) => [p.id, p.displayName]));
  return (
    <>
      <BackLink to={paths.gaugeStudies.getHref()} label="All gauge studies" />
      <PageHeader
        title={`Gauge study — ${study.name}`}
        description={`${study.partNumber} rev ${study.revision}: ${study.parts} parts, ${study.inspectors.length} inspectors, ${study.trials} trials each.`}
      />
      <Stack spacing={3}>
        <SectionCard title="Set-up">
          <DetailList
            items={[
              {
                label: 'Band (the tolerance)',
                value: (
                  <>
                    {length(study.nominalMm + study.bandLowerMm)} to {length(study.nominalMm + study.bandUpperMm)}
                  </>
                ),
              },
              { label: 'Instrument', value: study.instrument.code },
              {
                label: 'Master gauge',
                value: (
                  <>
                    {study.master.code}, {length(study.master.calibratedSizeMm)} ({study.master.certificateNumber})
                  </>
                ),
              },
              { label: 'Parts', value: study.partList.map((p) => p.serial).join(', ') },
              { label: 'Random order drawn from seed', value: <Figures>{study.seed}</Figures> },
              { label: 'Set up', value: `${formatDate(study.createdAt)} by ${study.createdBy}` },
            ]}
          />
        </SectionCard>
        <SectionCard
          title="Progress"
          description="Each inspector measures at the Bench, blind: they see the next serial only, never a result."
        >
          <Stack spacing={1.5}>
            {study.progress.map((p) => (
              <div key={p.id}>
                <Typography>
                  {p.displayName}:{' '}
                  <Figures>
                    {p.measured} of {p.planned}
                  </Figures>
                </Typography>
                <LinearProgress
                  variant="determinate"
                  value={(100 * p.measured) / p.planned}
                  aria-label={`${p.displayName}: ${p.measured} of ${p.planned} measured`}
                />
              </div>
            ))}
          </Stack>
        </SectionCard>
        {study.result ? (
          <>
            <SectionCard title="Result">
              <StudyResult result={study.result} unit={unit} />
            </SectionCard>
            <SectionCard title="Measurements by part" description="Each dot one measurement; inspectors side by side.">
              <ByPartChart study={study} unit={unit} />
            </SectionCard>
            <SectionCard
              title="Measurements by inspector"
              description="The short line across each column is the inspector's mean."
            >
              <ByInspectorChart study={study} unit={unit} />
            </SectionCard>
            <SectionCard
              title="Range of the trials"
              description="Per part and inspector: the spread of their own repeated measurements, against the average range and its upper limit."
            >
              <RangeChart study={study} unit={unit} />
            </SectionCard>
          </>
        ) : (
          <SectionCard title="Result">
            <Typography color="text.secondary">
              The analysis appears when every measurement is in ({study.measured} of {study.planned} so far).
            </Typography>
          </SectionCard>
        )}
        <SectionCard title="Measurements" description="Every record, corrections and the ones they replaced included.">
          <Table size="small" aria-label="Measurements">
            <TableHead>
              <TableRow>
                <TableCell>Inspector</TableCell>
                <TableCell align="right">No.</TableCell>
                <TableCell>Serial</TableCell>
                <TableCell align="right">Trial</TableCell>
                <TableCell align="right">Reading</TableCell>
                <TableCell align="right">Height</TableCell>
                <TableCell>Note</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {study.measurements.map((m) => (
                <TableRow key={m.id} sx={m.supersededById ? { '& td': { color: 'text.secondary' } } : undefined}>
                  <TableCell>{inspectorName.get(m.inspectorId)}</TableCell>
                  <TableCell align="right">
                    <Figures>{m.sequence}</Figures>
                  </TableCell>
                  <TableCell>{m.serial}</TableCell>
                  <TableCell align="right">
                    <Figures>{m.trial}</Figures>
                  </TableCell>
                  <TableCell align="right">{length(m.readingMm)}</TableCell>
                  <TableCell align="right">{length(m.heightMm)}</TableCell>
                  <TableCell>
                    {m.supersededById ? 'Replaced by a correction' : m.reason ? `Correction: ${m.reason}` : ''}
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </SectionCard>
      </Stack>
    </>
  );
}
