/**
 * Ruled tables that wrap their cells and never break inside a row. A table that fits on one page
 * is kept on one page; a longer one repeats its header row on each new page.
 */
import { COLOR, CONTENT_WIDTH, PAGE, contentBottom } from './document';
import { FONT, type FontName } from './fonts';

export interface Column {
  header?: string;
  /** relative width: columns share the table width in proportion */
  weight: number;
  align?: 'left' | 'right' | 'center';
  /** font of this column's body cells (default regular) */
  font?: FontName;
  color?: string;
}

export interface Row {
  cells: string[];
  /** the whole row in semibold, with a rule above (totals) */
  emphasis?: boolean;
}

export interface TableOptions {
  columns: Column[];
  rows: (Row | string[])[];
  fontSize?: number;
  /** shade every other row */
  zebra?: boolean;
  width?: number;
  /**
   * Rows kept with the header (and a heading above) before the table may break: by default the whole
   * table when it fits on a page; a number lets a long table start on a part-filled page instead.
   */
  keepRows?: number;
}

const PAD_X = 5;
const PAD_Y = 3.5;

interface Laid {
  row: Row;
  height: number;
}

function widths(columns: Column[], total: number): number[] {
  const sum = columns.reduce((s, c) => s + c.weight, 0);
  return columns.map((c) => (total * c.weight) / sum);
}

function rowHeight(doc: PDFKit.PDFDocument, cells: string[], cols: number[], fonts: FontName[], size: number): number {
  let h = 0;
  cells.forEach((text, i) => {
    doc.font(fonts[i]).fontSize(size);
    h = Math.max(h, doc.heightOfString(text || ' ', { width: cols[i] - 2 * PAD_X, lineGap: 0.5 }));
  });
  return h + 2 * PAD_Y;
}

function drawRow(doc: PDFKit.PDFDocument, y: number, cells: string[], cols: number[], fonts: FontName[], o: { size: number; columns: Column[]; colors?: string[] }): void {
  let x = PAGE.left;
  cells.forEach((text, i) => {
    doc.font(fonts[i]).fontSize(o.size).fillColor(o.colors?.[i] ?? COLOR.text);
    doc.text(text, x + PAD_X, y + PAD_Y, { width: cols[i] - 2 * PAD_X, align: o.columns[i].align ?? 'left', lineGap: 0.5 });
    x += cols[i];
  });
  doc.fillColor(COLOR.text);
}

function drawHeader(doc: PDFKit.PDFDocument, columns: Column[], cols: number[], size: number, width: number): number {
  const cells = columns.map((c) => c.header ?? '');
  const fonts = columns.map(() => FONT.semibold);
  const h = rowHeight(doc, cells, cols, fonts, size);
  const y = doc.y;
  doc.rect(PAGE.left, y, width, h).fill(COLOR.band);
  drawRow(doc, y, cells, cols, fonts, { size, columns, colors: columns.map(() => COLOR.accent) });
  doc.moveTo(PAGE.left, y + h).lineTo(PAGE.left + width, y + h).lineWidth(0.8).strokeColor(COLOR.accent).stroke();
  doc.y = y + h;
  return h;
}

interface Plan {
  keepRows?: number;
  size: number;
  width: number;
  cols: number[];
  hasHeader: boolean;
  headerHeight: number;
  laid: Laid[];
}

function plan(doc: PDFKit.PDFDocument, options: TableOptions): Plan {
  const size = options.fontSize ?? 9;
  const width = options.width ?? CONTENT_WIDTH;
  const cols = widths(options.columns, width);
  const hasHeader = options.columns.some((c) => c.header);
  const laid: Laid[] = options.rows.map((r) => {
    const row = Array.isArray(r) ? { cells: r } : r;
    const fonts = row.cells.map((_, i) => (row.emphasis ? FONT.semibold : options.columns[i].font ?? FONT.regular));
    return { row, height: rowHeight(doc, row.cells, cols, fonts, size) };
  });
  const headerHeight = hasHeader ? rowHeight(doc, options.columns.map((c) => c.header ?? ''), cols, options.columns.map(() => FONT.semibold), size) : 0;
  return { keepRows: options.keepRows, size, width, cols, hasHeader, headerHeight, laid };
}

/**
 * Height the table needs before it may break: all of it when it fits on one page, else its header
 * and first three rows. A heading above it asks for this much room too, so it is never orphaned.
 */
export function tableKeepHeight(doc: PDFKit.PDFDocument, options: TableOptions): number {
  return keepHeight(doc, plan(doc, options));
}

function keepHeight(doc: PDFKit.PDFDocument, p: Plan): number {
  const total = p.headerHeight + p.laid.reduce((s, l) => s + l.height, 0);
  const pageRoom = contentBottom(doc) - doc.page.margins.top;
  const first = (n: number) => p.headerHeight + p.laid.slice(0, n).reduce((s, l) => s + l.height, 0);
  if (p.keepRows !== undefined) return Math.min(total, first(p.keepRows));
  return total <= pageRoom ? total : first(3);
}

/** Draws the table at the cursor (left margin) and leaves the cursor below it. */
export function drawTable(doc: PDFKit.PDFDocument, options: TableOptions): void {
  const p = plan(doc, options);
  const { size, width, cols, hasHeader, laid } = p;
  if (doc.y + keepHeight(doc, p) > contentBottom(doc)) doc.addPage();
  if (hasHeader) drawHeader(doc, options.columns, cols, size, width);

  laid.forEach(({ row, height }, index) => {
    if (doc.y + height > contentBottom(doc)) {
      doc.addPage();
      if (hasHeader) drawHeader(doc, options.columns, cols, size, width);
    }
    const y = doc.y;
    if (options.zebra && index % 2 === 1 && !row.emphasis) doc.rect(PAGE.left, y, width, height).fill(COLOR.zebra);
    const fonts = row.cells.map((_, i) => (row.emphasis ? FONT.semibold : options.columns[i].font ?? FONT.regular));
    drawRow(doc, y, row.cells, cols, fonts, { size, columns: options.columns, colors: options.columns.map((c) => c.color ?? COLOR.text) });
    const ruleColor = row.emphasis ? COLOR.accent : COLOR.rule;
    const ruleY = row.emphasis ? y : y + height;
    doc.moveTo(PAGE.left, ruleY).lineTo(PAGE.left + width, ruleY).lineWidth(row.emphasis ? 0.8 : 0.4).strokeColor(ruleColor).stroke();
    doc.y = y + height;
  });
  doc.x = PAGE.left;
  doc.font(FONT.regular).fillColor(COLOR.text);
}

/** Label/value pairs laid out two pairs to a row: label | value | label | value. */
export function factsTable(pairs: [string, string][], fontSize = 9): TableOptions {
  const rows: string[][] = [];
  for (let i = 0; i < pairs.length; i += 2) {
    const [a, b] = [pairs[i], pairs[i + 1] ?? ['', '']];
    rows.push([a[0], a[1], b[0], b[1]]);
  }
  return {
    fontSize,
    columns: [
      { weight: 24, color: COLOR.muted },
      { weight: 26, font: FONT.semibold },
      { weight: 24, color: COLOR.muted },
      { weight: 26, font: FONT.semibold },
    ],
    rows,
  };
}

export function drawFacts(doc: PDFKit.PDFDocument, pairs: [string, string][], fontSize = 9): void {
  drawTable(doc, factsTable(pairs, fontSize));
}
