/**
 * The offer PDF (issue 4): the fabricator's offer for one revision of a quote, with the duty in
 * the customer's units, the design (which fluid goes where and why, shells in series, baffles), its
 * predicted performance with the methods on a technical line (tube side; shell side by Bell–Delaware
 * with Kern's h as a second opinion and the J factors), the price as the fabricator chooses to show
 * it, payment, lead time, validity, terms and the engineering cautions of the domain brief; the sales
 * engineer's message at approval on the first page; a datasheet page last (issue 12: design pressure and
 * temperature per side, connections, construction, weights, the temperature profile).
 */
import { formatDate } from '../../../shared/format';
import type { Revision } from '../../../shared/schemas/quotes';
import { ENGINEERING_CAUTION } from '../../../shared/thermal/exchanger/checks';
import { drawHeading, drawNoticeBox, drawParagraphs } from '../../lib/pdf/blocks';
import { designPairs, designReasons, materialName, methodSentence, performancePairs, shellMethodSentence, tubeOdLabel } from '../../lib/pdf/design-rows';
import { COLOR, CONTENT_WIDTH, PAGE, createPdf, ensureSpace, pdfToBuffer } from '../../lib/pdf/document';
import { dutyRows, fluidName, limitPairs } from '../../lib/pdf/duty-rows';
import { casesTable, foulingSentence, guaranteeSentence } from '../../lib/pdf/margin-rows';
import { FONT } from '../../lib/pdf/fonts';
import { latinStrings } from '../../lib/pdf/glyphs';
import { drawPageFrames } from '../../lib/pdf/page-frame';
import { paymentRows, priceRows } from '../../lib/pdf/price-rows';
import { showQuantity } from '../../lib/pdf/quantities';
import { drawFacts, drawTable, factsTable, tableKeepHeight, type TableOptions } from '../../lib/pdf/table';
import { processSideOf, shellsOf } from '../pricing/design-fields';
import { drawDatasheet } from './offer-datasheet';

/** Everything the offer shows; the caller loads it (quote, revision, organisation, price book). */
export interface OfferPdfInput {
  fabricator: { name: string; address: string[]; email: string; phone: string };
  customer: { organizationName: string; contactName: string; contactEmail: string };
  quote: { number: string; reference: string | null; quantity: number; needBy: string | null };
  revision: Revision;
  /** ISO date-time the offer is issued */
  issuedAt: string;
  /** the customer's units for the duty, design and performance */
  units: 'SI' | 'US';
  depositPct: number;
  /** summary: per-unit price, adjustments and total; detailed: every price line */
  showLines: 'summary' | 'detailed';
  /** payment and delivery terms, one paragraph each */
  terms: string[];
}

/**
 * The cautions of the domain brief (section 4), always printed in the cautions box. The rating's
 * `caution` is printed too when it says something other than the engine's standard sentence.
 */
export const OFFER_CAUTIONS = [
  'The results in this offer are engineering estimates for quotation.',
  'The final design is checked by the fabricator’s responsible engineer under the pressure-vessel code in force where the unit is installed (ASME Section VIII, PED or local rules) and the customer’s site rules.',
] as const;

const KIND_TITLE: Record<Revision['kind'], string> = { budget: 'Budget offer', draft: 'Draft offer', offer: 'Offer' };

/** "12 Mar 2026" from an ISO date or date-time (UTC), as on the pages (shared/format.ts). */
function longDate(iso: string): string {
  return formatDate(iso, { timeZone: 'UTC' });
}

function addressBlock(doc: PDFKit.PDFDocument, x: number, y: number, width: number, title: string, lines: string[], align: 'left' | 'right'): number {
  doc.font(FONT.semibold).fontSize(8).fillColor(COLOR.muted).text(title.toUpperCase(), x, y, { width, align, characterSpacing: 0.6 });
  lines.forEach((line, i) => {
    doc.font(i === 0 ? FONT.semibold : FONT.regular).fontSize(9.5).fillColor(COLOR.text).text(line, x, doc.y, { width, align });
  });
  return doc.y;
}

