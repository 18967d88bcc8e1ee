import { MAX_CERTIFICATE_BYTES } from '@evenset/contracts';
import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import Button from '@mui/material/Button';
import FormHelperText from '@mui/material/FormHelperText';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId } from 'react';

const ACCEPTED_TYPES = ['application/pdf', 'image/png', 'image/jpeg'];
const LIMIT_MB = MAX_CERTIFICATE_BYTES / (1024 * 1024);

/** Why a chosen file cannot be sent, or null when it can. */
export function certificateFileProblem(file: File | null): string | null {
  if (!file) return 'Choose the calibration certificate file (PDF, PNG or JPEG).';
  if (!ACCEPTED_TYPES.includes(file.type)) return `“${file.name}” is not a PDF, PNG or JPEG file.`;
  if (file.size > MAX_CERTIFICATE_BYTES)
    return `“${file.name}” is ${(file.size / (1024 * 1024)).toFixed(1)} MB; the limit is ${LIMIT_MB} MB.`;
  return null;
}

interface CertificateFileFieldProps {
  file: File | null;
  error: string | null;
  disabled: boolean;
  onChange: (file: File | null) => void;
}

/** Picks the certificate file; says the accepted kinds and the size limit before anyone tries. */
export function CertificateFileField({ file, error, disabled, onChange }: CertificateFileFieldProps) {
  const inputId = useId();
  const helpId = useId();
  return (
    <Stack spacing={0.5}>
      <Stack direction="row" spacing={1.5} sx={{ alignItems: 'center' }}>
        <Button
          component="label"
          htmlFor={inputId}
          variant="outlined"
          startIcon={<UploadFileOutlined />}
          disabled={disabled}
          sx={{ flexShrink: 0 }}
        >
          {file ? 'Choose another file' : 'Choose certificate file'}
          <input
            id={inputId}
            type="file"
            hidden
            accept={ACCEPTED_TYPES.join(',')}
            aria-describedby={helpId}
            onChange={(event) => onChange(event.target.files?.[0] ?? null)}
          />
        </Button>
        <Typography sx={{ overflowWrap: 'anywhere' }}>
          {file ? `${file.name} (${Math.max(1, Math.round(file.size / 1024))} kB)` : 'No file chosen'}
        </Typography>
      </Stack>
      <FormHelperText id={helpId} error={Boolean(error)}>
        {error ?? `PDF, PNG or JPEG, at most ${LIMIT_MB} MB.`}
      </FormHelperText>
    </Stack>
  );
}
