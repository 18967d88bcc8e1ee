import type { DisplayUnit, Proposal } from '@evenset/contracts';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { UNIT_SYMBOLS } from '../../../components/data-grid/length-column';
import { Figures } from '../../../components/display/figures';
import { formatHeight } from '../set-format';
import type { Draft, SetCheck } from './draft';
import { ProposedSetCard } from './proposed-set-card';

interface ProposalStepProps {
  proposal: Proposal;
  draft: Draft;
  checks: readonly SetCheck[];
  unit: DisplayUnit;
  onSwap: (setKey: number, partId: string, spareId: string) => void;
  onRemove: (setKey: number) => void;
}

/** Step 2: the proposed sets, to check and adjust by hand, and the spare parts. */
export function ProposalStep({ proposal, draft, checks, unit, onSwap, onRemove }: ProposalStepProps) {
  const band = proposal.matchingBand;
  return (
    <Stack spacing={2}>
      <Alert severity={proposal.sets.length === 0 ? 'warning' : 'info'}>{proposal.explanation}</Alert>
      {draft.sets.length === 0 && proposal.sets.length > 0 ? (
        <Typography sx={{ color: 'text.secondary' }}>Every set was removed. Propose again to start over.</Typography>
      ) : null}
      <Box sx={{ display: 'grid', gridTemplateColumns: 'repeat(auto-fill, minmax(420px, 1fr))', gap: 2 }}>
        {draft.sets.map((set, index) => (
          <ProposedSetCard
            key={set.key}
            number={index + 1}
            set={set}
            check={checks[index]!}
            spare={draft.spare}
            band={band}
            unit={unit}
            onSwap={(partId, spareId) => onSwap(set.key, partId, spareId)}
            onRemove={() => onRemove(set.key)}
          />
        ))}
      </Box>
      <section aria-label="Spare parts">
        <Typography variant="h3" component="h3" sx={{ mb: 1 }}>
          Spare parts ({draft.spare.length})
        </Typography>
        {draft.spare.length === 0 ? (
          <Typography sx={{ color: 'text.secondary' }}>
            No free part inside the window is left over; nothing to swap in.
          </Typography>
        ) : (
          <>
            <Typography variant="body2" sx={{ color: 'text.secondary', mb: 1 }}>
              Free parts inside the interchange window that are in no proposed set, lowest first. Use “Swap” on a part
              of a set to put one of these in its place.
            </Typography>
            <Table size="small" aria-label="Spare parts" sx={{ maxWidth: 560 }}>
              <TableHead>
                <TableRow>
                  <TableCell>Serial</TableCell>
                  <TableCell>Lot</TableCell>
                  <TableCell align="right">Height ({UNIT_SYMBOLS[unit]})</TableCell>
                </TableRow>
              </TableHead>
              <TableBody>
                {draft.spare.map((part) => (
                  <TableRow key={part.id}>
                    <TableCell>
                      <Figures>{part.serial}</Figures>
                    </TableCell>
                    <TableCell>{part.lotNumber}</TableCell>
                    <TableCell align="right">
                      <Figures>{formatHeight(part.height, unit, false)}</Figures>
                    </TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          </>
        )}
      </section>
    </Stack>
  );
}