function drawOpening(doc: PDFKit.PDFDocument, o: OfferPdfInput): void {
  const half = CONTENT_WIDTH / 2 - 10;
  const top = PAGE.top;
  const c = o.customer;
  const yLeft = addressBlock(doc, PAGE.left, top, half, 'Prepared for', [c.organizationName, `Attn. ${c.contactName}`, c.contactEmail], 'left');
  const f = o.fabricator;
  const yRight = addressBlock(doc, PAGE.width - PAGE.right - half, top, half, 'From', [f.name, ...f.address, f.phone, f.email], 'right');
  doc.y = Math.max(yLeft, yRight) + 18;
  const r = o.revision;
  doc.font(FONT.bold).fontSize(20).fillColor(COLOR.accent).text(`${KIND_TITLE[r.kind]} ${o.quote.number}`, PAGE.left, doc.y, { width: CONTENT_WIDTH });
  doc.font(FONT.regular).fontSize(10.5).fillColor(COLOR.muted).text(`Revision ${r.number} (${r.kind}) · shell-and-tube cooler, ${fluidName(r.duty.process.fluid).toLowerCase()} service`, { width: CONTENT_WIDTH });
  doc.moveDown(0.6);
  const facts: [string, string][] = [
    ['Issue date', longDate(o.issuedAt)],
    ['Valid until', r.validUntil ? longDate(r.validUntil) : 'to be confirmed on approval'],
    ['Your reference', o.quote.reference ?? '–'],
    ['Quantity', `${o.quote.quantity} unit${o.quote.quantity === 1 ? '' : 's'}`],
    ['Needed by', o.quote.needBy ? longDate(o.quote.needBy) : 'not stated'],
    ['Lead time', `${r.leadTimeWeeks} weeks`],
  ];
  drawFacts(doc, facts, 9.5);
  if (r.message) {
    // the sales engineer's words at approval, as sent in the offer's e-mail
    drawHeading(doc, `A word from ${r.createdBy}`, 30);
    drawParagraphs(doc, r.message.split(/\n{2,}/).map((p) => p.trim()).filter(Boolean));
  }
}

/**
 * A section heading kept on the page with the start of the table that follows it: the table's
 * first rows, so a long table fills the page it starts on instead of leaving it half empty.
 */
function section(doc: PDFKit.PDFDocument, title: string, table: TableOptions, extra = 0): void {
  const flowing = { keepRows: 3, ...table };
  drawHeading(doc, title, tableKeepHeight(doc, flowing) + extra);
  drawTable(doc, flowing);
}

function drawEngineering(doc: PDFKit.PDFDocument, o: OfferPdfInput): void {
  const { duty, design } = o.revision;
  const system = o.units === 'SI' ? 'SI units' : 'US customary units';
  // the duty's columns say where the design put each stream (a bath keeps the process in the tubes)
  const onShell = processSideOf(design) === 'shell' && duty.boundary.kind === 'coolant';
  const processWhere = onShell ? 'on the shell side' : 'in the tubes';
  const coolantWhere = duty.boundary.kind === 'wall' ? 'bath' : onShell ? 'in the tubes' : 'shell';
  section(doc, `1  Duty (${system}; pressures are gauge)`, {
    columns: [{ header: 'Item', weight: 26 }, { header: `Process side (${processWhere})`, weight: 40 }, { header: `Cooling side (${coolantWhere})`, weight: 34 }],
    rows: dutyRows(duty, o.units),
  });
  doc.moveDown(0.5);
  drawTable(doc, factsTable(limitPairs(duty, o.units)));
  const reasons = designReasons(design);
  section(doc, '2  Design', factsTable(designPairs(design, o.units, duty)));
  if (reasons.length) {
    doc.moveDown(0.4);
    drawParagraphs(doc, reasons, 9);
  }
  const methods = [methodSentence(design), shellMethodSentence(design, o.units)].filter((x): x is string => x !== undefined);
  // issue 11: the guarantee with the margin that backs it, and the fouling policy
  const policy = [guaranteeSentence(design, duty, o.units), foulingSentence(design, duty)].filter((x): x is string => x !== undefined);
  section(doc, '3  Predicted performance', factsTable(performancePairs(design, o.units)), 12 * (methods.length + policy.length) + 12);
  doc.moveDown(0.4);
  drawParagraphs(doc, [...policy, ...methods], 9);
  const cases = casesTable(design, o.units);
  if (cases) {
    ensureSpace(doc, tableKeepHeight(doc, cases) + 20);
    doc.moveDown(0.4);
    drawParagraphs(doc, ['Operating cases: the design rated at each.'], 9);
    drawTable(doc, cases);
  }
  const r = design.rating;
  drawNoticeBox(doc, {
    title: 'Cautions',
    // the engine's standard caution says what OFFER_CAUTIONS say; any other caution is added
    paragraphs: [...OFFER_CAUTIONS, ...(r.caution && r.caution !== ENGINEERING_CAUTION ? [r.caution] : [])],
    bullets: r.warnings.map((w) => w.message),
  });
}

