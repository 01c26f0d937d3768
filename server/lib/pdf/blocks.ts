/** Section headings, paragraphs and the boxed notice (cautions) of a document. */
import { COLOR, CONTENT_WIDTH, PAGE, ensureSpace } from './document';
import { FONT } from './fonts';

/** A numbered-style section heading; starts a new page unless `keepWith` points fit below it. */
export function drawHeading(doc: PDFKit.PDFDocument, text: string, keepWith = 60): void {
  ensureSpace(doc, 30 + keepWith);
  doc.moveDown(0.9);
  doc.font(FONT.bold).fontSize(11.5).fillColor(COLOR.accent).text(text, PAGE.left, doc.y, { width: CONTENT_WIDTH });
  doc.moveDown(0.25);
  doc.font(FONT.regular).fontSize(9.5).fillColor(COLOR.text);
}

/** Plain paragraphs at the left margin, each kept whole on a page. */
export function drawParagraphs(doc: PDFKit.PDFDocument, paragraphs: string[], fontSize = 9.5): void {
  doc.font(FONT.regular).fontSize(fontSize).fillColor(COLOR.text);
  for (const p of paragraphs) {
    ensureSpace(doc, doc.heightOfString(p, { width: CONTENT_WIDTH }) + 4);
    doc.text(p, PAGE.left, doc.y, { width: CONTENT_WIDTH, paragraphGap: 4 });
  }
}

export interface NoticeBox {
  title: string;
  paragraphs: string[];
  bullets?: string[];
}

/** A shaded, edged box that stays on one page: the cautions of an offer or a build sheet. */
export function drawNoticeBox(doc: PDFKit.PDFDocument, box: NoticeBox): void {
  const pad = 9;
  const inner = CONTENT_WIDTH - 2 * pad - 4;
  const items = [...box.paragraphs, ...(box.bullets ?? []).map((b) => `•  ${b}`)];
  doc.font(FONT.bold).fontSize(10);
  let h = doc.heightOfString(box.title, { width: inner }) + 4;
  doc.font(FONT.regular).fontSize(9);
  for (const t of items) h += doc.heightOfString(t, { width: inner }) + 3;
  h += 2 * pad;
  ensureSpace(doc, h + 6);
  const top = doc.y + 4;
  doc.rect(PAGE.left, top, CONTENT_WIDTH, h).fill(COLOR.cautionFill);
  doc.rect(PAGE.left, top, 4, h).fill(COLOR.cautionEdge);
  doc.rect(PAGE.left, top, CONTENT_WIDTH, h).lineWidth(0.6).strokeColor(COLOR.cautionEdge).stroke();
  const x = PAGE.left + 4 + pad;
  doc.font(FONT.bold).fontSize(10).fillColor(COLOR.cautionEdge).text(box.title, x, top + pad, { width: inner });
  doc.moveDown(0.2);
  doc.font(FONT.regular).fontSize(9).fillColor(COLOR.text);
  for (const t of items) doc.text(t, x, doc.y, { width: inner, paragraphGap: 3 });
  doc.y = top + h + 6;
  doc.x = PAGE.left;
}
