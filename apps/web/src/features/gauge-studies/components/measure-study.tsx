import { gaugeCorrectionInputSchema, type DisplayUnit, type GaugeCorrectionInput } from '@evenset/contracts';
import { displayResolution, fromMillimetres } from '@evenset/metrology';
import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link as RouterLink } from 'react-router-dom';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormNumberField } from '../../../components/form/form-number-field';
import { FormTextField } from '../../../components/form/form-text-field';
import { LoadFailed } from '../../../components/load-failed';
import { PageLoading } from '../../../components/page-loading';
import { paths } from '../../../config/paths';
import { describeError } from '../../../lib/errors';
import { applyServerErrors } from '../../../lib/form-errors';
import { BigReadingInput } from '../../bench/components/big-reading-input';
import { isFarFromExpected, parseReading } from '../../bench/reading-text';
import { correctGaugeMeasurement, saveGaugeMeasurement, useRevalidateGaugeStudies, useStudyTurn } from '../api';

/** A slip noticed after Enter: a new reading for the last saved part, with a reason. Both stay on record. */
function CorrectionDialog({
  unit,
  serial,
  onSave,
  onClose,
}: {
  unit: DisplayUnit;
  serial: string;
  onSave: (input: GaugeCorrectionInput) => Promise<unknown>;
  onClose: () => void;
}) {
  const notify = useNotify();
  const { control, handleSubmit, setError, formState } = useForm<GaugeCorrectionInput>({
    resolver: zodResolver(gaugeCorrectionInputSchema),
    defaultValues: { unit, reason: '' },
  });
  const onSubmit = handleSubmit(async (input) => {
    try {
      await onSave(input);
      notify(`The reading of ${serial} was corrected; the first one stays on record.`);
      onClose();
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['reading', 'reason'] });
    }
  });
  return (
    <FormDialog
      open
      title={`Correct the reading of ${serial}`}
      submitLabel="Save correction"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <Typography>
        Measure {serial} again and key the reading. The reading you replace is kept with your reason.
      </Typography>
      <FormNumberField
        control={control}
        name="reading"
        label={`Reading (${displayResolution(unit).symbol})`}
        autoFocus
      />
      <FormTextField control={control} name="reason" label="Reason" helperText="e.g. Typed 0.0021 for 0.00021." />
    </FormDialog>
  );
}

/**
 * One inspector's measuring of a study at the plate: the next serial, large; type the reading,
 * Enter saves it and brings the next part. Nothing measured before is shown, not even one's own.
 */
export function MeasureStudy({ studyId, unit }: { studyId: string; unit: DisplayUnit }) {
  const { data: turn, error, mutate } = useStudyTurn(studyId);
  const revalidate = useRevalidateGaugeStudies();
  const [text, setText] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const [doubtful, setDoubtful] = useState<number | null>(null);
  const [saving, setSaving] = useState(false);
  const [correcting, setCorrecting] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  const { symbol } = displayResolution(unit);

  if (error) return <LoadFailed what="gauge study" error={error} onRetry={() => void mutate()} />;
  if (!turn) return <PageLoading />;

  const save = async (reading: number) => {
    if (!turn.next || saving) return;
    setSaving(true);
    try {
      const after = await saveGaugeMeasurement(studyId, { slotId: turn.next.slotId, unit, reading });
      await mutate(after, { revalidate: false });
      void revalidate();
      setText('');
      setDoubtful(null);
      setProblem(null);
    } catch (err) {
      setProblem(describeError(err));
      void mutate();
    } finally {
      setSaving(false);
      input.current?.focus();
    }
  };
  const enter = () => {
    if (doubtful !== null) return void save(doubtful);
    const parsed = parseReading(text);
    if ('error' in parsed) return setProblem(parsed.error);
    const expected = fromMillimetres(turn.expectedReadingMm, unit);
    if (isFarFromExpected(parsed.value, expected, fromMillimetres(turn.bandWidthMm, unit)))
      return setDoubtful(parsed.value);
    void save(parsed.value);
  };
  const escape = () => {
    setText('');
    setDoubtful(null);
    setProblem(null);
  };

  return (
    <Stack spacing={3} sx={{ maxWidth: 720 }}>
      <div>
        <Typography>
          <strong>{turn.name}</strong> · {turn.partNumber} · instrument {turn.instrument} · zero on master {turn.master}
        </Typography>
        <LinearProgress
          variant="determinate"
          value={(100 * turn.measured) / turn.planned}
          sx={{ height: 10, my: 1 }}
          aria-label={`${turn.measured} of ${turn.planned} measured`}
        />
        <Typography color="text.secondary">
          {turn.measured} of {turn.planned} measured
        </Typography>
      </div>
      {turn.next ? (
        <>
          <div>
            <Typography variant="overline">
              Trial {turn.next.trial} · measurement {turn.next.sequence}
            </Typography>
            <Typography
              component="p"
              sx={{ fontSize: { xs: '2.5rem', md: '3.5rem' }, fontWeight: 600, lineHeight: 1.1 }}
            >
              {turn.next.serial}
            </Typography>
            <Typography color="text.secondary">
              Take this part, measure its height against the master, key the indicator reading.
            </Typography>
          </div>
          <BigReadingInput
            label={`Reading of ${turn.next.serial}`}
            unit={symbol}
            value={text}
            error={problem}
            onChange={(value) => {
              setText(value);
              setProblem(null);
            }}
            onEnter={enter}
            onEscape={escape}
            inputRef={input}
            readOnly={doubtful !== null || saving}
          />
          {doubtful !== null ? (
            <Alert severity="warning">
              {text} {symbol} is far from what a part in the band reads. Are you sure? Enter saves it, Escape lets you
              type it again.
            </Alert>
          ) : null}
        </>
      ) : (
        <Alert severity="success">
          All your measurements for this study are in. The engineer sees the result when every inspector has finished.
        </Alert>
      )}
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        {turn.lastSaved ? (
          <>
            <Typography color="text.secondary">
              Last saved: {turn.lastSaved.serial} (measurement {turn.lastSaved.sequence})
            </Typography>
            <Button variant="outlined" size="large" onClick={() => setCorrecting(true)}>
              Correct it…
            </Button>
          </>
        ) : null}
        <Button component={RouterLink} to={paths.bench.getHref()} size="large">
          Back to the Bench
        </Button>
      </Stack>
      {correcting && turn.lastSaved ? (
        <CorrectionDialog
          unit={unit}
          serial={turn.lastSaved.serial}
          onClose={() => setCorrecting(false)}
          onSave={async (correction) => {
            const after = await correctGaugeMeasurement(studyId, turn.lastSaved!.measurementId, correction);
            await mutate(after, { revalidate: false });
            void revalidate();
          }}
        />
      ) : null}
    </Stack>
  );
}
