import { GRINDING_CAUTION_ITEMS } from '@evenset/contracts';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';

interface GrindingCautionsProps {
  /** A recorded rework's cautions as the server stored them, shown instead of the list. */
  text?: string | undefined;
  /** The cautions a grind request carries; the shared list when left out. */
  items?: readonly string[] | undefined;
  /** Larger type, for a page the shop floor works from. */
  prominent?: boolean;
}

/** The usual surface-grinding cautions, shown wherever a rework or a grind-to-target is asked for. */
export function GrindingCautions({ text, items = GRINDING_CAUTION_ITEMS, prominent = false }: GrindingCautionsProps) {
  return (
    <Alert
      severity="warning"
      variant="outlined"
      sx={{ '& li': { mb: 0.25 }, ...(prominent ? { fontSize: '1.05rem', borderWidth: 2 } : {}) }}
    >
      <AlertTitle sx={prominent ? { fontSize: '1.15rem', fontWeight: 700 } : undefined}>Before grinding</AlertTitle>
      {text ?? (
        <ul style={{ margin: 0, paddingLeft: 20 }}>
          {items.map((item) => (
            <li key={item}>{item}</li>
          ))}
        </ul>
      )}
    </Alert>
  );
}
