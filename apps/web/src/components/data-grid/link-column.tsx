import Link from '@mui/material/Link';
import type { GridColDef, GridValidRowModel } from '@mui/x-data-grid';
import { Link as RouterLink } from 'react-router-dom';

/** The key column of a list whose rows open a page: the cell is a real link, for keyboards and new tabs. */
export function linkColumn<R extends GridValidRowModel>(
  column: GridColDef<R>,
  href: (row: R) => string,
): GridColDef<R> {
  return {
    ...column,
    renderCell: ({ row, formattedValue }) => (
      <Link component={RouterLink} to={href(row)} sx={{ fontWeight: 500 }} onClick={(event) => event.stopPropagation()}>
        {String(formattedValue ?? '')}
      </Link>
    ),
  };
}
