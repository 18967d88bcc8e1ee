import {
  calibrationFormSchema,
  type Calibration,
  type CalibrationForm,
  type CalibrationRecorded,
  type DisplayUnit,
} from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import { zodResolver } from '@hookform/resolvers/zod';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormNumberField } from '../../../components/form/form-number-field';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { addCalibration } from '../api/add-calibration';
import { useRevalidateMasters } from '../api/get-masters';
import { CertificateFileField, certificateFileProblem } from './certificate-file-field';

type CalibrationValues = z.input<typeof calibrationFormSchema>;

interface CalibrationDialogProps {
  masterId: string;
  masterCode: string;
  unit: DisplayUnit;
  /** The record this one corrects; absent for a new calibration. */
  corrects?: Calibration | undefined;
  onClose: () => void;
  /** Called with the server's answer once the record is saved (the dialog is then done). */
  onRecorded: (result: CalibrationRecorded) => void;
}

/** Records a calibration with its certificate file, or a correction of an earlier one (which stays). */
export function CalibrationDialog({
  masterId,
  masterCode,
  unit,
  corrects,
  onClose,
  onRecorded,
}: CalibrationDialogProps) {
  const notify = useNotify();
  const revalidate = useRevalidateMasters();
  const [file, setFile] = useState<File | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const { control, handleSubmit, setError, formState } = useForm<CalibrationValues, unknown, CalibrationForm>({
    resolver: zodResolver(calibrationFormSchema),
    defaultValues: {
      calibratedOn: corrects?.calibratedOn ?? '',
      dueOn: corrects?.dueOn ?? '',
      unit,
      coverageFactor: corrects?.coverageFactor ?? 2,
      certificateNumber: '',
      supersedesId: corrects?.id,
      reason: corrects ? '' : undefined,
    },
  });

  const onSubmit = handleSubmit(async (input) => {
    const problem = certificateFileProblem(file);
    setFileError(problem);
    if (problem || !file) return;
    setProgress(0);
    try {
      const result = await addCalibration(masterId, input, file, setProgress);
      void revalidate();
      // A correction's result is its impact report, shown next; a plain calibration just says so.
      if (!result.impact) notify(`${masterCode}'s calibration was recorded.`);
      onRecorded(result);
    } catch (error) {
      setProgress(null);
      applyServerErrors(error, setError, {
        fields: [
          'calibratedOn',
          'dueOn',
          'calibratedSize',
          'expandedUncertainty',
          'coverageFactor',
          'certificateNumber',
          'reason',
        ],
      });
    }
  });

  const dateSlot = { inputLabel: { shrink: true } };
  return (
    <FormDialog
      open
      title={corrects ? `Correct calibration ${corrects.certificateNumber}` : `Record calibration of ${masterCode}`}
      submitLabel={corrects ? 'Record correction' : 'Record calibration'}
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      {corrects ? (
        <Typography>
          The record of {formatLength(corrects.calibratedSize, unit, { level: 'fine' })} from {corrects.calibratedOn}{' '}
          stays visible, marked as superseded. Every height measured against it is recomputed with the corrected values.
        </Typography>
      ) : null}
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <FormTextField control={control} name="calibratedOn" label="Calibrated on" type="date" slotProps={dateSlot} />
        <FormTextField control={control} name="dueOn" label="Due on" type="date" slotProps={dateSlot} />
      </Stack>
      <FormNumberField control={control} name="calibratedSize" label="Calibrated size" unit={unit} />
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <FormNumberField control={control} name="expandedUncertainty" label="Expanded uncertainty U" unit={unit} />
        <FormNumberField
          control={control}
          name="coverageFactor"
          label="Coverage factor k"
          helperText="2 for about 95 % coverage."
        />
      </Stack>
      <FormTextField control={control} name="certificateNumber" label="Certificate number" autoComplete="off" />
      {corrects ? (
        <FormTextField control={control} name="reason" label="Reason for the correction" multiline minRows={2} />
      ) : null}
      <CertificateFileField
        file={file}
        error={fileError}
        disabled={progress !== null}
        onChange={(chosen) => {
          setFile(chosen);
          setFileError(chosen ? certificateFileProblem(chosen) : null);
        }}
      />
      {progress !== null ? (
        <Stack spacing={0.5} role="status">
          <LinearProgress variant="determinate" value={Math.round(progress * 100)} aria-label="Upload progress" />
          <Typography variant="caption">
            {progress < 1 ? `Uploading… ${Math.round(progress * 100)} %` : 'Uploaded; the server is checking the file…'}
          </Typography>
        </Stack>
      ) : null}
    </FormDialog>
  );
}
