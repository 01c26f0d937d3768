/**
 * The drilling-pattern page of a build sheet: title with the stated scale, the drawing, a legend
 * (outline, outer tube limit, each pass, tie rods), a scale bar and the conventions of the drilling CSV.
 */
import { COLOR, CONTENT_WIDTH, PAGE, contentBottom } from './document';
import { scaleLabel, drawScaleBar } from './drawing-scale';
import { drawDrillingPattern, drawHole, drillingScale, type Box, type DrillingDrawing } from './drilling-drawing';
import { FONT } from './fonts';
import { formatNumber } from './quantities';

export interface DrillingPage {
  drawing: DrillingDrawing;
  /** lines under the title, e.g. hole count, diameter, pitch, layout */
  caption: string[];
}

/** Room kept under the drawing for the legend, the scale bar and the notes, pt. */
const FOOT = 104;
const TITLE = 44;
const LEGEND_COLUMNS = 3;
const LEGEND_ROW = 13;

const mm = (v: number) => `${formatNumber(v, 4)} mm`;

/** The drawing may reach this far into the side margins, pt (half an inch stays clear). */
const BLEED = PAGE.left - 36;

/** Where the drawing goes on a fresh page. */
export function drillingBox(doc: PDFKit.PDFDocument): Box {
  const y = PAGE.top + TITLE;
  return { x: PAGE.left - BLEED, y, width: CONTENT_WIDTH + 2 * BLEED, height: contentBottom(doc) - FOOT - y };
}

/** The reduction the page will use, known before the page is drawn (for cross-references). */
export function drillingPageScale(doc: PDFKit.PDFDocument, drawing: DrillingDrawing): number {
  return drillingScale(drawing, drillingBox(doc));
}

type Sample = (x: number, y: number) => void;

function legendItems(doc: PDFKit.PDFDocument, d: DrillingDrawing): [Sample, string][] {
  const counts = new Map<number, number>();
  for (const h of d.holes) if (h.kind === 'tube') counts.set(h.pass, (counts.get(h.pass) ?? 0) + 1);
  const ties = d.holes.length - [...counts.values()].reduce((s, n) => s + n, 0);
  const items: [Sample, string][] = [
    [(x, y) => doc.circle(x, y, 4.5).lineWidth(0.9).stroke(COLOR.text), `Tubesheet outline Ø ${mm(d.tubesheetDiameter_mm)}`],
    [(x, y) => { doc.circle(x, y, 4.5).lineWidth(0.6).dash(1.5, { space: 1 }).stroke(COLOR.text); doc.undash(); }, `Outer tube limit Ø ${mm(d.outerTubeLimit_mm)}`],
  ];
  for (const pass of [...counts.keys()].sort((a, b) => a - b)) {
    items.push([(x, y) => drawHole(doc, x, y, 4.5, 'tube', pass), `Pass ${pass}: ${counts.get(pass)} tube holes`]);
  }
  if (ties > 0) items.push([(x, y) => drawHole(doc, x, y, 4.5, 'tie-rod', 0), `Tie-rod holes: ${ties} (filled)`]);
  return items;
}

function drawLegend(doc: PDFKit.PDFDocument, d: DrillingDrawing, x0: number, y0: number, width: number): number {
  const col = width / LEGEND_COLUMNS;
  const items = legendItems(doc, d);
  items.forEach(([sample, label], i) => {
    const x = x0 + (i % LEGEND_COLUMNS) * col;
    const y = y0 + Math.floor(i / LEGEND_COLUMNS) * LEGEND_ROW;
    doc.save();
    sample(x + 5, y + 5);
    doc.restore();
    doc.font(FONT.regular).fontSize(8).fillColor(COLOR.text).text(label, x + 14, y + 0.5, { width: col - 16, lineBreak: false });
  });
  return y0 + Math.ceil(items.length / LEGEND_COLUMNS) * LEGEND_ROW;
}

/** Adds a page with the drawing; returns the reduction used (5 for 1:5). */
export function drawDrillingPage(doc: PDFKit.PDFDocument, page: DrillingPage): number {
  doc.addPage();
  const box = drillingBox(doc);
  const reduction = drillingScale(page.drawing, box);
  doc.font(FONT.bold).fontSize(13).fillColor(COLOR.accent).text(`Tubesheet drilling pattern, scale ${scaleLabel(reduction)}`, PAGE.left, PAGE.top, { width: CONTENT_WIDTH });
  doc.font(FONT.regular).fontSize(8.5).fillColor(COLOR.muted);
  for (const line of page.caption) doc.text(line, PAGE.left, doc.y, { width: CONTENT_WIDTH });
  drawDrillingPattern(doc, page.drawing, box);

  const top = box.y + box.height + 8;
  const legendWidth = CONTENT_WIDTH - 150;
  const below = drawLegend(doc, page.drawing, PAGE.left, top, legendWidth);
  const right = PAGE.left + legendWidth + 10;
  doc.font(FONT.semibold).fontSize(9).fillColor(COLOR.text).text(`Scale ${scaleLabel(reduction)} on A4`, right, top, { width: 140, lineBreak: false });
  drawScaleBar(doc, right, top + 16, reduction, 130);
  const notes = [
    'Hole centres in mm from the tubesheet centre, x to the right, y up; holes are numbered row by row from the top, left to right (hole 1 top left), as in drilling.csv.',
    'The scale holds when printed at 100 % (no fit to page); otherwise measure with the scale bar. Drill to the coordinates, not from this drawing.',
  ];
  doc.font(FONT.regular).fontSize(7.5).fillColor(COLOR.muted);
  doc.text(notes.join(' '), PAGE.left, Math.max(below, top + 40) + 6, { width: CONTENT_WIDTH });
  doc.fillColor(COLOR.text);
  return reduction;
}
