import type { DisplayUnit, FreePart } from '@evenset/contracts';
import { fitsBand } from '@evenset/metrology';
import DeleteOutlineOutlined from '@mui/icons-material/DeleteOutlineOutlined';
import SwapVertOutlined from '@mui/icons-material/SwapVertOutlined';
import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import ListItemText from '@mui/material/ListItemText';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { UNIT_SYMBOLS } from '../../../components/data-grid/length-column';
import { Figures } from '../../../components/display/figures';
import { StatusLabel } from '../../../components/display/status-label';
import { visuallyHidden } from '../../../components/display/visually-hidden';
import { monoFontFamily } from '../../../theme/tokens';
import { SpreadBar } from '../components/spread-bar';
import { formatHeight } from '../set-format';
import { spreadWith, type DraftSet, type SetCheck } from './draft';

interface SwapMenuProps {
  part: FreePart;
  parts: readonly FreePart[];
  spare: readonly FreePart[];
  band: number;
  unit: DisplayUnit;
  onSwap: (spareId: string) => void;
}

/** The spares that could take a part's place, each with the spread the set would then have. */
function SwapMenu({ part, parts, spare, band, unit, onSwap }: SwapMenuProps) {
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const menuId = useId();
  return (
    <>
      <Button
        size="small"
        startIcon={<SwapVertOutlined />}
        disabled={spare.length === 0}
        aria-label={`Swap ${part.serial}`}
        aria-haspopup="menu"
        aria-controls={anchor ? menuId : undefined}
        aria-expanded={anchor ? 'true' : undefined}
        onClick={(event) => setAnchor(event.currentTarget)}
      >
        Swap
      </Button>
      <Menu
        id={menuId}
        anchorEl={anchor}
        open={anchor !== null}
        onClose={() => setAnchor(null)}
        slotProps={{ paper: { sx: { maxHeight: 360 } } }}
      >
        <Typography variant="caption" component="li" sx={{ px: 2, py: 0.5, color: 'text.secondary', display: 'block' }}>
          Put a spare in place of {part.serial}
        </Typography>
        {spare.map((candidate) => {
          const spread = spreadWith(parts, part.id, candidate);
          const within = fitsBand(0, spread, band);
          return (
            <MenuItem
              key={candidate.id}
              onClick={() => {
                setAnchor(null);
                onSwap(candidate.id);
              }}
            >
              <ListItemText
                primary={
                  <span style={{ fontFamily: monoFontFamily }}>
                    {candidate.serial} · {formatHeight(candidate.height, unit)}
                  </span>
                }
                secondary={`Lot ${candidate.lotNumber} · set spread would be ${formatHeight(spread, unit)}${
                  within ? '' : ' — over the band'
                }`}
              />
            </MenuItem>
          );
        })}
      </Menu>
    </>
  );
}

function problems(check: SetCheck, position: (index: number) => number): string[] {
  const said: string[] = [];
  if (!check.fitsBand) said.push('Its spread is wider than the matching band.');
  if (check.outsideWindow.length)
    said.push(`${check.outsideWindow.map((p) => p.serial).join(', ')} would not match the sets sold before.`);
  if (check.clashesWith.length)
    said.push(
      `It does not match set ${check.clashesWith.map((i) => position(i)).join(', ')} within the band; the sets of one order must match each other.`,
    );
  return said;
}

interface ProposedSetCardProps {
  /** 1-based position among the sets being built. */
  number: number;
  set: DraftSet;
  check: SetCheck;
  spare: readonly FreePart[];
  band: number;
  unit: DisplayUnit;
  onSwap: (partId: string, spareId: string) => void;
  onRemove: () => void;
}

/** One proposed set: its parts, its spread against the band, and the commands to change it. */
export function ProposedSetCard({ number, set, check, spare, band, unit, onSwap, onRemove }: ProposedSetCardProps) {
  const title = `Set ${number}`;
  const issues = problems(check, (i) => i + 1);
  return (
    <Paper
      component="article"
      variant="outlined"
      aria-label={title}
      sx={{ p: 2, borderColor: check.ok ? undefined : 'warning.main', borderWidth: check.ok ? 1 : 2 }}
    >
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', justifyContent: 'space-between', mb: 1.5 }}>
        <Stack direction="row" spacing={1.5} sx={{ alignItems: 'baseline' }}>
          <Typography variant="h3" component="h3">
            {title}
          </Typography>
          {check.ok ? null : (
            <StatusLabel icon={WarningAmberOutlined} tone="warning" label="Cannot be allocated as it is" />
          )}
        </Stack>
        <Button
          size="small"
          color="inherit"
          startIcon={<DeleteOutlineOutlined />}
          onClick={onRemove}
          aria-label={`Remove set ${number}`}
        >
          Remove set
        </Button>
      </Stack>
      <SpreadBar spread={check.spread} band={band} unit={unit} />
      {issues.length ? (
        <Alert severity="warning" sx={{ mt: 1.5 }}>
          {issues.join(' ')} Swap a part or remove the set.
        </Alert>
      ) : null}
      <Table size="small" aria-label={`Parts of set ${number}`} sx={{ mt: 1.5 }}>
        <TableHead>
          <TableRow>
            <TableCell>Serial</TableCell>
            <TableCell>Lot</TableCell>
            <TableCell align="right">Height ({UNIT_SYMBOLS[unit]})</TableCell>
            <TableCell align="right">
              <Box component="span" sx={visuallyHidden}>
                Swap
              </Box>
            </TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {set.parts.map((part) => (
            <TableRow key={part.id}>
              <TableCell>
                <Figures>{part.serial}</Figures>
              </TableCell>
              <TableCell>{part.lotNumber}</TableCell>
              <TableCell align="right">
                <Figures>{formatHeight(part.height, unit, false)}</Figures>
              </TableCell>
              <TableCell align="right" sx={{ py: 0 }}>
                <SwapMenu
                  part={part}
                  parts={set.parts}
                  spare={spare}
                  band={band}
                  unit={unit}
                  onSwap={(spareId) => onSwap(part.id, spareId)}
                />
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </Paper>
  );
}
