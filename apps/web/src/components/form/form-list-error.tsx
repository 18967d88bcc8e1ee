import Alert from '@mui/material/Alert';
import { get, useFormState, type Control, type FieldValues, type Path } from 'react-hook-form';

/** The message of a list as a whole ("Add at least one station."), wherever the resolver put it. */
function listMessage(error: unknown): string | undefined {
  if (typeof error !== 'object' || error === null) return undefined;
  if ('message' in error && typeof error.message === 'string') return error.message;
  if ('root' in error) return listMessage(error.root);
  return undefined;
}

/** Shows a problem with a whole list of rows (too few, none at all) above or below its table. */
export function FormListError<T extends FieldValues>({ control, name }: { control: Control<T>; name: Path<T> }) {
  const { errors } = useFormState({ control, name });
  const message = listMessage(get(errors, name) as unknown);
  return message ? (
    <Alert severity="error" sx={{ py: 0 }}>
      {message}
    </Alert>
  ) : null;
}
