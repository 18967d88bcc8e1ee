import type { DisplayUnit, GrindRequestDetail, ReplacementCandidate } from '@evenset/contracts';
import Typography from '@mui/material/Typography';
import { useState, type FormEvent } from 'react';
import { FormDialog } from '../../../components/form/form-dialog';
import { describeError } from '../../../lib/errors';
import { GrindingCautions } from '../../lots/components/grinding-cautions';
import { formatHeight } from '../../sets/set-format';
import { createGrindRequest } from '../api/replacements';

interface GrindRequestConfirmDialogProps {
  originalSetId: string;
  setNumber: string;
  part: ReplacementCandidate;
  centre: number;
  unit: DisplayUnit;
  onDone: (request: GrindRequestDetail) => Promise<unknown>;
  onClose: () => void;
}

/** Says what the shop floor will be asked to do before the request is raised. */
export function GrindRequestConfirmDialog(props: GrindRequestConfirmDialogProps) {
  const { originalSetId, setNumber, part, centre, unit, onDone, onClose } = props;
  const [submitting, setSubmitting] = useState(false);
  const [error, setError] = useState<string>();
  const onSubmit = async (event: FormEvent) => {
    event.preventDefault();
    setSubmitting(true);
    setError(undefined);
    try {
      await onDone(await createGrindRequest({ originalSetId, partId: part.id }));
    } catch (failure) {
      setError(describeError(failure));
      setSubmitting(false);
    }
  };
  return (
    <FormDialog
      open
      title={`Ask the shop floor to grind ${part.serial}`}
      submitLabel="Raise grind request"
      submitting={submitting}
      error={error}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event as FormEvent)}
    >
      <Typography>
        Grind {part.serial} from {formatHeight(part.height, unit)} to {formatHeight(centre, unit)}, the centre of the
        window for set {setNumber}: {formatHeight(part.stockToCentre ?? 0, unit)} to remove. The part leaves released
        stock for rework until it is ground, re-inspected at the Bench and released again.
      </Typography>
      <GrindingCautions />
    </FormDialog>
  );
}
