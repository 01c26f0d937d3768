/** A4 page geometry, colours and the document life cycle shared by the PDFs the server renders. */
import PDFDocument from 'pdfkit';
import { registerFonts } from './fonts';

/** A4 portrait in points (1/72 in); the header and footer bands sit inside the top/bottom margins. */
export const PAGE = { width: 595.28, height: 841.89, left: 50, right: 50, top: 92, bottom: 64 } as const;
export const CONTENT_WIDTH = PAGE.width - PAGE.left - PAGE.right;

export const COLOR = {
  text: '#1b1f24',
  muted: '#5b6470',
  accent: '#1f4e79',
  rule: '#c5ccd5',
  band: '#eef2f6',
  zebra: '#f4f7fa',
  cautionFill: '#fff6e5',
  cautionEdge: '#b7791f',
} as const;

export interface PdfMeta {
  title: string;
  author: string;
  subject: string;
  keywords?: string;
  /** fixed creation date, so the same input renders the same document */
  createdAt: Date;
}

/** A buffered A4 document (pages stay open for the page frame) with the shipped fonts registered. */
export function createPdf(meta: PdfMeta): PDFKit.PDFDocument {
  const doc = new PDFDocument({
    size: 'A4',
    bufferPages: true,
    margins: { top: PAGE.top, bottom: PAGE.bottom, left: PAGE.left, right: PAGE.right },
    info: {
      Title: meta.title,
      Author: meta.author,
      Subject: meta.subject,
      Keywords: meta.keywords,
      Creator: 'Bundlesmith',
      CreationDate: meta.createdAt,
    },
    displayTitle: true,
    lang: 'en',
  });
  registerFonts(doc);
  doc.fillColor(COLOR.text);
  return doc;
}

/** Ends `doc` and resolves with its bytes. */
export function pdfToBuffer(doc: PDFKit.PDFDocument): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}

/** Lowest y content may reach on the current page. */
export function contentBottom(doc: PDFKit.PDFDocument): number {
  return doc.page.height - doc.page.margins.bottom;
}

/** Starts a new page unless `height` points still fit below the cursor. */
export function ensureSpace(doc: PDFKit.PDFDocument, height: number): void {
  if (doc.y + height > contentBottom(doc)) doc.addPage();
}
