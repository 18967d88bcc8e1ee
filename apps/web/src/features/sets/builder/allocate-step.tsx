import { allocateSetsSchema, type Customer } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import PersonAddOutlined from '@mui/icons-material/PersonAddOutlined';
import TaskAltOutlined from '@mui/icons-material/TaskAltOutlined';
import Alert from '@mui/material/Alert';
import Autocomplete from '@mui/material/Autocomplete';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState, type ReactNode } from 'react';
import { useController, useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { useCustomer } from '../../customers/api/customers';
import { CustomerPicker } from '../../customers/components/customer-picker';
import { NewCustomerDialog } from '../../customers/components/new-customer-dialog';

const orderFormSchema = allocateSetsSchema.pick({ customerId: true, orderReference: true });
export type OrderForm = z.infer<typeof orderFormSchema>;

interface AllocateStepProps {
  setCount: number;
  /** The customer chosen to begin with, if any. */
  initialCustomerId: string | null;
  /** Why the sets cannot be allocated as they stand; null when they can. */
  blocked: string | null;
  /** A refusal from the server, shown above the command with a way out. */
  refusal: ReactNode;
  /** Allocates; answers field messages from the server to show, or nothing. */
  onAllocate: (order: OrderForm, customer: Customer) => Promise<Partial<Record<keyof OrderForm, string>> | void>;
}

/** Step 3: whose order the sets go to, then the one command that allocates them. */
export function AllocateStep({ setCount, initialCustomerId, blocked, refusal, onAllocate }: AllocateStepProps) {
  const [customer, setCustomer] = useState<Customer | null>(null);
  const [typed, setTyped] = useState('');
  const [adding, setAdding] = useState(false);
  const { control, handleSubmit, setValue, setError, formState } = useForm<OrderForm>({
    resolver: zodResolver(orderFormSchema),
    defaultValues: { customerId: initialCustomerId ?? '', orderReference: '' },
  });
  const customerField = useController({ control, name: 'customerId' });
  const referenceField = useController({ control, name: 'orderReference' });
  const customerId = useWatch({ control, name: 'customerId' });
  const reference = useWatch({ control, name: 'orderReference' });
  const detail = useCustomer(customerId || null);
  const references = (detail.data?.orders ?? []).map((o) => o.reference);
  // The customer asked for in the address shows once their record arrives.
  const shown = customer ?? (detail.data && detail.data.id === initialCustomerId ? detail.data : null);
  const existing = references.includes(reference.trim());

  const choose = (next: Customer | null) => {
    setCustomer(next);
    setValue('customerId', next?.id ?? '', { shouldValidate: formState.isSubmitted });
  };
  const onSubmit = handleSubmit(async (order) => {
    if (!shown) return;
    const messages = await onAllocate(order, shown);
    for (const [field, message] of Object.entries(messages ?? {}))
      setError(field as keyof OrderForm, { type: 'server', message });
  });
  const label = `Allocate ${setCount} ${setCount === 1 ? 'set' : 'sets'}`;

  return (
    <>
      <Box component="form" noValidate onSubmit={(event) => void onSubmit(event)}>
        <Stack spacing={2.5}>
          <Stack direction={{ xs: 'column', md: 'row' }} spacing={2} sx={{ alignItems: { md: 'flex-start' } }}>
            <Box sx={{ flex: 1, minWidth: 0 }}>
              <CustomerPicker
                value={shown}
                onChange={choose}
                onTextChange={setTyped}
                error={customerField.fieldState.error?.message}
                inputRef={customerField.field.ref}
              />
            </Box>
            <Button
              variant="outlined"
              startIcon={<PersonAddOutlined />}
              onClick={() => setAdding(true)}
              sx={{ mt: { md: 1 }, flexShrink: 0 }}
            >
              New customer
            </Button>
            <Box sx={{ flex: 1, minWidth: 0 }}>
              <Autocomplete
                freeSolo
                options={references}
                inputValue={referenceField.field.value}
                onInputChange={(_event, next) => referenceField.field.onChange(next)}
                renderInput={(params) => (
                  <TextField
                    {...params}
                    inputRef={referenceField.field.ref}
                    onBlur={referenceField.field.onBlur}
                    label="Order reference"
                    error={Boolean(referenceField.fieldState.error)}
                    helperText={
                      referenceField.fieldState.error?.message ??
                      (reference.trim() === ''
                        ? "The customer's order, e.g. PO-4471: pick one of theirs or type a new one."
                        : existing
                          ? 'An existing order of this customer: the sets join it.'
                          : 'A new order with this reference is created.')
                    }
                  />
                )}
              />
            </Box>
          </Stack>
          {refusal}
          {formState.errors.root?.server?.message ? (
            <Alert severity="error">{formState.errors.root.server.message}</Alert>
          ) : null}
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
            <Button
              type="submit"
              variant="contained"
              size="large"
              startIcon={<TaskAltOutlined />}
              loading={formState.isSubmitting}
              disabled={blocked !== null || setCount === 0}
              aria-describedby={blocked ? 'allocate-blocked' : undefined}
            >
              {label}
            </Button>
            {blocked ? (
              <Typography id="allocate-blocked" sx={{ color: 'warning.main', fontWeight: 500 }}>
                {blocked}
              </Typography>
            ) : (
              <Typography sx={{ color: 'text.secondary' }}>
                All or nothing: the parts are reserved for this order in one step.
              </Typography>
            )}
          </Stack>
        </Stack>
      </Box>
      {adding ? (
        <NewCustomerDialog
          initialName={shown ? '' : typed}
          onCreated={(created) => {
            choose(created);
            setAdding(false);
          }}
          onClose={() => setAdding(false)}
        />
      ) : null}
    </>
  );
}
