/** Placeholder until the build-sheet layout lands: see renderBuildSheetPdf in this file's history. */
import type { BuildSheet } from '../../../shared/schemas/build-sheet';
import { COLOR, createPdf, pdfToBuffer } from '../../lib/pdf/document';
import { FONT } from '../../lib/pdf/fonts';

export async function renderBuildSheetPdf(sheet: BuildSheet): Promise<Buffer> {
  const doc = createPdf({ title: `Build sheet ${sheet.order.number}`, author: 'Alder Creek Thermal Works', subject: 'Build sheet', createdAt: new Date() });
  doc.font(FONT.semibold).fontSize(16).fillColor(COLOR.text).text(`Build sheet ${sheet.order.number}`);
  return pdfToBuffer(doc);
}
