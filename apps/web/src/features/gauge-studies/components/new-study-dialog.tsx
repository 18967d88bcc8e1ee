import { createGaugeStudySchema, type CreateGaugeStudyInput, type Spec } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import Checkbox from '@mui/material/Checkbox';
import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { Controller, useForm, useWatch, type Control } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { useNotify } from '../../../components/feedback/notifications';
import { FieldGrid } from '../../../components/form/field-grid';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormNumberField } from '../../../components/form/form-number-field';
import { FormSelectField } from '../../../components/form/form-select-field';
import { FormTextField } from '../../../components/form/form-text-field';
import { paths } from '../../../config/paths';
import { applyServerErrors } from '../../../lib/form-errors';
import { useUsableInstruments, useUsableMasters } from '../../bench/api/bench-choices';
import { useLotParts } from '../../lots/api/get-lot';
import { useLots } from '../../lots/api/get-lots';
import { createGaugeStudy, useRevalidateGaugeStudies, useStudyInspectors } from '../api';

const ALL_PARTS = { page: 0, pageSize: 100, sort: 'serial:asc' } as const;

/** Ticks a subset of `choices` into an id list field. */
function CheckList({
  control,
  name,
  label,
  choices,
}: {
  control: Control<CreateGaugeStudyInput>;
  name: 'partIds' | 'inspectorIds';
  label: string;
  choices: readonly { id: string; label: string }[];
}) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <FormControl component="fieldset" error={!!fieldState.error}>
          <FormLabel component="legend">{label}</FormLabel>
          <FormGroup row>
            {choices.map((choice) => (
              <FormControlLabel
                key={choice.id}
                label={choice.label}
                control={
                  <Checkbox
                    checked={field.value.includes(choice.id)}
                    onChange={(_, checked) =>
                      field.onChange(
                        checked ? [...field.value, choice.id] : field.value.filter((id) => id !== choice.id),
                      )
                    }
                  />
                }
              />
            ))}
          </FormGroup>
          <FormHelperText>
            {fieldState.error?.message ?? (choices.length ? `${field.value.length} chosen.` : 'Nothing to choose yet.')}
          </FormHelperText>
        </FormControl>
      )}
    />
  );
}

/** The engineer's set-up: spec, parts from one of its lots, inspectors, trials, instrument and master. */
export function NewStudyDialog({ specs, onClose }: { specs: readonly Spec[]; onClose: () => void }) {
  const notify = useNotify();
  const navigate = useNavigate();
  const revalidate = useRevalidateGaugeStudies();
  const inspectors = useStudyInspectors();
  const masters = useUsableMasters();
  const instruments = useUsableInstruments();
  const { control, handleSubmit, setError, setValue, formState } = useForm<CreateGaugeStudyInput>({
    resolver: zodResolver(createGaugeStudySchema),
    defaultValues: { name: '', specId: '', partIds: [], inspectorIds: [], trials: 3, instrumentId: '', masterId: '' },
  });
  const specId = useWatch({ control, name: 'specId' });
  const [lotId, setLotId] = useState('');
  const lots = useLots({ page: 0, pageSize: 100, sort: 'lotNumber:desc', ...(specId ? { specId } : {}) });
  const parts = useLotParts(lotId || null, ALL_PARTS);

  const onSubmit = handleSubmit(async (input) => {
    try {
      const study = await createGaugeStudy(input);
      void revalidate();
      notify(`Gauge study “${study.name}” was set up: ${study.planned} measurements to make.`);
      void navigate(paths.gaugeStudy.getHref(study.id));
    } catch (error) {
      applyServerErrors(error, setError, {
        fields: ['name', 'specId', 'partIds', 'inspectorIds', 'trials', 'instrumentId', 'masterId'],
      });
    }
  });

  return (
    <FormDialog
      open
      title="New gauge study"
      submitLabel="Set up study"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <FormTextField
        control={control}
        name="name"
        label="Name"
        autoComplete="off"
        helperText="e.g. RB-40 height, May"
      />
      <FormSelectField
        control={control}
        name="specId"
        label="Spec revision"
        helperText="Its band is the tolerance of the study."
        options={specs.map((spec) => ({ value: spec.id, label: `${spec.partNumber} rev ${spec.revision}` }))}
      />
      <TextField
        select
        label="Parts from lot"
        value={lotId}
        disabled={!specId}
        onChange={(event) => {
          setLotId(event.target.value);
          setValue('partIds', []);
        }}
        helperText="Choose parts that cover the spread of the process (common practice: about 10)."
      >
        {(lots.data?.items ?? []).map((lot) => (
          <MenuItem key={lot.id} value={lot.id}>
            {lot.lotNumber}
          </MenuItem>
        ))}
      </TextField>
      <CheckList
        control={control}
        name="partIds"
        label="Parts"
        choices={(parts.data?.items ?? []).map((p) => ({ id: p.id, label: p.serial }))}
      />
      <CheckList
        control={control}
        name="inspectorIds"
        label="Inspectors"
        choices={(inspectors.data?.items ?? []).map((p) => ({ id: p.id, label: p.displayName }))}
      />
      <FieldGrid>
        <FormNumberField
          control={control}
          name="trials"
          label="Trials"
          helperText="Times each inspector measures each part."
        />
        <FormSelectField
          control={control}
          name="instrumentId"
          label="Instrument"
          options={(instruments.data?.items ?? []).map((i) => ({ value: i.id, label: i.code }))}
        />
        <FormSelectField
          control={control}
          name="masterId"
          label="Master gauge"
          options={(masters.data?.items ?? []).map((m) => ({ value: m.id, label: m.code }))}
        />
      </FieldGrid>
    </FormDialog>
  );
}
