import { ROLE_LABELS, ROLES, type Role } from '@evenset/contracts';
import Checkbox from '@mui/material/Checkbox';
import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import type { Ref } from 'react';

interface RoleCheckboxesProps {
  value: readonly Role[];
  onChange: (roles: Role[]) => void;
  error?: string | undefined;
  /** Lets the form focus the group when it needs attention. */
  inputRef?: Ref<HTMLInputElement>;
}

export function RoleCheckboxes({ value, onChange, error, inputRef }: RoleCheckboxesProps) {
  const toggle = (role: Role, checked: boolean) =>
    onChange(ROLES.filter((each) => (each === role ? checked : value.includes(each))));
  return (
    <FormControl component="fieldset" error={Boolean(error)}>
      <FormLabel component="legend">Roles</FormLabel>
      <FormGroup sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' }, columnGap: 2 }}>
        {ROLES.map((role, index) => (
          <FormControlLabel
            key={role}
            label={ROLE_LABELS[role]}
            control={
              <Checkbox
                checked={value.includes(role)}
                onChange={(event) => toggle(role, event.target.checked)}
                slotProps={{ input: { ref: index === 0 ? inputRef : undefined } }}
              />
            }
          />
        ))}
      </FormGroup>
      <FormHelperText>{error ?? 'A person may hold several roles.'}</FormHelperText>
    </FormControl>
  );
}
