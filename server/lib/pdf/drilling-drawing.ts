/**
 * A tubesheet drilling pattern drawn to scale in vectors: the plate outline, the outer tube limit
 * (dashed), every hole at its centre with its true diameter (tube holes outlined and shaded by pass,
 * tie-rod holes filled, at the rod's diameter where the hole gives its own), centre lines with x to the right and y up, as the drilling CSV has them.
 */
import { COLOR } from './document';
import { FONT } from './fonts';
import { chooseScale, paperPt } from './drawing-scale';

export interface DrillingHole {
  x_mm: number;
  y_mm: number;
  kind: 'tube' | 'tie-rod';
  pass: number;
  /** this hole's own diameter, mm; else the drawing's `holeDiameter_mm` */
  diameter_mm?: number;
}

export interface DrillingDrawing {
  holes: DrillingHole[];
  holeDiameter_mm: number;
  outerTubeLimit_mm: number;
  tubesheetDiameter_mm: number;
}

export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Centre lines run this far past the outline, pt (room for the axis letters beyond them). */
const OVERSHOOT = 8;
const LETTER = 8;

const FILLS = ['#ffffff', '#cfd5dc', '#8f99a5'];
const MARKS = ['none', 'dot', 'bar'] as const;
const TIE_ROD_FILL = COLOR.text;

/** Fill and inner mark of a pass: three greys, then the same greys with a dot, then with a bar. */
export function passStyle(pass: number): { fill: string; mark: (typeof MARKS)[number] } {
  const i = Math.max(0, pass - 1);
  return { fill: FILLS[i % FILLS.length], mark: MARKS[Math.floor(i / FILLS.length) % MARKS.length] };
}

/** One hole of radius `r` pt at (x, y): a tube hole of `pass`, or a tie-rod hole (pass ignored). */
export function drawHole(doc: PDFKit.PDFDocument, x: number, y: number, r: number, kind: DrillingHole['kind'], pass: number): void {
  const line = Math.min(0.5, Math.max(0.2, r * 0.1));
  if (kind === 'tie-rod') {
    doc.circle(x, y, r).lineWidth(line).fillAndStroke(TIE_ROD_FILL, TIE_ROD_FILL);
    return;
  }
  const s = passStyle(pass);
  doc.circle(x, y, r).lineWidth(line).fillAndStroke(s.fill, COLOR.text);
  if (s.mark === 'dot') doc.circle(x, y, r * 0.28).fill(COLOR.text);
  if (s.mark === 'bar') doc.moveTo(x - r * 0.6, y).lineTo(x + r * 0.6, y).lineWidth(line * 1.6).stroke(COLOR.text);
}

/** The reduction (5 for 1:5) at which the drawing fits `box` with its centre lines and axis letters. */
export function drillingScale(d: DrillingDrawing, box: Box): number {
  const room = Math.min(box.width, box.height) - 2 * (OVERSHOOT + LETTER);
  return chooseScale(d.tubesheetDiameter_mm, room);
}

function centreLines(doc: PDFKit.PDFDocument, cx: number, cy: number, reach: number): void {
  // dash-dot (long dash, gap, dot, gap): pdfkit takes a pattern array, its typings only a number
  doc.save().lineWidth(0.4).strokeColor(COLOR.accent).dash([9, 2, 2, 2] as unknown as number, {});
  doc.moveTo(cx - reach, cy).lineTo(cx + reach, cy).stroke();
  doc.moveTo(cx, cy + reach).lineTo(cx, cy - reach).stroke();
  doc.undash().restore();
  // arrow heads at the positive ends: x to the right, y up (the drilling CSV's axes)
  doc.save().fillColor(COLOR.accent);
  doc.polygon([cx + reach, cy], [cx + reach - 5, cy - 2], [cx + reach - 5, cy + 2]).fill();
  doc.polygon([cx, cy - reach], [cx - 2, cy - reach + 5], [cx + 2, cy - reach + 5]).fill();
  doc.restore();
  doc.font(FONT.semibold).fontSize(9).fillColor(COLOR.accent);
  doc.text('x', cx + reach + 2, cy - 6, { lineBreak: false });
  doc.text('y', cx + 4, cy - reach - LETTER + 1, { lineBreak: false });
}

/**
 * Draws the pattern centred in `box` at the largest standard scale that fits and returns that
 * reduction. Hole centres are exact; only the outlines' line widths are not to scale.
 */
export function drawDrillingPattern(doc: PDFKit.PDFDocument, d: DrillingDrawing, box: Box): number {
  const reduction = drillingScale(d, box);
  const pt = (mm: number) => paperPt(mm, reduction);
  const cx = box.x + box.width / 2;
  const cy = box.y + box.height / 2;
  const outline = pt(d.tubesheetDiameter_mm / 2);
  doc.save();
  doc.circle(cx, cy, outline).lineWidth(0.9).stroke(COLOR.text);
  doc.circle(cx, cy, pt(d.outerTubeLimit_mm / 2)).lineWidth(0.6).dash(4, { space: 2.5 }).stroke(COLOR.text);
  doc.undash();
  for (const h of d.holes) drawHole(doc, cx + pt(h.x_mm), cy - pt(h.y_mm), pt((h.diameter_mm ?? d.holeDiameter_mm) / 2), h.kind, h.pass);
  doc.restore();
  centreLines(doc, cx, cy, outline + OVERSHOOT);
  doc.fillColor(COLOR.text).strokeColor(COLOR.text).lineWidth(1);
  return reduction;
}
