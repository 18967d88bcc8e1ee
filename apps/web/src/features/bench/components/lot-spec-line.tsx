import type { DisplayUnit } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import Typography from '@mui/material/Typography';
import { Figures } from '../../../components/display/figures';
import { useLot } from '../../lots/api/get-lot';

/** The chosen lot's nominal and band, in the inspector's unit, so the first readings can be sanity-checked. */
export function LotSpecLine({ lotId, unit }: { lotId: string; unit: DisplayUnit }) {
  const { data: lot } = useLot(lotId || null);
  if (!lot) return null;
  const { spec } = lot;
  const length = (mm: number) => <Figures>{formatLength(mm, unit, { level: 'fine' })}</Figures>;
  return (
    <Typography data-testid="bench-lot-spec" sx={{ color: 'text.secondary' }}>
      {spec.partNumber} rev {spec.revision}: nominal {length(spec.nominal)}, band{' '}
      {length(spec.nominal + spec.band.lower)} to {length(spec.nominal + spec.band.upper)}
    </Typography>
  );
}
