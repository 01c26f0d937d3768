/**
 * The admin's mail log (`/api/admin/mail`): every e-mail the app queued, whether it went out, and a
 * resend. Shapes from `@shared/schemas/mail-log`.
 */
import type { ListMailQuery, MailDetail, MailList } from '@shared/schemas/mail-log';
import { request } from './http';

/** `GET /api/admin/mail`: one page, newest first, filtered by status and by text in recipient or subject. */
export function fetchMailLog(query: Partial<ListMailQuery> = {}): Promise<MailList> {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined && value !== '') params.set(key, String(value));
  const qs = params.toString();
  return request<MailList>(`/admin/mail${qs ? `?${qs}` : ''}`);
}

/** `GET /api/admin/mail/:id`: one message with its text. */
export function fetchMail(id: string): Promise<MailDetail> {
  return request<MailDetail>(`/admin/mail/${id}`);
}

/** `POST /api/admin/mail/:id/resend`: queues a copy and returns it; 409 `still-queued` while the message waits to be sent. */
export function resendMail(id: string): Promise<MailDetail> {
  return request<MailDetail>(`/admin/mail/${id}/resend`, { method: 'POST' });
}
