import AddOutlined from '@mui/icons-material/AddOutlined';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import IconButton from '@mui/material/IconButton';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { visuallyHidden } from '../../../../components/display/visually-hidden';

interface EditableRowsProps {
  title: string;
  hint: ReactNode;
  /** What one row is, e.g. "station", for the add and remove buttons. */
  noun: string;
  headers: readonly string[];
  /** Stable keys of the rows (useFieldArray's ids). */
  rowKeys: readonly string[];
  /** The cells of row `index`, one per header. */
  renderCells: (index: number) => ReactNode[];
  /** A problem with the list as a whole. */
  listError: ReactNode;
  onAdd: () => void;
  onRemove: (index: number) => void;
}

/** A titled table of form rows with add and remove buttons. */
export function EditableRows({
  title,
  hint,
  noun,
  headers,
  rowKeys,
  renderCells,
  listError,
  onAdd,
  onRemove,
}: EditableRowsProps) {
  return (
    <Stack spacing={1}>
      <Typography variant="h3">{title}</Typography>
      <Typography variant="body2" sx={{ color: 'text.secondary' }}>
        {hint}
      </Typography>
      {listError}
      {rowKeys.length > 0 ? (
        <Table size="small" aria-label={title} sx={{ '& td': { verticalAlign: 'top', borderBottom: 'none', px: 0.5 } }}>
          <TableHead>
            <TableRow>
              <TableCell sx={{ width: 40 }}>#</TableCell>
              {headers.map((header) => (
                <TableCell key={header}>{header}</TableCell>
              ))}
              <TableCell sx={{ width: 48 }}>
                <Box component="span" sx={visuallyHidden}>
                  Remove
                </Box>
              </TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {rowKeys.map((key, index) => (
              <TableRow key={key}>
                <TableCell sx={{ pt: 2, color: 'text.secondary' }}>{index + 1}</TableCell>
                {renderCells(index).map((cell, column) => (
                  <TableCell key={headers[column]}>{cell}</TableCell>
                ))}
                <TableCell>
                  <IconButton aria-label={`Remove ${noun} ${index + 1}`} onClick={() => onRemove(index)}>
                    <DeleteOutlined />
                  </IconButton>
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      ) : null}
      <div>
        <Button startIcon={<AddOutlined />} onClick={onAdd}>
          Add {noun}
        </Button>
      </div>
    </Stack>
  );
}
