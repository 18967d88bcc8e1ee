import { createOrderSchema, type CreateOrderInput } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { createOrder, useRevalidateCustomers } from '../api/customers';

/** A new order reference for one customer; sets are allocated to it from the set builder. */
export function NewOrderDialog({
  customerId,
  customerName,
  onClose,
}: {
  customerId: string;
  customerName: string;
  onClose: () => void;
}) {
  const notify = useNotify();
  const revalidate = useRevalidateCustomers();
  const { control, handleSubmit, setError, formState } = useForm<CreateOrderInput>({
    resolver: zodResolver(createOrderSchema),
    defaultValues: { reference: '', notes: '' },
  });
  const onSubmit = handleSubmit(async (input) => {
    try {
      const order = await createOrder(customerId, input);
      await revalidate();
      notify(`Order ${order.reference} was added for ${customerName}.`);
      onClose();
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['reference', 'notes'] });
    }
  });
  return (
    <FormDialog
      open
      title={`New order for ${customerName}`}
      submitLabel="Add order"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <FormTextField
        control={control}
        name="reference"
        label="Order reference"
        autoComplete="off"
        autoFocus
        helperText="The customer's purchase order number, e.g. PO-4471."
      />
      <FormTextField control={control} name="notes" label="Notes" multiline minRows={2} />
    </FormDialog>
  );
}
