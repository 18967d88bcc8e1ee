import { formatLength, type LengthUnit, type ResolutionLevel } from '@evenset/metrology';
import type { GridColDef, GridValidRowModel } from '@mui/x-data-grid';
import { formatSmallLength } from '../../lib/small-length';

export const UNIT_SYMBOLS: Record<LengthUnit, string> = { in: 'in', mm: 'mm', um: 'µm' };

/** A number in monospaced figures, right-aligned so the decimal points line up. */
export function figuresColumn<R extends GridValidRowModel>(column: GridColDef<R>): GridColDef<R> {
  return { align: 'right', headerAlign: 'right', cellClassName: 'figures', width: 130, ...column };
}

/**
 * A length column: stored millimetres shown in `unit` at the trade's resolution, the unit once in
 * the header and not in every cell. `value` picks the length from the row (null shows a dash);
 * `small` keeps two significant digits for uncertainties and resolutions.
 */
export function lengthColumn<R extends GridValidRowModel>(
  field: string,
  title: string,
  unit: LengthUnit,
  value: (row: R) => number | null | undefined,
  options: { level?: ResolutionLevel; signed?: boolean; sortable?: boolean; small?: boolean; width?: number } = {},
): GridColDef<R> {
  return figuresColumn<R>({
    field,
    headerName: `${title} (${UNIT_SYMBOLS[unit]})`,
    sortable: options.sortable ?? false,
    ...(options.width ? { width: options.width } : {}),
    valueGetter: (_value, row) => {
      const mm = value(row);
      if (mm == null) return '—';
      return options.small ? formatSmallLength(mm, unit) : formatLength(mm, unit, { ...options, withSymbol: false });
    },
  });
}
