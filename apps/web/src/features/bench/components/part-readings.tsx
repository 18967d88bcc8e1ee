import type { DisplayUnit, Inspection, PartRow } from '@evenset/contracts';
import { displayResolution, formatFixed, toMillimetres } from '@evenset/metrology';
import SaveOutlined from '@mui/icons-material/SaveOutlined';
import UndoOutlined from '@mui/icons-material/UndoOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useMemo, useState } from 'react';
import { describeError } from '../../../lib/errors';
import { saveInspection } from '../api/runs';
import { readingGuard, type BenchContext } from '../bench-context';
import { liveResult, type LiveResult } from '../live-result';
import { BenchFace } from './bench-face';
import { LiveResults } from './live-results';
import { ReadingEntry } from './reading-entry';

interface PartReadingsProps {
  context: BenchContext;
  part: PartRow;
  unit: DisplayUnit;
  onSaved: (inspection: Inspection, live: LiveResult) => void;
}

/** One part: readings station by station, live results beside them, then Save. */
export function PartReadings({ context, part, unit, onSaved }: PartReadingsProps) {
  const [values, setValues] = useState<number[]>([]);
  const [saving, setSaving] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const { stations } = context;
  const resolution = displayResolution(unit, 'fine');
  const guard = useMemo(() => readingGuard(context, unit), [context, unit]);
  const live = useMemo(
    () =>
      liveResult(
        context.live,
        stations,
        values.map((v) => toMillimetres(v, unit)),
      ),
    [context, stations, values, unit],
  );
  const complete = values.length === stations.length;

  const save = async () => {
    setSaving(true);
    setProblem(null);
    try {
      const inspection = await saveInspection(context.run.id, {
        partId: part.id,
        unit,
        readings: stations.map((s, i) => ({ station: s.name, reading: values[i] ?? 0 })),
      });
      onSaved(inspection, live);
    } catch (error) {
      setProblem(describeError(error));
      setSaving(false);
    }
  };

  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '1.15fr 1fr' }, gap: 3, alignItems: 'start' }}>
      <Stack spacing={2}>
        <Typography sx={{ color: 'text.secondary', fontSize: '1.1rem' }}>
          Part <strong>{part.serial}</strong> · lot {context.lot.lotNumber}
        </Typography>
        {complete ? (
          <Stack spacing={2}>
            <Typography variant="h2" component="p" sx={{ fontSize: '2rem' }}>
              All {stations.length} readings taken
            </Typography>
            <Typography sx={{ fontSize: '1.1rem' }}>Check the results, then save. Enter saves.</Typography>
            {problem ? <Alert severity="error">{problem}</Alert> : null}
            <Stack direction="row" spacing={2}>
              <Button
                variant="contained"
                size="large"
                autoFocus
                loading={saving}
                startIcon={<SaveOutlined />}
                onClick={() => void save()}
                sx={{ minHeight: 56, px: 4, fontSize: '1.1rem' }}
              >
                Save {part.serial}
              </Button>
              <Button
                variant="outlined"
                size="large"
                disabled={saving}
                startIcon={<UndoOutlined />}
                onClick={() => setValues(values.slice(0, -1))}
                sx={{ minHeight: 56 }}
              >
                Redo the last reading
              </Button>
            </Stack>
          </Stack>
        ) : (
          <ReadingEntry
            stations={stations}
            values={values}
            onValues={setValues}
            unit={resolution.symbol}
            guard={guard}
            format={(value) => formatFixed(value, resolution.decimals)}
          />
        )}
      </Stack>
      <Stack spacing={2}>
        <Paper variant="outlined" sx={{ p: 1 }}>
          <BenchFace stations={stations} current={values.length} />
        </Paper>
        <Paper variant="outlined" sx={{ p: 2 }}>
          <LiveResults result={live} unit={unit} title="Live results" />
        </Paper>
      </Stack>
    </Box>
  );
}
