import type { DisplayUnit, Trend } from '@evenset/contracts';
import { formatFixed, formatLength } from '@evenset/metrology';
import Alert from '@mui/material/Alert';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { DetailList } from '../../../components/display/detail-list';
import { Figures } from '../../../components/display/figures';
import { formatCount } from '../../../lib/format';

/** Cp and Cpk against the released band, the number of heights behind them, and a warning when few. */
export function CapabilityCard({ trend, unit }: { trend: Trend; unit: DisplayUnit }) {
  const cap = trend.capability;
  if (!cap) return <Typography sx={{ color: 'text.secondary' }}>{trend.capabilityNote}</Typography>;
  const length = (mm: number) => formatLength(mm, unit, { level: 'fine' });
  return (
    <Stack spacing={2}>
      <Stack direction="row" spacing={4} aria-label="Capability indexes">
        {(
          [
            ['Cp', cap.cp],
            ['Cpk', cap.cpk],
          ] as const
        ).map(([name, value]) => (
          <div key={name}>
            <Typography variant="overline" component="div">
              {name}
            </Typography>
            <Typography variant="h2" component="div">
              <Figures>{formatFixed(value, 2)}</Figures>
            </Typography>
          </div>
        ))}
        <div>
          <Typography variant="overline" component="div">
            Values
          </Typography>
          <Typography variant="h2" component="div">
            <Figures>{formatCount(cap.count)}</Figures>
          </Typography>
        </div>
      </Stack>
      {cap.warning ? (
        <Alert severity="warning" variant="outlined">
          {cap.warning}
        </Alert>
      ) : null}
      <DetailList
        items={[
          {
            label: `Band (rev ${cap.revision})`,
            value: <Figures>{`${length(cap.lower)} to ${length(cap.upper)}`}</Figures>,
          },
          { label: 'Mean height', value: <Figures>{length(cap.mean)}</Figures> },
          { label: 'Standard deviation (sample)', value: <Figures>{length(cap.sigma)}</Figures> },
        ]}
      />
    </Stack>
  );
}
