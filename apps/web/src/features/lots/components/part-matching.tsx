import type { DisplayUnit, PartDetail } from '@evenset/contracts';
import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { WindowText } from './interchange-notice';

/** Where the part stands for matching: the set that holds it, or whether it can still match sets sold before. */
export function PartMatching({ part, unit }: { part: PartDetail; unit: DisplayUnit }) {
  if (part.set)
    return (
      <Typography sx={{ mt: 1 }}>
        {part.set.kind === 'replacement' ? 'Sent as a replacement in ' : 'Allocated to set '}
        <Link component={RouterLink} to={paths.set.getHref(part.set.id)}>
          {part.set.setNumber}
        </Link>
        .
      </Typography>
    );
  if (part.interchange.outside)
    return (
      <Alert severity="warning" sx={{ mt: 2 }}>
        Would not match {part.partNumber} sets sold before: its height is outside the interchange window (
        <WindowText interchange={part.interchange} unit={unit} />
        ). It is not offered for new sets.
      </Alert>
    );
  return null;
}
