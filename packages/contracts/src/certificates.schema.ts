import { z } from 'zod';
import { listQuerySchema } from './list.schema';
import { reasonSchema } from './masters.schema';

/*
 * Certificates of conformance. The facts are frozen at issue as canonical JSON and signed with the
 * shop's Ed25519 key; every length in them is a decimal string (never a float), in the spec's unit
 * and in millimetres.
 *
 * Routes (roles):
 * - POST /api/sets/:setId/certificates      sales, admin                     → Certificate
 * - GET  /api/certificates                  sales, service, engineer, admin  `certificateListQuerySchema` (q: number, code, set, order, customer) → Page<Certificate>
 * - GET  /api/certificates/:id              sales, service, engineer, admin  → Certificate
 * - GET  /api/certificates/:id/pdf          sales, service, engineer, admin  → application/pdf
 * - POST /api/certificates/:id/revocation   engineer, admin                  `revokeCertificateSchema` → Certificate
 * - POST /api/certificates/:id/email        sales, admin                     `emailCertificateSchema` → CertificateEmailed
 * - GET  /api/verify/:code                  public                           → Verification
 */

/** A length as printed: a decimal string with the digits the unit is read to. */
const lengthText = z.string();
const pair = z.object({ value: lengthText, mm: lengthText });

/** The version of the facts' shape, so a later change of layout can still read old certificates. */
export const CERTIFICATE_FORMAT = 'evenset-certificate/1';

export const certificateFactsSchema = z.object({
  format: z.literal(CERTIFICATE_FORMAT),
  certificateNumber: z.string(),
  verificationCode: z.string(),
  /** Where the certificate can be checked. */
  verifyUrl: z.string(),
  issuedAt: z.string(),
  issuedOn: z.string(),
  issuer: z.string(),
  shop: z.object({ name: z.string(), address: z.string() }),
  customer: z.object({ name: z.string(), orderReference: z.string() }),
  part: z.object({
    partNumber: z.string(),
    specRevision: z.string(),
    title: z.string(),
    /** The spec's unit: every `value` below is in it. */
    unit: z.enum(['in', 'mm']),
    nominal: pair,
    bandLower: pair,
    bandUpper: pair,
  }),
  set: z.object({
    setNumber: z.string(),
    kind: z.enum(['set', 'replacement']),
    spread: pair,
    matchingBand: pair,
    withinBand: z.boolean(),
  }),
  members: z.array(
    z.object({
      position: z.number(),
      serial: z.string(),
      lotNumber: z.string(),
      height: pair,
      expandedUncertainty: pair,
      coverageFactor: z.string(),
      inspectedOn: z.string(),
      /** °C, as decimal strings. */
      partTemperature: z.string(),
      masterTemperature: z.string(),
      master: z.string(),
      verdict: z.string(),
    }),
  ),
  /** For a replacement: the set it was chosen to match, as sold. */
  replaces: z
    .object({
      setNumber: z.string(),
      members: z.array(z.object({ serial: z.string(), height: pair })),
    })
    .nullable(),
  masters: z.array(
    z.object({
      code: z.string(),
      description: z.string(),
      calibrationCertificate: z.string(),
      calibratedOn: z.string(),
      dueOn: z.string(),
    }),
  ),
  decisionRule: z.object({ kind: z.enum(['simple', 'guarded']), text: z.string() }),
  uncertaintyStatement: z.string(),
  accreditationStatement: z.string(),
});
export type CertificateFacts = z.infer<typeof certificateFactsSchema>;

export const CERTIFICATE_STATUSES = ['genuine', 'revoked', 'altered'] as const;
export const certificateStatusSchema = z.enum(CERTIFICATE_STATUSES);
export type CertificateStatus = z.infer<typeof certificateStatusSchema>;

export const revocationSchema = z.object({ reason: z.string(), at: z.string(), by: z.string() });

/** A certificate as the signed-in screens list it. */
export const certificateSchema = z.object({
  id: z.string(),
  certificateNumber: z.string(),
  verificationCode: z.string(),
  setId: z.string(),
  setNumber: z.string(),
  customerId: z.string(),
  customerName: z.string(),
  customerEmail: z.string(),
  orderReference: z.string(),
  partNumber: z.string(),
  status: certificateStatusSchema,
  revocation: revocationSchema.nullable(),
  issuedBy: z.string(),
  createdAt: z.string(),
});
export type Certificate = z.infer<typeof certificateSchema>;

export const certificateListQuerySchema = listQuerySchema.extend({
  setId: z.uuid({ error: 'This is not a valid set id.' }).optional(),
  customerId: z.uuid({ error: 'This is not a valid customer id.' }).optional(),
});
export type CertificateListQuery = z.infer<typeof certificateListQuerySchema>;

export const revokeCertificateSchema = z.object({ reason: reasonSchema });
export type RevokeCertificateInput = z.infer<typeof revokeCertificateSchema>;

export const emailCertificateSchema = z.object({
  /** Defaults to the customer's contact e-mail. */
  recipient: z
    .email({ error: 'Enter an e-mail address such as buyer@example.com.' })
    .max(320, 'Use at most 320 characters.')
    .optional(),
});
export type EmailCertificateInput = z.infer<typeof emailCertificateSchema>;

export const certificateEmailedSchema = z.object({
  messageId: z.string(),
  recipient: z.string(),
  status: z.enum(['sent', 'failed']),
  error: z.string().nullable(),
});
export type CertificateEmailed = z.infer<typeof certificateEmailedSchema>;

/** What the public verification page shows. */
export const verificationSchema = z.object({
  status: certificateStatusSchema,
  /** The signature holds (false for an altered record). */
  signatureValid: z.boolean(),
  /** The signed facts, when they can be read. */
  facts: certificateFactsSchema.nullable(),
  /** Set when withdrawn, even if the record was also altered. */
  revocation: z.object({ reason: z.string(), at: z.string() }).nullable(),
  checkedAt: z.string(),
});
export type Verification = z.infer<typeof verificationSchema>;

/** Unambiguous characters for verification codes: no 0/O, 1/I/L, 2/Z, 5/S, 8/B. */
export const VERIFICATION_ALPHABET = 'ACDEFGHJKMNPQRTUVWXY34679';
export const VERIFICATION_CODE_LENGTH = 12;
