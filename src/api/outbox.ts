import { request } from './http';

/** One e-mail caught by the local SMTP sink. */
export interface CaughtMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  links: string[];
  receivedAt: string;
}

export async function fetchOutbox(): Promise<CaughtMail[]> {
  const reply = await request<{ items: CaughtMail[] } | CaughtMail[]>('/dev/outbox');
  const items = Array.isArray(reply) ? reply : reply.items;
  return items
    .map((mail) => ({ ...mail, to: Array.isArray(mail.to) ? mail.to : [String(mail.to)] }))
    .sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
}
