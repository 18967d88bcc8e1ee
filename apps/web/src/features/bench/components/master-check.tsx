import Alert from '@mui/material/Alert';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { describeError } from '../../../lib/errors';
import { parseReading } from '../reading-text';
import { BigReadingInput } from './big-reading-input';

interface MasterCheckProps {
  title: string;
  text: string;
  unit: string;
  /** Sends the reading; a refusal is shown here and the reading kept for correction. */
  onReading: (value: number) => Promise<unknown>;
}

/** A master check reading (the zero at the start, the check at the end), keyed and sent with Enter. */
export function MasterCheck({ title, text, unit, onReading }: MasterCheckProps) {
  const [value, setValue] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [sending, setSending] = useState(false);
  const enter = async () => {
    const parsed = parseReading(value);
    if ('error' in parsed) return setError(parsed.error);
    setSending(true);
    setProblem(null);
    try {
      await onReading(parsed.value);
    } catch (failure) {
      setProblem(describeError(failure));
    } finally {
      setSending(false);
    }
  };
  return (
    <Stack spacing={3} sx={{ maxWidth: 640 }}>
      <div>
        <Typography variant="h2" component="p" sx={{ fontSize: '2rem' }}>
          {title}
        </Typography>
        <Typography sx={{ color: 'text.secondary', mt: 1, fontSize: '1.1rem' }}>{text}</Typography>
      </div>
      <BigReadingInput
        label="Reading on the master"
        unit={unit}
        value={value}
        error={error}
        readOnly={sending}
        onChange={(next) => {
          setValue(next);
          setError(null);
        }}
        onEnter={() => void enter()}
        onEscape={() => {
          setValue('');
          setError(null);
        }}
      />
      {problem ? <Alert severity="error">{problem}</Alert> : null}
      {sending ? <Typography aria-live="polite">Saving…</Typography> : null}
    </Stack>
  );
}
