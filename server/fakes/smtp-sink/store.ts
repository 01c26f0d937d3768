import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

export interface CaughtMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html?: string;
  /** every http(s) link in the text and html, in order, without duplicates */
  links: string[];
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
  add(message: CaughtMessage) {
    mkdirSync(this.dir, { recursive: true });
    writeFileSync(join(this.dir, `${message.id}.json`), JSON.stringify(message, null, 2));
    this.messages.push(message);
  }

  /** Newest first, optionally only those addressed to `to`. */
  list(to?: string): CaughtMessage[] {
    const wanted = to?.toLowerCase();
    return this.messages.filter((m) => !wanted || m.to.some((t) => t.toLowerCase() === wanted)).reverse();
  }

  clear() {
    for (const m of this.messages) rmSync(join(this.dir, `${m.id}.json`), { force: true });
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
