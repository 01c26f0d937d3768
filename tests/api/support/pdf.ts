/** PDFs in API tests: fetched as bytes, read back with poppler's pdftotext (Debian poppler-utils). */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Agent } from 'supertest';

/** The text of a PDF, whitespace runs folded to one space. */
export function pdfText(pdf: Buffer): string {
  const file = join(mkdtempSync(join(tmpdir(), 'bundlesmith-pdf-')), 'doc.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}

/** GET `url` as bytes (supertest buffers binary bodies only when told how). */
export async function getBytes(agent: Agent, url: string): Promise<Buffer> {
  const res = await agent
    .get(url)
    .buffer(true)
    .parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
  if (res.status !== 200) throw new Error(`GET ${url}: ${res.status}`);
  return res.body as Buffer;
}
