import ReplayOutlined from '@mui/icons-material/ReplayOutlined';
import UndoOutlined from '@mui/icons-material/UndoOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useRef, useState } from 'react';
import type { BenchStation } from '../bench-stations';
import { BigReadingInput } from './big-reading-input';
import { isFarFromExpected, parseReading } from '../reading-text';

export interface ReadingGuard {
  /** The reading expected at a station, in the reading unit. */
  expected: (station: BenchStation, taken: readonly number[]) => number;
  /** The tolerance band's width, in the reading unit. */
  bandWidth: number;
}

interface ReadingEntryProps {
  stations: readonly BenchStation[];
  /** Readings taken so far, in the reading unit and plan order. */
  values: readonly number[];
  onValues: (values: number[]) => void;
  unit: string;
  guard: ReadingGuard;
  /** How a taken value is shown again when going back a station. */
  format: (value: number) => string;
}

/**
 * Station-by-station entry from the keyboard alone: type, Enter, next. A text that is not a number
 * is refused in place; a value far from what is expected asks "Are you sure?" (Enter takes it,
 * Escape goes back to it); Escape or "Redo" clears the current reading. Nothing here is saved.
 */
export function ReadingEntry({ stations, values, onValues, unit, guard, format }: ReadingEntryProps) {
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [doubtful, setDoubtful] = useState<number | null>(null);
  const input = useRef<HTMLInputElement>(null);
  const index = values.length;
  const station = stations[index];
  const next = stations[index + 1];
  const previous = stations[index - 1];

  const focus = () => input.current?.focus();
  const clear = () => {
    setText('');
    setError(null);
    setDoubtful(null);
    focus();
  };
  const take = (value: number) => {
    setText('');
    setError(null);
    setDoubtful(null);
    onValues([...values, value]);
  };
  const enter = () => {
    if (!station) return;
    if (doubtful !== null) return take(doubtful);
    const parsed = parseReading(text);
    if ('error' in parsed) return setError(parsed.error);
    if (isFarFromExpected(parsed.value, guard.expected(station, values), guard.bandWidth))
      return setDoubtful(parsed.value);
    take(parsed.value);
  };
  const escape = () => {
    if (doubtful !== null) {
      setDoubtful(null);
      focus();
    } else clear();
  };
  const back = () => {
    const last = values.at(-1);
    if (last === undefined) return;
    onValues(values.slice(0, -1));
    setText(format(last));
    setError(null);
    setDoubtful(null);
    focus();
  };

  if (!station) return null;
  return (
    <Stack spacing={2}>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'baseline', justifyContent: 'space-between' }}>
        <Typography variant="h2" component="p" sx={{ fontSize: '2rem' }} aria-live="polite">
          Station {station.name}
        </Typography>
        <Typography sx={{ color: 'text.secondary', fontSize: '1.1rem' }}>
          {index + 1} of {stations.length}
        </Typography>
      </Stack>
      <BigReadingInput
        label={`Reading at ${station.name}`}
        unit={unit}
        value={text}
        error={error}
        onChange={(value) => {
          setText(value);
          setError(null);
        }}
        onEnter={enter}
        onEscape={escape}
        inputRef={input}
        readOnly={doubtful !== null}
      />
      {doubtful !== null ? (
        <Alert
          severity="warning"
          variant="filled"
          role="alertdialog"
          aria-label="Are you sure?"
          sx={{ fontSize: '1.1rem' }}
        >
          <strong>Are you sure?</strong> {format(doubtful)} {unit} is far from what this station usually reads. Press
          Enter to take it, Escape to go back and correct it.
        </Alert>
      ) : null}
      <Typography sx={{ fontSize: '1.25rem', fontWeight: 500 }}>
        {next ? `Next: ${next.name}` : 'Last station'}
      </Typography>
      <Stack direction="row" spacing={2}>
        <Button
          variant="outlined"
          size="large"
          startIcon={<ReplayOutlined />}
          onClick={clear}
          sx={{ minHeight: 56, minWidth: 140 }}
        >
          Redo
        </Button>
        {previous ? (
          <Button variant="text" size="large" startIcon={<UndoOutlined />} onClick={back} sx={{ minHeight: 56 }}>
            Back to {previous.name}
          </Button>
        ) : null}
      </Stack>
    </Stack>
  );
}
