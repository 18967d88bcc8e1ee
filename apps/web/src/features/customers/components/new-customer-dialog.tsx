import { createCustomerSchema, type CreateCustomerInput, type Customer } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { createCustomer, useRevalidateCustomers } from '../api/customers';

interface NewCustomerDialogProps {
  /** Pre-fills the name, e.g. with what was typed in a customer search. */
  initialName?: string;
  onCreated: (customer: Customer) => void;
  onClose: () => void;
}

/** A new customer: name, contact e-mail (where certificates go) and notes. */
export function NewCustomerDialog({ initialName = '', onCreated, onClose }: NewCustomerDialogProps) {
  const notify = useNotify();
  const revalidate = useRevalidateCustomers();
  const { control, handleSubmit, setError, formState } = useForm<CreateCustomerInput>({
    resolver: zodResolver(createCustomerSchema),
    defaultValues: { name: initialName, contactEmail: '', notes: '' },
  });
  const onSubmit = handleSubmit(async (input) => {
    try {
      const customer = await createCustomer(input);
      void revalidate();
      notify(`${customer.name} was added.`);
      onCreated(customer);
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['name', 'contactEmail', 'notes'] });
    }
  });
  return (
    <FormDialog
      open
      title="New customer"
      submitLabel="Add customer"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => {
        // The dialog may open over another form (the set builder's): keep the submit to this one.
        event.stopPropagation();
        void onSubmit(event);
      }}
    >
      <FormTextField control={control} name="name" label="Customer name" autoComplete="organization" autoFocus />
      <FormTextField
        control={control}
        name="contactEmail"
        label="Contact e-mail"
        type="email"
        autoComplete="email"
        helperText="Certificates are sent here."
      />
      <FormTextField control={control} name="notes" label="Notes" multiline minRows={2} />
    </FormDialog>
  );
}
