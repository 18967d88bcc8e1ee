import { emailCertificateSchema, type Certificate } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormTextField } from '../../../components/form/form-text-field';
import { useNotify } from '../../../components/feedback/notifications';
import { applyServerErrors } from '../../../lib/form-errors';
import { emailCertificate } from '../api/certificates';

const formSchema = emailCertificateSchema.required();
type EmailForm = { recipient: string };

/** Sends the certificate's PDF; a message that could not be sent says why and stays in the Outbox. */
export function EmailCertificateDialog({ certificate, onClose }: { certificate: Certificate; onClose: () => void }) {
  const notify = useNotify();
  const [failure, setFailure] = useState<string | null>(null);
  const { control, handleSubmit, setError, formState } = useForm<EmailForm>({
    resolver: zodResolver(formSchema),
    defaultValues: { recipient: certificate.customerEmail },
  });
  const onSubmit = handleSubmit(async ({ recipient }) => {
    setFailure(null);
    try {
      const result = await emailCertificate(certificate.id, recipient);
      if (result.status === 'sent') {
        notify(`Certificate ${certificate.certificateNumber} sent to ${result.recipient}.`);
        onClose();
      } else {
        setFailure(result.error ?? 'The mail server did not take the message.');
      }
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['recipient'] });
    }
  });
  return (
    <FormDialog
      open
      title={`Send ${certificate.certificateNumber} by e-mail`}
      submitLabel={failure ? 'Try again' : 'Send'}
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <Typography>
        The certificate goes as a PDF attachment, with the link where {certificate.customerName} can check it.
      </Typography>
      {failure ? (
        <Alert severity="warning" role="alert">
          Not sent: {failure} The message is kept in the Outbox; try again here or from there.
        </Alert>
      ) : null}
      <FormTextField control={control} name="recipient" label="Recipient e-mail" type="email" autoFocus />
    </FormDialog>
  );
}
