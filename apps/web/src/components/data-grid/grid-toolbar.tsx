import CheckOutlined from '@mui/icons-material/CheckOutlined';
import CloseOutlined from '@mui/icons-material/CloseOutlined';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import SearchOutlined from '@mui/icons-material/SearchOutlined';
import TableRowsOutlined from '@mui/icons-material/TableRowsOutlined';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import InputAdornment from '@mui/material/InputAdornment';
import ListItemIcon from '@mui/material/ListItemIcon';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import TextField, { type TextFieldProps } from '@mui/material/TextField';
import Tooltip from '@mui/material/Tooltip';
import {
  ExportCsv,
  QuickFilter,
  QuickFilterClear,
  QuickFilterControl,
  Toolbar,
  type GridDensity,
  type GridSlotProps,
} from '@mui/x-data-grid';
import { useId, useState } from 'react';

declare module '@mui/x-data-grid' {
  interface ToolbarPropsOverrides {
    searchLabel: string;
    csvFileName: string;
    density: GridDensity;
    onDensityChange: (density: GridDensity) => void;
  }
}

function controlInputId(slotProps: TextFieldProps['slotProps']): string | undefined {
  const htmlInput = slotProps?.htmlInput;
  return htmlInput && typeof htmlInput === 'object' && 'id' in htmlInput && typeof htmlInput.id === 'string'
    ? htmlInput.id
    : undefined;
}

const DENSITY_LABELS: Record<GridDensity, string> = {
  compact: 'Compact rows',
  standard: 'Standard rows',
  comfortable: 'Roomy rows',
};

function DensityMenu({ density, onChange }: { density: GridDensity; onChange: (density: GridDensity) => void }) {
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const menuId = useId();
  return (
    <>
      <Button
        startIcon={<TableRowsOutlined />}
        aria-haspopup="menu"
        aria-controls={anchor ? menuId : undefined}
        aria-expanded={anchor ? 'true' : undefined}
        onClick={(event) => setAnchor(event.currentTarget)}
      >
        Row spacing
      </Button>
      <Menu id={menuId} anchorEl={anchor} open={anchor !== null} onClose={() => setAnchor(null)}>
        {(Object.keys(DENSITY_LABELS) as GridDensity[]).map((option) => (
          <MenuItem
            key={option}
            role="menuitemradio"
            aria-checked={option === density}
            selected={option === density}
            onClick={() => {
              onChange(option);
              setAnchor(null);
            }}
          >
            <ListItemIcon>{option === density ? <CheckOutlined fontSize="small" /> : null}</ListItemIcon>
            {DENSITY_LABELS[option]}
          </MenuItem>
        ))}
      </Menu>
    </>
  );
}

/** Quick search on the left; row spacing and CSV download on the right. */
export function GridToolbar({ searchLabel, csvFileName, density, onDensityChange }: GridSlotProps['toolbar']) {
  return (
    <Toolbar>
      {/* Always open: the search is the main tool of a list, not hidden behind an icon. */}
      <QuickFilter expanded debounceMs={350} style={{ flex: '1 1 280px', maxWidth: 420 }}>
        <QuickFilterControl
          render={({ ref, ...control }) => (
            <TextField
              {...control}
              // The control names its input; the label must point at that same id.
              id={controlInputId(control.slotProps)}
              inputRef={ref}
              label={searchLabel}
              size="small"
              fullWidth
              slotProps={{
                ...control.slotProps,
                input: {
                  ...control.slotProps?.input,
                  startAdornment: (
                    <InputAdornment position="start">
                      <SearchOutlined fontSize="small" />
                    </InputAdornment>
                  ),
                  endAdornment: control.value ? (
                    <InputAdornment position="end">
                      <QuickFilterClear edge="end" aria-label="Clear search">
                        <CloseOutlined fontSize="small" />
                      </QuickFilterClear>
                    </InputAdornment>
                  ) : null,
                },
              }}
            />
          )}
        />
      </QuickFilter>
      <Box sx={{ flexGrow: 1 }} />
      <DensityMenu density={density} onChange={onDensityChange} />
      <Tooltip title="Downloads the rows shown on this page" describeChild>
        <ExportCsv
          options={{ fileName: csvFileName, utf8WithBom: true }}
          render={<Button variant="text" startIcon={<FileDownloadOutlined />} />}
        >
          Download CSV
        </ExportCsv>
      </Tooltip>
    </Toolbar>
  );
}
