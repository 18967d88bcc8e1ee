import type { DisplayUnit, ReadingsImport, ReadingsPreview } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { describeError } from '../../../lib/errors';
import { monoFontFamily } from '../../../theme/tokens';
import { importReadings, previewReadings } from '../api/runs';

type Stage =
  | { kind: 'choose'; problem?: string }
  | { kind: 'sending'; what: string; share: number }
  | { kind: 'preview'; file: File; preview: ReadingsPreview }
  | { kind: 'done'; result: ReadingsImport };

const mono = { fontFamily: monoFontFamily, fontVariantNumeric: 'tabular-nums' } as const;

/** A run's readings from a CSV: choose the file, check the preview row by row, import all or nothing. */
export function CsvUploadDialog({
  runId,
  unit,
  onClose,
}: {
  runId: string;
  unit: DisplayUnit;
  onClose: (imported: boolean) => void;
}) {
  const [stage, setStage] = useState<Stage>({ kind: 'choose' });
  const progress = (what: string) => (share: number) => setStage({ kind: 'sending', what, share });

  const choose = async (file: File) => {
    try {
      setStage({ kind: 'sending', what: `Reading ${file.name}`, share: 0 });
      setStage({
        kind: 'preview',
        file,
        preview: await previewReadings(runId, file, progress(`Reading ${file.name}`)),
      });
    } catch (error) {
      setStage({ kind: 'choose', problem: describeError(error) });
    }
  };
  const importAll = async (file: File) => {
    try {
      setStage({ kind: 'done', result: await importReadings(runId, file, progress('Importing')) });
    } catch (error) {
      setStage({ kind: 'choose', problem: `Nothing was saved. ${describeError(error)}` });
    }
  };

  return (
    <Dialog open fullWidth maxWidth="md" onClose={() => stage.kind !== 'sending' && onClose(stage.kind === 'done')}>
      <DialogTitle>Upload readings from a CSV</DialogTitle>
      <DialogContent>
        {stage.kind === 'choose' ? (
          <Stack spacing={2}>
            <Typography>
              One row per reading with the columns serial, station, reading and unit (in or mm). Nothing is saved until
              you have checked the preview and pressed Import.
            </Typography>
            {stage.problem ? <Alert severity="error">{stage.problem}</Alert> : null}
            <Button variant="contained" component="label" size="large" sx={{ alignSelf: 'flex-start', minHeight: 56 }}>
              Choose a CSV file
              <input
                hidden
                type="file"
                accept=".csv,text/csv"
                onChange={(event) => {
                  const file = event.target.files?.[0];
                  if (file) void choose(file);
                }}
              />
            </Button>
          </Stack>
        ) : null}
        {stage.kind === 'sending' ? (
          <Stack spacing={1.5} aria-live="polite">
            <Typography>
              {stage.what}… {Math.round(stage.share * 100)} %
            </Typography>
            <LinearProgress variant={stage.share >= 1 ? 'indeterminate' : 'determinate'} value={stage.share * 100} />
          </Stack>
        ) : null}
        {stage.kind === 'preview' ? <PreviewTables preview={stage.preview} unit={unit} /> : null}
        {stage.kind === 'done' ? (
          <Alert severity="success">
            Imported {stage.result.readings} readings: {stage.result.inspections} part
            {stage.result.inspections === 1 ? '' : 's'} saved ({stage.result.parts.map((p) => p.serial).join(', ')}).
          </Alert>
        ) : null}
      </DialogContent>
      <DialogActions>
        {stage.kind === 'preview' ? (
          <>
            <Button onClick={() => setStage({ kind: 'choose' })}>Choose another file</Button>
            <Button
              variant="contained"
              disabled={stage.preview.errors.length > 0}
              onClick={() => void importAll(stage.file)}
            >
              Import all {stage.preview.parts.length} parts
            </Button>
          </>
        ) : (
          <Button disabled={stage.kind === 'sending'} onClick={() => onClose(stage.kind === 'done')}>
            Close
          </Button>
        )}
      </DialogActions>
    </Dialog>
  );
}

function PreviewTables({ preview, unit }: { preview: ReadingsPreview; unit: DisplayUnit }) {
  return (
    <Stack spacing={2}>
      {preview.errors.length > 0 ? (
        <>
          <Alert severity="error">
            {preview.errors.length} row{preview.errors.length === 1 ? ' needs' : 's need'} correcting; nothing will be
            imported until the file is right.
          </Alert>
          <Table size="small" aria-label="Problems in the file">
            <TableHead>
              <TableRow>
                <TableCell>Row</TableCell>
                <TableCell>Column</TableCell>
                <TableCell>Value</TableCell>
                <TableCell>What is wrong</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {preview.errors.map((e, i) => (
                <TableRow key={i}>
                  <TableCell sx={mono}>{e.row}</TableCell>
                  <TableCell>{e.column ?? '—'}</TableCell>
                  <TableCell sx={mono}>{e.value ?? '—'}</TableCell>
                  <TableCell>{e.message}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </>
      ) : (
        <Alert severity="info">
          {preview.rows} rows, {preview.parts.length} parts, no problems found. Import saves them all at once.
        </Alert>
      )}
      <Table size="small" aria-label="Readings by part">
        <TableHead>
          <TableRow>
            <TableCell>Serial</TableCell>
            <TableCell>Readings ({unit})</TableCell>
            <TableCell>Stations missing</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {preview.parts.map((p) => (
            <TableRow key={p.partId}>
              <TableCell>{p.serial}</TableCell>
              <TableCell sx={mono}>
                {p.readings
                  .map(
                    (r) =>
                      `${r.station} ${formatLength(r.reading, unit, { level: 'fine', withSymbol: false, signed: true })}`,
                  )
                  .join(' · ')}
              </TableCell>
              <TableCell>{p.missingStations.length ? p.missingStations.join(', ') : 'none'}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </Stack>
  );
}
