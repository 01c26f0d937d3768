/**
 * Drawing scales for shop drawings in a PDF: points per millimetre of paper, the standard reduction
 * scales (ISO 5455 series 1, 2, 5, 10 with 2.5 as the usual intermediate (memory)), the largest one
 * that fits a space, and a scale bar so a copy printed at another size can still be measured.
 */
import { COLOR } from './document';
import { FONT } from './fonts';
import { formatNumber } from './quantities';

/** 72 pt per inch, 25.4 mm per inch (exact by definition). */
export const PT_PER_MM = 72 / 25.4;

/** Reductions tried largest drawing first; 1:50 only when nothing up to 1:20 fits. */
export const STANDARD_SCALES = [1, 2, 2.5, 5, 10, 20, 50] as const;

/** "1:2.5" */
export const scaleLabel = (reduction: number) => `1:${formatNumber(reduction, 3)}`;

/** The smallest reduction at which `extent_mm` of the real part fits `room_pt` of paper. */
export function chooseScale(extent_mm: number, room_pt: number): number {
  return STANDARD_SCALES.find((s) => (extent_mm / s) * PT_PER_MM <= room_pt) ?? STANDARD_SCALES[STANDARD_SCALES.length - 1];
}

/** Points on paper for `mm` of the real part at 1:`reduction`. */
export const paperPt = (mm: number, reduction: number) => (mm / reduction) * PT_PER_MM;

const BAR_LENGTHS_MM = [10, 20, 25, 50, 100, 200, 250, 500, 1000, 2000];

/**
 * A scale bar at (x, y) (its left end, top of the bar), five alternating segments of the longest
 * round length up to `maxWidth` points, with 0 and the length in mm beneath. Returns its width.
 */
export function drawScaleBar(doc: PDFKit.PDFDocument, x: number, y: number, reduction: number, maxWidth = 140): number {
  const length = [...BAR_LENGTHS_MM].reverse().find((l) => paperPt(l, reduction) <= maxWidth) ?? BAR_LENGTHS_MM[0];
  const width = paperPt(length, reduction);
  const h = 4;
  const seg = width / 5;
  doc.save().lineWidth(0.5).strokeColor(COLOR.text);
  for (let i = 0; i < 5; i += 1) {
    doc.rect(x + i * seg, y, seg, h);
    if (i % 2 === 0) doc.fillAndStroke(COLOR.text, COLOR.text);
    else doc.stroke();
  }
  doc.restore();
  doc.font(FONT.regular).fontSize(7.5).fillColor(COLOR.text);
  doc.text('0', x - 10, y + h + 2, { width: 20, align: 'center', lineBreak: false });
  doc.text(`${length} mm`, x + width - 30, y + h + 2, { width: 60, align: 'center', lineBreak: false });
  return width;
}