function drawCommercial(doc: PDFKit.PDFDocument, o: OfferPdfInput): void {
  const { price, design, leadTimeWeeks, validUntil } = o.revision;
  const n = shellsOf(design);
  const tubes = `${design.tubeCount} × ${tubeOdLabel(design.tubeOuterDiameter_m, o.units)} ${materialName(design.tubeMaterial).toLowerCase()} tubes`;
  const unitText = `Shell-and-tube cooler as section 2 (${n > 1 ? `${n} shells in series, ${tubes} each` : tubes})`;
  section(doc, '4  Price', {
    columns: [
      { header: 'Description', weight: 46 },
      { header: 'Qty', weight: 9, align: 'right' },
      { header: 'Unit', weight: 9 },
      { header: 'Rate', weight: 17, align: 'right' },
      { header: 'Amount', weight: 19, align: 'right' },
    ],
    rows: priceRows(price, o.showLines, unitText),
    zebra: o.showLines === 'detailed',
  });
  doc.moveDown(0.5);
  ensureSpace(doc, 90); // the payment split and the delivery sentence stay together
  drawTable(doc, { columns: [{ weight: 81 }, { weight: 19, align: 'right', font: FONT.semibold }], rows: paymentRows(price, o.depositPct) });
  doc.moveDown(0.5);
  const validity = validUntil ? `This offer is valid until ${longDate(validUntil)}.` : 'The validity date is set when the offer is approved.';
  drawParagraphs(doc, [`Delivery: ${leadTimeWeeks} weeks after acceptance and receipt of the deposit. ${validity} Prices in ${price.currency}, excluding taxes.`]);
  if (o.terms.length > 0) {
    drawHeading(doc, '5  Terms', 40);
    drawParagraphs(doc, o.terms);
  }
}

/** Section numbers after the price: terms (when any), alternatives (when any), then the datasheet. */
const alternativesNumber = (o: OfferPdfInput) => (o.terms.length > 0 ? 6 : 5);
const datasheetNumber = (o: OfferPdfInput) => alternativesNumber(o) + (o.revision.alternatives.length > 0 ? 1 : 0);

function drawAlternatives(doc: PDFKit.PDFDocument, o: OfferPdfInput): void {
  const alts = o.revision.alternatives.slice(0, 5);
  if (alts.length === 0) return;
  const len = (v: number) => showQuantity(v, 'length', o.units, { unit: o.units === 'SI' ? 'm' : 'ft' });
  section(doc, `${alternativesNumber(o)}  Alternative designs (priced on request)`, {
    fontSize: 8.5,
    columns: [
      { header: 'Tubes (per shell)', weight: 22 },
      { header: 'Material', weight: 16 },
      { header: 'Layout', weight: 8 },
      { header: 'Length', weight: 9, align: 'right' },
      { header: 'Passes', weight: 7, align: 'right' },
      { header: 'Shell', weight: 13 },
      { header: 'Shells', weight: 7, align: 'right' },
      { header: 'Process in', weight: 9 },
      { header: 'Area', weight: 9, align: 'right' },
    ],
    rows: alts.map((a) => [
      `${a.tubeCount} × ${tubeOdLabel(a.tubeOuterDiameter_m, o.units)} OD, ${a.tubeWallLabel}`,
      materialName(a.tubeMaterial),
      a.layout !== undefined ? `${a.layout}°` : '–',
      len(a.tubeLength_m),
      String(a.tubePasses),
      a.shellLabel ?? '–',
      String(shellsOf(a)),
      processSideOf(a) === 'shell' ? 'shell' : 'tubes',
      showQuantity(a.area_m2, 'area', o.units),
    ]),
  });
}

/** Renders the offer as an A4 PDF. */
export async function renderOfferPdf(raw: OfferPdfInput): Promise<Buffer> {
  // signs the shipped font lacks (≈, ≥, →) in the engine's words become words it has
  const input = latinStrings(raw);
  const r = input.revision;
  const title = `${KIND_TITLE[r.kind]} ${input.quote.number}, revision ${r.number}`;
  const doc = createPdf({
    title,
    author: input.fabricator.name,
    subject: `Shell-and-tube cooler for ${input.customer.organizationName}`,
    keywords: `${input.quote.number}, shell-and-tube cooler, offer`,
    createdAt: new Date(input.issuedAt),
  });
  drawOpening(doc, input);
  drawEngineering(doc, input);
  drawCommercial(doc, input);
  drawAlternatives(doc, input);
  drawDatasheet(doc, r, input.units, `${datasheetNumber(input)}  Datasheet`);
  drawPageFrames(doc, {
    name: input.fabricator.name,
    tagline: 'Shell-and-tube coolers built to order',
    headerRight: `${KIND_TITLE[r.kind]} ${input.quote.number}`,
    footerLeft: `${input.quote.number} · revision ${r.number} (${r.kind}) · issued ${longDate(input.issuedAt)}`,
  });
  return pdfToBuffer(doc);
}
