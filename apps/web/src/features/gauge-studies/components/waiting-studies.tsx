import RuleOutlined from '@mui/icons-material/RuleOutlined';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { SectionCard } from '../../../components/display/section-card';
import { paths } from '../../../config/paths';
import { useWaitingStudies } from '../api';

/** On the Bench: the gauge studies with measurements waiting for the signed-in inspector. Nothing when none. */
export function WaitingStudies() {
  const { data } = useWaitingStudies();
  if (!data?.items.length) return null;
  return (
    <Box sx={{ mb: 3 }}>
      <SectionCard
        title="Gauge studies waiting for you"
        description="Measure the parts the study names, one by one; you will not see earlier results."
      >
        <Stack spacing={1.5}>
          {data.items.map((study) => (
            <Stack key={study.id} direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
              <Button
                component={RouterLink}
                to={paths.gaugeStudyBench.getHref(study.id)}
                variant="contained"
                size="large"
                startIcon={<RuleOutlined />}
                sx={{ minHeight: 48 }}
              >
                {study.name}
              </Button>
              <Typography color="text.secondary">
                {study.partNumber} · {study.instrument} · master {study.master} · {study.measured} of {study.planned}{' '}
                measured
              </Typography>
            </Stack>
          ))}
        </Stack>
      </SectionCard>
    </Box>
  );
}
