import type { Material } from '@evenset/contracts';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { SelectOption } from '../form/form-select-field';

/** Materials as drop-down options that show the coefficient and where it comes from. */
export function materialOptions(materials: readonly Material[]): SelectOption[] {
  return materials.map((material) => ({
    value: material.id,
    selectedLabel: `${material.name} — ${material.expansionPerK.toFixed(1)} × 10⁻⁶/K`,
    label: (
      <Stack sx={{ minWidth: 0 }}>
        <span>
          {material.name} — {material.expansionPerK.toFixed(1)} × 10⁻⁶/K
        </span>
        <Typography variant="caption" sx={{ color: 'text.secondary', whiteSpace: 'normal' }}>
          {material.confidence === 'from memory' ? 'To be checked — ' : 'Source: '}
          {material.source}
        </Typography>
      </Stack>
    ),
  }));
}
