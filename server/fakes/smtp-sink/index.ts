/**
 * The local SMTP sink: accepts every message on loopback, parses it, stores it, and lists it over
 * HTTP for the app's admin Outbox and for tests. Never relays anything anywhere.
 */
import { createHash, randomUUID } from 'node:crypto';
import { createServer } from 'node:http';
import { join, resolve } from 'node:path';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { z } from 'zod';
import { extractLinks, MailStore } from './store';

const env = z
  .object({
    SMTP_SINK_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
    SMTP_SINK_HTTP_PORT: z.coerce.number().int().min(1).max(65535).default(2526),
    DATA_DIR: z.string().default('.data'),
  })
  .parse(process.env);

const store = new MailStore(join(resolve(env.DATA_DIR), 'mail'));

const addresses = (a: AddressObject | AddressObject[] | undefined) =>
  (Array.isArray(a) ? a : a ? [a] : []).flatMap((o) => o.value.map((v) => v.address ?? '')).filter(Boolean);

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS', 'AUTH'],
  banner: 'Bundlesmith local SMTP sink',
  size: 25 * 1024 * 1024,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        const to = addresses(mail.to);
        const html = typeof mail.html === 'string' ? mail.html : undefined;
        const files = mail.attachments.map((a) => a.content);
        const attachments = mail.attachments.map((a) => ({
          filename: a.filename ?? 'attachment',
          contentType: a.contentType,
          size: a.content.length,
          sha256: createHash('sha256').update(a.content).digest('hex'),
        }));
        store.add({
          id: randomUUID(),
          from: addresses(mail.from)[0] ?? session.envelope.mailFrom?.toString() ?? '',
          to: to.length ? to : session.envelope.rcptTo.map((r) => r.address),
          subject: mail.subject ?? '',
          text: mail.text ?? '',
          ...(html ? { html } : {}),
          links: extractLinks(mail.text, html),
          ...(attachments.length ? { attachments } : {}),
          receivedAt: new Date().toISOString(),
        }, files);
        callback();
      })
      .catch((err: Error) => callback(err));
  },
});
smtp.on('error', (err) => console.error('[smtp-sink]', err.message));
smtp.listen(env.SMTP_SINK_PORT, '127.0.0.1', () => console.log(`[smtp-sink] SMTP on 127.0.0.1:${env.SMTP_SINK_PORT}`));

const http = createServer((req, res) => {
  const url = new URL(req.url ?? '/', 'http://sink');
  const send = (status: number, body: unknown) => {
    res.writeHead(status, { 'content-type': 'application/json' }).end(JSON.stringify(body));
  };
  if (url.pathname === '/messages' && req.method === 'GET') {
    return send(200, { items: store.list(url.searchParams.get('to') ?? undefined) });
  }
  const file = /^\/messages\/([\w-]+)\/attachments\/(\d+)$/.exec(url.pathname);
  if (file && req.method === 'GET') {
    const found = store.attachment(file[1]!, Number(file[2]));
    if (!found) return send(404, { error: { code: 'not-found', message: 'No such attachment.' } });
    res.writeHead(200, { 'content-type': found.meta.contentType, 'content-length': found.content.length }).end(found.content);
    return;
  }
  if (url.pathname === '/messages' && req.method === 'DELETE') {
    store.clear();
    return send(200, { items: [] });
  }
  send(404, { error: { code: 'not-found', message: 'GET or DELETE /messages, GET /messages/:id/attachments/:index' } });
});
http.listen(env.SMTP_SINK_HTTP_PORT, '127.0.0.1', () =>
  console.log(`[smtp-sink] messages at http://127.0.0.1:${env.SMTP_SINK_HTTP_PORT}/messages`),
);

const stop = () => {
  smtp.close(() => undefined);
  http.close();
  process.exit(0);
};
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
