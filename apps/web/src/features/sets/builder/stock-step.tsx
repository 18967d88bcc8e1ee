import { proposalRequestSchema, type DisplayUnit, type ProposalRequest, type Stock } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import AutoAwesomeOutlined from '@mui/icons-material/AutoAwesomeOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import FormControl from '@mui/material/FormControl';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Radio from '@mui/material/Radio';
import RadioGroup from '@mui/material/RadioGroup';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId } from 'react';
import { useController, useForm, useWatch, type Control } from 'react-hook-form';
import { Link as RouterLink } from 'react-router-dom';
import { z } from 'zod';
import { Figures } from '../../../components/display/figures';
import { FormNumberField } from '../../../components/form/form-number-field';
import { paths } from '../../../config/paths';
import { useInterchange } from '../api/sets';
import { formatHeight } from '../set-format';

// The contract coerces the count from text; the form already holds a number, so it checks one.
const requestFormSchema = proposalRequestSchema.extend({
  setCount: z
    .number({ error: 'Enter how many sets, as a whole number.' })
    .int('Enter how many sets, as a whole number.')
    .min(1, 'Ask for at least one set.')
    .max(200, 'Ask for at most 200 sets at a time.'),
});

/** How many whole sets `available` parts can make at most (fewer when they do not match). */
const setsAtMost = (stock: Stock) => Math.floor(stock.available / stock.setSize);

function WindowLine({ stock, unit }: { stock: Stock; unit: DisplayUnit }) {
  if (stock.windowConflict)
    return (
      <Typography variant="body2" sx={{ color: 'warning.main', fontWeight: 500 }}>
        Sets sold before already disagree: no new part can match them all.
      </Typography>
    );
  if (!stock.window)
    return (
      <Typography variant="body2" sx={{ color: 'text.secondary' }}>
        Nothing sold yet: every released part can go into a set.
      </Typography>
    );
  return (
    <Typography variant="body2" sx={{ color: 'text.secondary' }}>
      Interchange window{' '}
      <Figures>
        {formatHeight(stock.window.low, unit)} to {formatHeight(stock.window.high, unit)}
      </Figures>
    </Typography>
  );
}

/** One part number as a choice: what its free stock can make. */
function StockChoice({ stock, unit, checked }: { stock: Stock; unit: DisplayUnit; checked: boolean }) {
  const labelId = useId();
  const most = setsAtMost(stock);
  return (
    <Paper
      variant="outlined"
      component="label"
      sx={{
        display: 'flex',
        gap: 1,
        p: 1.5,
        pr: 2,
        cursor: 'pointer',
        borderColor: checked ? 'primary.main' : undefined,
        borderWidth: checked ? 2 : 1,
        m: checked ? 0 : '1px',
      }}
    >
      <Radio value={stock.partNumber} slotProps={{ input: { 'aria-labelledby': labelId } }} sx={{ mt: -0.5 }} />
      <Stack spacing={0.25} sx={{ minWidth: 0 }}>
        <Typography id={labelId} sx={{ fontWeight: 600 }}>
          {stock.partNumber} rev {stock.revision} — {stock.title}
        </Typography>
        <Typography variant="body2">
          <Figures>{stock.available}</Figures> free {stock.available === 1 ? 'part' : 'parts'} inside the window
          {stock.outsideWindow > 0 ? (
            <>
              {' '}
              · <Figures>{stock.outsideWindow}</Figures> outside it
            </>
          ) : null}{' '}
          · sets of {stock.setSize} · band <Figures>{formatHeight(stock.matchingBand, unit)}</Figures>
        </Typography>
        <WindowLine stock={stock} unit={unit} />
        <Typography variant="body2" sx={{ color: 'text.secondary' }}>
          {most > 0 ? `Enough parts for up to ${most} ${most === 1 ? 'set' : 'sets'}.` : 'Not enough parts for a set.'}
        </Typography>
      </Stack>
    </Paper>
  );
}

function PartNumberChoices({
  control,
  stock,
  unit,
}: {
  control: Control<ProposalRequest>;
  stock: readonly Stock[];
  unit: DisplayUnit;
}) {
  const labelId = useId();
  const {
    field: { value, onChange, ref },
    fieldState: { error },
  } = useController({ control, name: 'partNumber' });
  return (
    <FormControl error={Boolean(error)}>
      <FormLabel id={labelId} sx={{ mb: 1 }}>
        Part number
      </FormLabel>
      <RadioGroup
        aria-labelledby={labelId}
        value={value}
        onChange={(_event, next) => onChange(next)}
        ref={ref}
        sx={{ display: 'grid', gridTemplateColumns: 'repeat(auto-fill, minmax(320px, 1fr))', gap: 1.5 }}
      >
        {stock.map((s) => (
          <StockChoice key={s.partNumber} stock={s} unit={unit} checked={s.partNumber === value} />
        ))}
      </RadioGroup>
      {error?.message ? <FormHelperText>{error.message}</FormHelperText> : null}
    </FormControl>
  );
}

/** Where the chosen part number's window comes from, and the sold sets that disagree, if any. */
function InterchangeNote({ partNumber }: { partNumber: string }) {
  const { data } = useInterchange(partNumber);
  if (!data) return null;
  return (
    <Alert severity={data.conflicting.length ? 'warning' : 'info'}>
      {data.explanation}
      {data.conflicting.length ? (
        <>
          {' '}
          Sets that disagree:{' '}
          {data.conflicting.map((set, index) => (
            <span key={set.id}>
              {index ? ', ' : ''}
              <Link component={RouterLink} to={paths.set.getHref(set.id)}>
                {set.setNumber}
              </Link>
            </span>
          ))}
          .
        </>
      ) : null}
    </Alert>
  );
}

interface StockStepProps {
  stock: readonly Stock[];
  unit: DisplayUnit;
  proposing: boolean;
  onPropose: (request: ProposalRequest) => void;
}

/** Step 1: which part number, and how many sets. */
export function StockStep({ stock, unit, proposing, onPropose }: StockStepProps) {
  const { control, handleSubmit } = useForm<ProposalRequest>({
    resolver: zodResolver(requestFormSchema),
    defaultValues: { partNumber: stock.length === 1 ? stock[0]!.partNumber : '', setCount: 1 },
  });
  const partNumber = useWatch({ control, name: 'partNumber' });
  const chosen = stock.find((s) => s.partNumber === partNumber);
  if (stock.length === 0)
    return (
      <Typography sx={{ color: 'text.secondary' }}>
        No part number has a released spec yet. Sets are built from released parts of a released spec.
      </Typography>
    );
  return (
    <Box component="form" noValidate onSubmit={(event) => void handleSubmit(onPropose)(event)}>
      <Stack spacing={2.5}>
        <PartNumberChoices control={control} stock={stock} unit={unit} />
        {partNumber ? <InterchangeNote partNumber={partNumber} /> : null}
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'flex-start' } }}>
          <Box sx={{ width: { sm: 200 } }}>
            <FormNumberField
              control={control}
              name="setCount"
              label="How many sets"
              helperText={chosen ? `Up to ${setsAtMost(chosen)} from stock` : undefined}
            />
          </Box>
          <Button
            type="submit"
            variant="contained"
            size="large"
            startIcon={<AutoAwesomeOutlined />}
            loading={proposing}
            sx={{ mt: { sm: 0.5 } }}
          >
            Propose sets
          </Button>
        </Stack>
      </Stack>
    </Box>
  );
}
