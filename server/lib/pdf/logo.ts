/** The fabricator's mark: the end view of a tube bundle (shell ring, tubes on a triangular pitch). */
import { COLOR } from './document';

/** Draws the mark centred at (cx, cy) with outer radius `r`, in vectors. */
export function drawBundleMark(doc: PDFKit.PDFDocument, cx: number, cy: number, r: number, color: string = COLOR.accent): void {
  doc.save();
  doc.lineWidth(r * 0.1).strokeColor(color).circle(cx, cy, r).stroke();
  const pitch = r * 0.28;
  const tube = pitch * 0.36;
  const limit = r * 0.78 - tube; // outer tube limit inside the ring
  const rowStep = pitch * Math.sin(Math.PI / 3);
  for (let row = -4; row <= 4; row += 1) {
    const y = cy + row * rowStep;
    const offset = row % 2 === 0 ? 0 : pitch / 2;
    for (let col = -4; col <= 4; col += 1) {
      const x = cx + col * pitch + offset;
      if (Math.hypot(x - cx, y - cy) <= limit) doc.circle(x, y, tube).fill(color);
    }
  }
  doc.restore();
}
