import {
  certificateEmailedSchema,
  certificateSchema,
  pageOf,
  verificationSchema,
  type Certificate,
  type CertificateEmailed,
  type ListQuery,
  type Page,
  type Verification,
} from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';
import { apiKey, useApi, useRevalidateUnder } from '../../../lib/swr';

export const CERTIFICATES_PATH = '/certificates';
const certificatesPageSchema = pageOf(certificateSchema);

export type CertificatesQuery = ListQuery & { setId?: string; customerId?: string };

export function useCertificates(query: CertificatesQuery) {
  return useApi<Page<Certificate>>(apiKey(CERTIFICATES_PATH, certificatesPageSchema, query), {
    keepPreviousData: true,
  });
}

/** After an issue or a revocation every certificate list is stale. */
export function useRevalidateCertificates(): () => Promise<unknown> {
  return useRevalidateUnder(CERTIFICATES_PATH);
}

/** The public check; no sign-in needed. */
export function useVerification(code: string) {
  return useApi<Verification>(apiKey(`/verify/${encodeURIComponent(code)}`, verificationSchema), {
    revalidateOnFocus: false,
  });
}

export function issueCertificate(setId: string): Promise<Certificate> {
  return apiWrite('POST', `/sets/${encodeURIComponent(setId)}/certificates`, {}, certificateSchema);
}

export function revokeCertificate(id: string, reason: string): Promise<Certificate> {
  return apiWrite('POST', `${CERTIFICATES_PATH}/${encodeURIComponent(id)}/revocation`, { reason }, certificateSchema);
}

export function emailCertificate(id: string, recipient: string): Promise<CertificateEmailed> {
  return apiWrite(
    'POST',
    `${CERTIFICATES_PATH}/${encodeURIComponent(id)}/email`,
    { recipient },
    certificateEmailedSchema,
  );
}

/** The PDF download address (same origin; the session cookie goes with it). */
export function certificatePdfHref(id: string): string {
  return `/api${CERTIFICATES_PATH}/${encodeURIComponent(id)}/pdf`;
}
