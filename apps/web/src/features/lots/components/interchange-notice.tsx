import type { DisplayUnit, LotDetail, WindowSummary } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import Alert from '@mui/material/Alert';
import { Figures } from '../../../components/display/figures';
import { nameFirst } from '../../../lib/format';

/** The interchange window in words: its limits, or why there is none. */
export function WindowText({ interchange, unit }: { interchange: WindowSummary; unit: DisplayUnit }) {
  if (interchange.conflict) return <>None — the sets sold before disagree</>;
  if (!interchange.window) return <>Open — no set of this part number sold yet</>;
  const length = (mm: number) => <Figures>{formatLength(mm, unit, { level: 'fine' })}</Figures>;
  return (
    <>
      {length(interchange.window.low)} to {length(interchange.window.high)} (from {interchange.soldSets} sold set
      {interchange.soldSets === 1 ? '' : 's'})
    </>
  );
}

// A big lot can have thousands of such parts: the notice names a few, the parts list flags every one.
const NAMED_SERIALS = 10;

/** Warns about the lot's parts that would not match sets sold before; they are never offered for sets. */
export function InterchangeNotice({ lot, unit }: { lot: LotDetail; unit: DisplayUnit }) {
  const { outsideSerials, conflict } = lot.interchange;
  if (conflict)
    return (
      <Alert severity="warning">
        The {lot.spec.partNumber} sets sold before already disagree, so no new part can match them all. Sales cannot
        build new sets of this part number until engineering decides how to treat it.
      </Alert>
    );
  if (!outsideSerials.length) return null;
  const named = `${nameFirst(outsideSerials, NAMED_SERIALS)}${outsideSerials.length > NAMED_SERIALS ? ' parts' : ''}`;
  return (
    <Alert severity="warning">
      {named} would not match {lot.spec.partNumber} sets sold before: the height is outside the interchange window (
      <WindowText interchange={lot.interchange} unit={unit} />
      ). {outsideSerials.length === 1 ? 'It is' : 'They are'} not offered for new sets.
    </Alert>
  );
}
