/**
 * Header and footer on every page, drawn once all content is laid out (the document buffers its
 * pages), so the footer can say "page x of y".
 */
import { COLOR, PAGE } from './document';
import { FONT } from './fonts';
import { drawBundleMark } from './logo';

export interface PageFrame {
  /** fabricator's name beside the mark */
  name: string;
  /** small line under the name, e.g. "Shell-and-tube coolers built to order" */
  tagline?: string;
  /** right side of the header, e.g. "Offer Q-2026-0042" */
  headerRight?: string;
  /** left side of the footer, e.g. "Q-2026-0042 · revision 3 (offer)" */
  footerLeft: string;
}

function drawHeader(doc: PDFKit.PDFDocument, frame: PageFrame): void {
  const top = 30;
  drawBundleMark(doc, PAGE.left + 15, top + 15, 15);
  doc.font(FONT.bold).fontSize(14).fillColor(COLOR.accent).text(frame.name, PAGE.left + 40, top + 1, { lineBreak: false });
  if (frame.tagline) doc.font(FONT.regular).fontSize(8.5).fillColor(COLOR.muted).text(frame.tagline, PAGE.left + 40, top + 18, { lineBreak: false });
  if (frame.headerRight) {
    const w = 200;
    doc.font(FONT.semibold).fontSize(9).fillColor(COLOR.muted).text(frame.headerRight, PAGE.width - PAGE.right - w, top + 10, { width: w, align: 'right', lineBreak: false });
  }
  const ruleY = top + 38;
  doc.moveTo(PAGE.left, ruleY).lineTo(PAGE.width - PAGE.right, ruleY).lineWidth(1).strokeColor(COLOR.accent).stroke();
}

function drawFooter(doc: PDFKit.PDFDocument, frame: PageFrame, page: number, pages: number): void {
  const y = PAGE.height - 44;
  doc.moveTo(PAGE.left, y - 6).lineTo(PAGE.width - PAGE.right, y - 6).lineWidth(0.4).strokeColor(COLOR.rule).stroke();
  doc.font(FONT.regular).fontSize(8).fillColor(COLOR.muted);
  doc.text(frame.footerLeft, PAGE.left, y, { lineBreak: false });
  const w = 120;
  doc.text(`page ${page} of ${pages}`, PAGE.width - PAGE.right - w, y, { width: w, align: 'right', lineBreak: false });
}

/** Draws the header and footer on each buffered page of `doc`. */
export function drawPageFrames(doc: PDFKit.PDFDocument, frame: PageFrame): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i += 1) {
    doc.switchToPage(i);
    // writing in the margins must not spill onto a new page
    const margins = { ...doc.page.margins };
    doc.page.margins = { top: 0, bottom: 0, left: 0, right: 0 };
    drawHeader(doc, frame);
    drawFooter(doc, frame, i - range.start + 1, range.count);
    doc.page.margins = margins;
  }
  doc.fillColor(COLOR.text);
}
