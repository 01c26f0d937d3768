/**
 * Attachment names and malformed uploads, sent as raw multipart bodies so every byte is the test's:
 * an RFC 5987 `filename*`, a plain UTF-8 `filename` (what browsers send), a decomposed accent, a DEL,
 * a path, a truncated body and a body without a boundary. Downloads answer with RFC 6266
 * `Content-Disposition`: an ASCII `filename` fallback and the exact name as `filename*=UTF-8''…`.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedIn, startTestApp, type TestApp } from './support/app';
import { createQuote } from './support/quotes';

let t: TestApp;
let pellmar: Awaited<ReturnType<typeof signedIn>>;
let quoteId: string;

beforeAll(async () => {
  t = await startTestApp();
  pellmar = await signedIn(t.app, 'customer@pellmar.example');
  quoteId = (await createQuote(pellmar)).id;
});
afterAll(() => t.close());

const BOUNDARY = 'bundlesmith-test-boundary';
const PDF = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');

/** A multipart body with one file part whose Content-Disposition parameters are given as raw bytes. */
function multipart(dispositionParams: Buffer | string, content = PDF, { close = true } = {}): Buffer {
  return Buffer.concat([
    Buffer.from(`--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; `),
    Buffer.isBuffer(dispositionParams) ? dispositionParams : Buffer.from(dispositionParams, 'utf8'),
    Buffer.from('\r\nContent-Type: application/pdf\r\n\r\n'),
    content,
    Buffer.from(close ? `\r\n--${BOUNDARY}--\r\n` : ''),
  ]);
}

const upload = (body: Buffer, contentType = `multipart/form-data; boundary=${BOUNDARY}`) =>
  pellmar.post(`/api/quotes/${quoteId}/attachments`).set('Content-Type', contentType).send(body);

/** The name a browser would save: `filename*` decoded, as RFC 6266 says a client prefers it. */
function savedName(header: string): string {
  const ext = /filename\*=UTF-8''([^;]+)/i.exec(header);
  if (ext) return decodeURIComponent(ext[1]!);
  const quoted = /filename="((?:[^"\\]|\\.)*)"/.exec(header);
  if (quoted) return quoted[1]!.replace(/\\(.)/g, '$1');
  return /filename=([^;]*)/.exec(header)![1]!;
}

async function roundTrip(params: Buffer | string, expected: string) {
  const up = await upload(multipart(params));
  expect(up.status, JSON.stringify(up.body)).toBe(201);
  expect(up.body.filename).toBe(expected);
  const down = await pellmar.get(`/api/quotes/${quoteId}/attachments/${up.body.id}`).buffer(true);
  expect(down.status).toBe(200);
  expect(down.headers['content-type']).toMatch(/^application\/pdf/);
  expect(Buffer.compare(down.body, PDF)).toBe(0);
  const disposition = down.headers['content-disposition'] as string;
  expect(disposition).toMatch(/^attachment;/);
  expect(disposition).toMatch(/^[\x20-\x7e]*$/); // a header is ASCII; the exact name travels percent-encoded
  expect(savedName(disposition)).toBe(expected);
  return { up, disposition };
}

describe('attachment names', () => {
  it('decodes an RFC 5987 filename* and downloads it (was: stored, then every download 500)', async () => {
    const { disposition } = await roundTrip(`filename*=UTF-8''Datenblatt%20K%C3%BChler%20%E2%84%96%207.pdf`, 'Datenblatt Kühler № 7.pdf');
    expect(disposition).toContain(`filename*=UTF-8''Datenblatt%20K%C3%BChler%20%E2%84%96%207.pdf`);
  });

  it('reads a plain UTF-8 filename as UTF-8, not latin1 (was: "café.pdf" stored as "cafÃ©.pdf")', async () => {
    const { disposition } = await roundTrip(Buffer.from('filename="café.pdf"', 'utf8'), 'café.pdf');
    expect(disposition).toMatch(/filename="caf.\.pdf"/); // the ASCII fallback for old clients
    await roundTrip(Buffer.from('filename="换热器 图纸.pdf"', 'utf8'), '换热器 图纸.pdf');
  });

  it('stores names NFC-normalised: a decomposed é equals the composed one', async () => {
    await roundTrip(Buffer.from('filename="cafe\u0301.pdf"', 'utf8'), 'caf\u00e9.pdf');
  });

  it('drops DEL, other control characters and bidi overrides sent percent-encoded in filename*', async () => {
    await roundTrip(`filename*=UTF-8''data%7Fsheet.pdf`, 'datasheet.pdf');
    await roundTrip(`filename*=UTF-8''a%7F%01%C2%85b%E2%80%AEfdp.pdf`, 'abfdp.pdf');
  });

  it('answers 400 malformed-upload for a raw DEL in the part header (was: 500), storing nothing', async () => {
    const res = await upload(multipart(Buffer.from('filename="data\x7fsheet.pdf"', 'latin1')));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed-upload');
  });

  it('keeps no path part of the name; a quote in the name survives the round trip', async () => {
    await roundTrip(`filename*=UTF-8''..%2F..%2Fetc%2Fshell%20%26%20tube.pdf`, 'shell & tube.pdf');
    await roundTrip('filename="say \\"hi\\".pdf"', 'say "hi".pdf');
  });
});

describe('malformed multipart bodies', () => {
  const countAttachments = async () =>
    Number((await t.database.pool.query('select count(*) from attachments where quote_id = $1', [quoteId])).rows[0].count);

  it('answers 400 malformed-upload for a truncated body (was: 500) and stores nothing', async () => {
    const before = await countAttachments();
    const res = await upload(multipart('filename="cut.pdf"', PDF, { close: false }));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed-upload');
    expect(res.body.error.fields).toHaveProperty(['file']);
    expect(await countAttachments()).toBe(before);
  });

  it('answers 400 malformed-upload for a multipart body without a boundary (was: 500)', async () => {
    const res = await upload(multipart('filename="x.pdf"'), 'multipart/form-data');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed-upload');
  });

  it('answers 400 malformed-upload for a part header that never ends', async () => {
    const res = await upload(Buffer.from(`--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; filename="x.pdf"`));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed-upload');
  });
});
