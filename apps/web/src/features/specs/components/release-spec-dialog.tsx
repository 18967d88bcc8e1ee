import type { Spec } from '@evenset/contracts';
import Typography from '@mui/material/Typography';
import { useForm } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRevalidateSpecs } from '../api/get-specs';
import { releaseSpec } from '../api/release-spec';

/** Asks before releasing: a released revision can no longer change. */
export function ReleaseSpecDialog({ spec, onClose }: { spec: Spec; onClose: () => void }) {
  const notify = useNotify();
  const revalidate = useRevalidateSpecs();
  const { handleSubmit, setError, formState } = useForm();
  const name = `${spec.partNumber} rev. ${spec.revision}`;
  const onSubmit = handleSubmit(async () => {
    try {
      await releaseSpec(spec.id);
      void revalidate();
      notify(`${name} is released and can be used for lots.`);
      onClose();
    } catch (error) {
      applyServerErrors(error, setError, { fields: [] });
    }
  });
  return (
    <FormDialog
      open
      title={`Release ${name}?`}
      submitLabel="Release"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <Typography>
        Lots can then be measured against it. A released revision is never changed again: a later change makes a new
        revision. Any earlier released revision of {spec.partNumber} becomes superseded.
      </Typography>
    </FormDialog>
  );
}
