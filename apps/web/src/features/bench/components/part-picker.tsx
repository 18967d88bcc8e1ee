import type { PartRow } from '@evenset/contracts';
import FlagOutlined from '@mui/icons-material/FlagOutlined';
import PlayArrowOutlined from '@mui/icons-material/PlayArrowOutlined';
import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { PageLoading } from '../../../components/page-loading';
import { useLotParts } from '../../lots/api/get-lot';

const WAITING = { page: 0, pageSize: 500, sort: 'serial:asc', status: 'not-inspected' } as const;
const large = { minHeight: 56, px: 3, fontSize: '1.1rem' };

interface PartPickerProps {
  lotId: string;
  lotNumber: string;
  onPart: (part: PartRow) => void;
  onUpload: () => void;
  onEnd: () => void;
}

/** The next part to measure: the first not yet inspected is proposed; another may be chosen. */
export function PartPicker({ lotId, lotNumber, onPart, onUpload, onEnd }: PartPickerProps) {
  const { data } = useLotParts(lotId, WAITING);
  const [chosen, setChosen] = useState<string>('');
  if (!data) return <PageLoading />;
  const waiting = data.items;
  const part = waiting.find((p) => p.id === chosen) ?? waiting[0];
  return (
    <Stack spacing={3} sx={{ maxWidth: 640 }}>
      {part ? (
        <>
          <Typography variant="h2" component="p" sx={{ fontSize: '2rem' }}>
            Next part: {part.serial}
          </Typography>
          <Typography sx={{ color: 'text.secondary', fontSize: '1.1rem' }}>
            {waiting.length} part{waiting.length === 1 ? '' : 's'} of lot {lotNumber} still to measure. Put{' '}
            {part.serial} on the plate, then press Enter.
          </Typography>
          <TextField
            select
            label="Serial"
            value={part.id}
            onChange={(event) => setChosen(event.target.value)}
            sx={{ '& .MuiInputBase-root': { minHeight: 56, fontSize: '1.25rem' } }}
          >
            {waiting.map((p) => (
              <MenuItem key={p.id} value={p.id}>
                {p.serial}
              </MenuItem>
            ))}
          </TextField>
          <div>
            <Button
              // A new proposal (the list refreshed after a save) is a new button, so it takes the focus.
              key={part.id}
              variant="contained"
              size="large"
              autoFocus
              startIcon={<PlayArrowOutlined />}
              onClick={() => onPart(part)}
              sx={large}
            >
              Measure {part.serial}
            </Button>
          </div>
        </>
      ) : (
        <Typography variant="h2" component="p" sx={{ fontSize: '2rem' }}>
          Every part of lot {lotNumber} is measured.
        </Typography>
      )}
      <Stack direction="row" useFlexGap spacing={2} sx={{ flexWrap: 'wrap' }}>
        <Button
          key={part ? 'more-parts' : 'all-measured'}
          variant={part ? 'outlined' : 'contained'}
          size="large"
          startIcon={<FlagOutlined />}
          onClick={onEnd}
          sx={large}
          autoFocus={!part}
        >
          End the run: master check
        </Button>
        <Button variant="outlined" size="large" startIcon={<UploadFileOutlined />} onClick={onUpload} sx={large}>
          Upload a CSV instead
        </Button>
      </Stack>
    </Stack>
  );
}
