import {
  capturedMailDetailSchema,
  capturedMailSchema,
  mailDeliverySchema,
  outboxMessageSchema,
  pageOf,
  type CapturedMail,
  type CapturedMailDetail,
  type ListQuery,
  type MailDelivery,
  type OutboxMessage,
  type Page,
} from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';
import { apiKey, useApi, useRevalidateUnder } from '../../../lib/swr';

const OUTBOX_PATH = '/outbox';
const messagesPageSchema = pageOf(outboxMessageSchema);
const capturedPageSchema = pageOf(capturedMailSchema);

export function useOutboxMessages(query: ListQuery) {
  return useApi<Page<OutboxMessage>>(apiKey(`${OUTBOX_PATH}/messages`, messagesPageSchema, query), {
    keepPreviousData: true,
  });
}

export function useCapturedMail(query: ListQuery) {
  return useApi<Page<CapturedMail>>(apiKey(`${OUTBOX_PATH}/captured`, capturedPageSchema, query), {
    keepPreviousData: true,
  });
}

export function useCapturedMailDetail(id: string | null) {
  return useApi<CapturedMailDetail>(
    id ? apiKey(`${OUTBOX_PATH}/captured/${encodeURIComponent(id)}`, capturedMailDetailSchema) : null,
  );
}

export function retryMessage(id: string): Promise<MailDelivery> {
  return apiWrite('POST', `${OUTBOX_PATH}/messages/${encodeURIComponent(id)}/retry`, undefined, mailDeliverySchema);
}

/** A plain link downloads it: the browser sends the session cookie, no script needed. */
export function attachmentHref(id: string, index: number): string {
  return `/api${OUTBOX_PATH}/captured/${encodeURIComponent(id)}/attachments/${index}`;
}

/** A retry changes the sent list and, once delivered, the received one. */
export function useRevalidateOutbox(): () => Promise<unknown> {
  return useRevalidateUnder(OUTBOX_PATH);
}
