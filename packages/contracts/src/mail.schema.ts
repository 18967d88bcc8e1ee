import { z } from 'zod';
import { listQuerySchema } from './list.schema';

export const MAIL_KINDS = ['certificate', 'password-reset', 'digest'] as const;
export const mailKindSchema = z.enum(MAIL_KINDS);
export type MailKind = z.infer<typeof mailKindSchema>;

export const mailStatusSchema = z.enum(['sent', 'failed']);
export type MailStatus = z.infer<typeof mailStatusSchema>;

/** The outcome of handing one message to the mail server (a send or a retry). */
export const mailDeliverySchema = z.object({
  messageId: z.string(),
  status: mailStatusSchema,
  error: z.string().nullable(),
});
export type MailDelivery = z.infer<typeof mailDeliverySchema>;

/** A message Evenset wanted to send, with the outcome of its latest attempt. */
export const outboxMessageSchema = z.object({
  id: z.string(),
  kind: mailKindSchema,
  recipient: z.string(),
  subject: z.string(),
  createdAt: z.string(),
  status: mailStatusSchema,
  lastError: z.string().nullable(),
  lastAttemptAt: z.string().nullable(),
  attempts: z.number().int().min(0),
  attachments: z.array(z.string()),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

/** Newest first; `q` searches recipient and subject. */
export const outboxListQuerySchema = listQuerySchema;
export type OutboxListQuery = z.infer<typeof outboxListQuerySchema>;

export const capturedAttachmentSchema = z.object({
  filename: z.string(),
  contentType: z.string(),
  size: z.number().int().min(0),
});
export type CapturedAttachment = z.infer<typeof capturedAttachmentSchema>;

/** A message the local mail catcher received, as parsed from its raw MIME. */
export const capturedMailSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  date: z.string().nullable(),
  attachments: z.array(capturedAttachmentSchema),
});
export type CapturedMail = z.infer<typeof capturedMailSchema>;

export const capturedMailDetailSchema = capturedMailSchema.extend({ text: z.string() });
export type CapturedMailDetail = z.infer<typeof capturedMailDetailSchema>;
