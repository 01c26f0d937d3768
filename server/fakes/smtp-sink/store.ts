import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/** A caught attachment: listed without its bytes; the bytes at GET /messages/:id/attachments/:index. */
export interface CaughtAttachment {
  filename: string;
  contentType: string;
  size: number;
  sha256: string;
}

export interface CaughtMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html?: string;
  /** every http(s) link in the text and html, in order, without duplicates */
  links: string[];
  attachments?: CaughtAttachment[];
  receivedAt: string;
}

/** Messages kept as one JSON file each, so they survive a restart of the sink. */
export class MailStore {
  private messages: CaughtMessage[] = [];

  constructor(private readonly dir: string) {
    mkdirSync(dir, { recursive: true });
    for (const file of readdirSync(dir).filter((f) => f.endsWith('.json'))) {
      this.messages.push(JSON.parse(readFileSync(join(dir, file), 'utf8')) as CaughtMessage);
    }
    this.messages.sort((a, b) => a.receivedAt.localeCompare(b.receivedAt));
  }

  /** Written to disk first: a message that could not be kept is refused, never half-caught. */
  add(message: CaughtMessage, files: Buffer[] = []) {
    mkdirSync(this.dir, { recursive: true });
    files.forEach((content, i) => writeFileSync(join(this.dir, `${message.id}.${i}.bin`), content));
    writeFileSync(join(this.dir, `${message.id}.json`), JSON.stringify(message, null, 2));
    this.messages.push(message);
  }

  /** The bytes of attachment `index` of message `id`, if caught. */
  attachment(id: string, index: number): { meta: CaughtAttachment; content: Buffer } | undefined {
    const meta = this.messages.find((m) => m.id === id)?.attachments?.[index];
    if (!meta) return undefined;
    return { meta, content: readFileSync(join(this.dir, `${id}.${index}.bin`)) };
  }

  /** Newest first, optionally only those addressed to `to`. */
  list(to?: string): CaughtMessage[] {
    const wanted = to?.toLowerCase();
    return this.messages.filter((m) => !wanted || m.to.some((t) => t.toLowerCase() === wanted)).reverse();
  }

  clear() {
    for (const m of this.messages) {
      rmSync(join(this.dir, `${m.id}.json`), { force: true });
      (m.attachments ?? []).forEach((_a, i) => rmSync(join(this.dir, `${m.id}.${i}.bin`), { force: true }));
    }
    this.messages = [];
  }
}

export function extractLinks(...bodies: (string | undefined)[]): string[] {
  const found = new Set<string>();
  for (const body of bodies) {
    for (const match of body?.matchAll(/https?:\/\/[^\s"'<>]+/g) ?? []) found.add(match[0].replace(/[.,;)]+$/, ''));
  }
  return [...found];
}
