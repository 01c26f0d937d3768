/**
 * An inspection checklist to fill in by hand: a tick box, the inspection point, and ruled
 * "checked by" and "date" fields on each row. Kept on one page when it fits; rows never break.
 */
import { COLOR, CONTENT_WIDTH, PAGE, contentBottom, ensureSpace } from './document';
import { FONT } from './fonts';

const BOX = 9;
const PAD = 5;
const MIN_ROW = 24;
const COLUMNS = { tick: 24, checkedBy: 110, date: 74 };
const SIZE = 9;

function itemWidth(): number {
  return CONTENT_WIDTH - COLUMNS.tick - COLUMNS.checkedBy - COLUMNS.date;
}

function rowHeight(doc: PDFKit.PDFDocument, text: string): number {
  doc.font(FONT.regular).fontSize(SIZE);
  return Math.max(MIN_ROW, doc.heightOfString(text, { width: itemWidth() - 2 * PAD }) + 2 * PAD);
}

function header(doc: PDFKit.PDFDocument): void {
  const y = doc.y;
  const h = 16;
  doc.rect(PAGE.left, y, CONTENT_WIDTH, h).fill(COLOR.band);
  doc.font(FONT.semibold).fontSize(SIZE).fillColor(COLOR.accent);
  const cells: [string, number][] = [['Done', COLUMNS.tick], ['Inspection point', itemWidth()], ['Checked by', COLUMNS.checkedBy], ['Date', COLUMNS.date]];
  let x = PAGE.left;
  for (const [label, w] of cells) {
    doc.text(label, x + (label === 'Done' ? 1 : PAD), y + 3.5, { width: w - 2, lineBreak: false });
    x += w;
  }
  doc.moveTo(PAGE.left, y + h).lineTo(PAGE.left + CONTENT_WIDTH, y + h).lineWidth(0.8).strokeColor(COLOR.accent).stroke();
  doc.y = y + h;
}

function row(doc: PDFKit.PDFDocument, text: string, h: number): void {
  const y = doc.y;
  const boxY = y + (h - BOX) / 2;
  doc.rect(PAGE.left + (COLUMNS.tick - BOX) / 2, boxY, BOX, BOX).lineWidth(0.8).strokeColor(COLOR.text).stroke();
  const ix = PAGE.left + COLUMNS.tick;
  doc.font(FONT.regular).fontSize(SIZE).fillColor(COLOR.text).text(text, ix + PAD, y + PAD, { width: itemWidth() - 2 * PAD });
  // write-on lines for the signature and the date
  const lineY = y + h - 6;
  const byX = ix + itemWidth();
  const dateX = byX + COLUMNS.checkedBy;
  doc.lineWidth(0.5).strokeColor(COLOR.muted);
  doc.moveTo(byX + PAD, lineY).lineTo(dateX - PAD, lineY).stroke();
  doc.moveTo(dateX + PAD, lineY).lineTo(PAGE.left + CONTENT_WIDTH - PAD, lineY).stroke();
  doc.moveTo(PAGE.left, y + h).lineTo(PAGE.left + CONTENT_WIDTH, y + h).lineWidth(0.4).strokeColor(COLOR.rule).stroke();
  doc.y = y + h;
}

/** Draws the checklist at the cursor and leaves the cursor below it. */
export function drawChecklist(doc: PDFKit.PDFDocument, items: string[]): void {
  const heights = items.map((t) => rowHeight(doc, t));
  ensureSpace(doc, 16 + heights.reduce((s, h) => s + h, 0));
  header(doc);
  items.forEach((text, i) => {
    if (doc.y + heights[i] > contentBottom(doc)) {
      doc.addPage();
      header(doc);
    }
    row(doc, text, heights[i]);
  });
  doc.x = PAGE.left;
  doc.font(FONT.regular).fillColor(COLOR.text);
}

/** Height the checklist asks for before a heading above it may stay on the page. */
export function checklistKeepHeight(doc: PDFKit.PDFDocument, items: string[]): number {
  return 16 + items.slice(0, 3).reduce((s, t) => s + rowHeight(doc, t), 0);
}
