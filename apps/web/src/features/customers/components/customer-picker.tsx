import type { Customer } from '@evenset/contracts';
import Autocomplete from '@mui/material/Autocomplete';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useEffect, useState, type Ref } from 'react';
import { useCustomers } from '../api/customers';

interface CustomerPickerProps {
  value: Customer | null;
  onChange: (customer: Customer | null) => void;
  /** What the person typed, e.g. to pre-fill "New customer". */
  onTextChange?: (text: string) => void;
  error?: string | undefined;
  inputRef?: Ref<HTMLInputElement>;
}

/** Finds a customer by name or e-mail as the person types (the server searches). */
export function CustomerPicker({ value, onChange, onTextChange, error, inputRef }: CustomerPickerProps) {
  const [text, setText] = useState('');
  const [q, setQ] = useState('');
  useEffect(() => {
    const timer = setTimeout(() => setQ(text.trim()), 250);
    return () => clearTimeout(timer);
  }, [text]);
  // Once a customer is chosen the field shows their name: search for everyone again, not that name.
  const search = value && text === value.name ? '' : q;
  const { data, isLoading } = useCustomers({ page: 0, pageSize: 25, sort: 'name:asc', q: search || undefined });
  const options = data?.items ?? [];
  return (
    <Autocomplete
      value={value}
      onChange={(_event, next) => onChange(next)}
      inputValue={text}
      onInputChange={(_event, next) => {
        setText(next);
        onTextChange?.(next);
      }}
      options={value && !options.some((o) => o.id === value.id) ? [value, ...options] : options}
      filterOptions={(all) => all}
      getOptionLabel={(customer) => customer.name}
      isOptionEqualToValue={(a, b) => a.id === b.id}
      loading={isLoading}
      noOptionsText={search ? `No customer matches “${search}”.` : 'No customers yet.'}
      renderOption={({ key, ...props }, customer) => (
        <li key={key} {...props}>
          <Stack>
            <span>{customer.name}</span>
            <Typography variant="caption" sx={{ color: 'text.secondary' }}>
              {customer.contactEmail} · {customer.orderCount} {customer.orderCount === 1 ? 'order' : 'orders'}
            </Typography>
          </Stack>
        </li>
      )}
      renderInput={(params) => (
        <TextField
          {...params}
          inputRef={inputRef}
          label="Customer"
          error={Boolean(error)}
          helperText={error ?? 'Type part of the name or e-mail.'}
        />
      )}
    />
  );
}
