import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';

/**
 * The usual surface-grinding cautions, shown wherever a rework is asked for; a recorded rework
 * shows the cautions the server stored with it (`text`) instead of the list.
 */
export function GrindingCautions({ text }: { text?: string | undefined }) {
  return (
    <Alert severity="warning" variant="outlined" sx={{ '& li': { mb: 0.25 } }}>
      <AlertTitle>Before grinding</AlertTitle>
      {text ?? (
        <ul style={{ margin: 0, paddingLeft: 20 }}>
          <li>Use a wheel rated for the spindle speed, ring-tested before mounting, with its guard in place.</li>
          <li>Wear eye and face protection.</li>
          <li>Make sure the part is held on the chuck before starting.</li>
          <li>Handle coolant as its safety data sheet says.</li>
          <li>Follow local codes, the machine maker&apos;s instructions and licensed practice.</li>
        </ul>
      )}
    </Alert>
  );
}
