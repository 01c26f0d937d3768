/**
 * The build sheet as an A4 shop document (issue 5): the order, the design (shells in series and
 * which fluid goes where), the cut list per shell and for the cooler, the bill of materials and
 * labour, the tubesheets (how many) with their drilling pattern drawn to scale on a page of its own,
 * baffles (count per shell and in all, spacings, cut), nozzles marked by fluid, interconnections
 * between shells, the joint, each side's hydrotest pressure with its basis, an inspection
 * checklist, and the cautions of the domain brief (section 4) on the first page.
 */
import { formatDate, plural } from '../../../shared/format';
import type { BuildSheet } from '../../../shared/schemas/build-sheet';
import { ORDER_STATUS_LABEL, type OrderStatus } from '../../../shared/schemas/orders';
import { fromSI, STANDARD_ATMOSPHERE_PA } from '../../../shared/thermal/units';
import { drawHeading, drawNoticeBox, drawParagraphs } from '../../lib/pdf/blocks';
import { checklistKeepHeight, drawChecklist } from '../../lib/pdf/checklist';
import { COLOR, CONTENT_WIDTH, PAGE, createPdf, pdfToBuffer } from '../../lib/pdf/document';
import { scaleLabel } from '../../lib/pdf/drawing-scale';
import type { DrillingDrawing } from '../../lib/pdf/drilling-drawing';
import { drawDrillingPage, drillingPageScale } from '../../lib/pdf/drilling-page';
import { FONT } from '../../lib/pdf/fonts';
import { latinStrings } from '../../lib/pdf/glyphs';
import { drawPageFrames } from '../../lib/pdf/page-frame';
import { formatNumber } from '../../lib/pdf/quantities';
import { drawFacts, drawTable, factsTable, tableKeepHeight, type TableOptions } from '../../lib/pdf/table';
import { FABRICATOR } from '../quotes/fabricator';

const LAYOUT_NAMES: Record<number, string> = { 30: '30° triangular', 60: '60° rotated triangular', 90: '90° square', 45: '45° rotated square' };

const mm = (v: number) => `${formatNumber(v, 4)} mm`;
/** A length in whole millimetres, e.g. "2,550 mm" (cut lengths are set out to the millimetre). */
const mmFromM = (m: number) => `${formatNumber(Math.round(m * 1000), 6)} mm`;
const metres = (m: number) => `${formatNumber(Math.round(m * 100) / 100, 6)} m`;
const layoutName = (layout: number) => LAYOUT_NAMES[layout] ?? `${layout}°`;
const statusName = (s: string) => ORDER_STATUS_LABEL[s as OrderStatus] ?? s;

/**
 * A gauge test pressure, Pa, in bar(g) and psig, rounded up (0.1 bar, 1 psi) so the gauge reading
 * is never below the required pressure.
 */
export function testPressure(gauge_Pa: number): { bar: string; psig: string } {
  const up = (v: number, step: number) => Math.ceil(v / step - 1e-9) * step;
  const abs = gauge_Pa + STANDARD_ATMOSPHERE_PA;
  const bar = fromSI(abs, 'pressure', 'SI', { pressureBasis: 'gauge' });
  const psi = fromSI(abs, 'pressure', 'US', { pressureBasis: 'gauge' });
  return { bar: `${up(bar.value, 0.1).toFixed(1)} ${bar.label}`, psig: `${formatNumber(up(psi.value, 1), 6)} ${psi.label}` };
}

/** A section heading kept on the page of the table that follows it. */
function section(doc: PDFKit.PDFDocument, title: string, table: TableOptions, extra = 0): void {
  drawHeading(doc, title, tableKeepHeight(doc, table) + extra);
  drawTable(doc, table);
}

function drawOpening(doc: PDFKit.PDFDocument, s: BuildSheet): void {
  const o = s.order;
  doc.font(FONT.bold).fontSize(20).fillColor(COLOR.accent).text(`Build sheet ${o.number}`, PAGE.left, PAGE.top, { width: CONTENT_WIDTH });
  doc.font(FONT.regular).fontSize(10.5).fillColor(COLOR.muted).text(`Shop document · shell-and-tube cooler for ${o.customer}, from quote ${o.quoteNumber}`, { width: CONTENT_WIDTH });
  doc.moveDown(0.6);
  drawFacts(doc, [
    ['Order', o.number],
    ['Quote', o.quoteNumber],
    ['Customer', o.customer],
    ['Purchase order', o.poNumber],
    ['Needed by', o.needBy ? formatDate(o.needBy.slice(0, 10)) : 'not stated'],
    ['Quantity', plural(o.quantity, 'unit')],
    ['Status', statusName(o.status)],
  ], 9.5);
  drawNoticeBox(doc, { title: 'Cautions', paragraphs: s.cautions });
}

const streamWord = (stream: string) => (stream === 'wall' ? 'bath' : stream);

function drawDesignAndCuts(doc: PDFKit.PDFDocument, s: BuildSheet): void {
  const d = s.design;
  const a = s.allocation;
  const n = s.shells.inSeries;
  const area = n === 1 ? `${formatNumber(d.area_m2, 3)} m²` : `${formatNumber(d.area_m2, 3)} m² in all (${formatNumber(d.areaPerShell_m2, 3)} m² per shell)`;
  section(doc, '1  Design', factsTable([
    ['Shells in series', n === 1 ? '1' : `${n}: build ${n} identical shells`],
    ['In the tubes', `${a.tubeSide.fluid} (${streamWord(a.tubeSide.stream)})`],
    ['On the shell side', `${a.shellSide.fluid} (${streamWord(a.shellSide.stream)})`],
    ['Why this allocation', a.reason],
    ['Tubes', `${d.tubeCount} × ${d.tubeOd} OD, ${d.tubeWall}${n > 1 ? ' per shell' : ''}`],
    ['Tube material', d.tubeMaterial],
    ['Tube length (finished)', mmFromM(d.tubeLength_m)],
    ['Tube passes', String(d.tubePasses)],
    ['Layout', layoutName(d.layout)],
    ['Pitch', mm(d.pitch_mm)],
    ['Shell', `${d.shell}, ${mm(d.shellInnerDiameter_mm)} ID`],
    ...(d.construction ? [['Construction (TEMA)', `${d.construction}, class ${d.temaClass ?? 'C'}`] as [string, string]] : []),
    ['Heat-transfer area', area],
  ]));
  if (n > 1) {
    doc.moveDown(0.3);
    drawParagraphs(doc, [s.shells.instruction], 9.5);
  }
  const c = s.cutList;
  const row = [String(c.tubes), mmFromM(c.cutLength_m), `${mmFromM(c.finishedLength_m)} + ${mmFromM(c.allowance_m)}`, c.material, c.od, c.wall, metres(c.totalLength_m / c.shells)];
  section(doc, n === 1 ? '2  Cut list' : `2  Cut list (per shell, then ${n} shells)`, {
    columns: [
      { header: 'Tubes', weight: 8, align: 'right', font: FONT.semibold },
      { header: 'Cut length', weight: 13, align: 'right', font: FONT.semibold },
      { header: 'Finished + allowance', weight: 20, align: 'right' },
      { header: 'Material', weight: 20 },
      { header: 'OD', weight: 9 },
      { header: 'Gauge', weight: 10 },
      { header: 'Total length', weight: 13, align: 'right', font: FONT.semibold },
    ],
    rows: n === 1 ? [row] : [row, { cells: [String(c.tubesAllShells), mmFromM(c.cutLength_m), `× ${n} shells`, c.material, c.od, c.wall, metres(c.totalLength_m)], emphasis: true }],
  });
}

function drawMaterials(doc: PDFKit.PDFDocument, s: BuildSheet): void {
  section(doc, '5  Bill of materials and labour', {
    columns: [{ header: 'Description', weight: 74 }, { header: 'Quantity', weight: 14, align: 'right' }, { header: 'Unit', weight: 12 }],
    rows: s.billOfMaterials.map((b) => [b.description, formatNumber(b.quantity, 4), b.unit]),
    zebra: true,
  });
  doc.moveDown(0.6);
  const total = s.labour.reduce((sum, l) => sum + l.hours, 0);
  drawTable(doc, {
    columns: [{ header: 'Labour by operation', weight: 74 }, { header: 'Hours', weight: 14, align: 'right' }, { header: '', weight: 12 }],
    rows: [...s.labour.map((l) => [l.description, formatNumber(l.hours, 4), 'h']), { cells: ['Total labour', formatNumber(total, 4), 'h'], emphasis: true }],
  });
}

function drawTubesheet(doc: PDFKit.PDFDocument, s: BuildSheet, reduction: number): void {
  const t = s.tubesheet;
  const n = s.shells.inSeries;
  const title = n === 1 ? '3  Tubesheets (two, drilled alike)' : `3  Tubesheets (${t.quantity}: two per shell, all drilled alike)`;
  section(doc, title, factsTable([
    ['Tubesheets to drill', n === 1 ? '2' : `${t.quantity} (2 per shell × ${n} shells)`],
    ['Tube holes', String(t.holeCount)],
    ['Tie-rod holes', String(t.tieRodHoles)],
    ['Hole diameter', mm(t.holeDiameter_mm)],
    ['Pitch', mm(t.pitch_mm)],
    ['Layout', layoutName(t.layout)],
    ['Outer tube limit', `Ø ${mm(t.outerTubeLimit_mm)}`],
    ['Pass-partition lanes', String(t.passLanes)],
    ['Thickness', mm(t.thickness_mm)],
    ['Diameter', `Ø ${mm(t.diameter_mm)}`],
    ['Drilling pattern', `last page, scale ${scaleLabel(reduction)}`],
  ]));
}

function drawShellParts(doc: PDFKit.PDFDocument, s: BuildSheet): void {
  const b = s.baffles;
  const n = s.shells.inSeries;
  const nozzle = (side: 'tube' | 'shell') =>
    s.nozzles.filter((x) => x.side === side).map((x) => x.role
      ? `${x.role} NPS ${formatNumber(x.nps, 3)} (${x.innerDiameter_mm} mm bore), ${x.rating}, ${x.velocity_m_s} m/s, ρv² ${x.rhoV2} kg/(m·s²)${x.impingementPlate ? ', impingement plate' : ''}, marked ${x.fluid}`
      : `NPS ${formatNumber(x.nps, 3)}, ${x.rating}, ${x.perShell} per shell (in + out), marked ${x.fluid}`).join('; ') || '–';
  const spacing = b.inletSpacing_mm === b.spacing_mm && b.outletSpacing_mm === b.spacing_mm
    ? `${mm(b.spacing_mm)} (inlet and outlet the same)`
    : `${mm(b.spacing_mm)} central; inlet ${mm(b.inletSpacing_mm)}, outlet ${mm(b.outletSpacing_mm)}`;
  const rows: [string, string][] = [
    ['Baffles', n === 1 ? `${b.count} segmental` : `${b.count} segmental per shell; ${b.total} in all (${n} shells)`],
    ['Baffle spacing', spacing],
    ['Baffle cut', `${formatNumber(b.cut_pct, 3)} % of the shell ID (${mm(b.cut_mm)})`],
    ['Baffle thickness', mm(b.thickness_mm)],
    ['Nozzles, tube side', nozzle('tube')],
    ['Nozzles, shell side', nozzle('shell')],
  ];
  for (const c of s.shells.interconnections) rows.push([`Interconnection ${c.from} to ${c.to}`, `${c.side} side, flanged spool NPS ${formatNumber(c.nps, 3)}: outlet of shell ${c.from} to inlet of shell ${c.to}`]);
  section(doc, '4  Baffles, nozzles and joint', factsTable(rows), 30); // the joint sentence stays with the table
  doc.moveDown(0.4);
  drawParagraphs(doc, [`Tube-to-tubesheet joint: ${s.joint}.`]);
}

function drawHydrotest(doc: PDFKit.PDFDocument, s: BuildSheet): void {
  const h = s.hydrotest;
  const tube = testPressure(h.tubeSide_Pa);
  const shell = testPressure(h.shellSide_Pa);
  section(doc, '6  Hydrotest', {
    columns: [
      { header: 'Side', weight: 18 },
      { header: 'Fluid in service', weight: 34 },
      { header: 'Test pressure, bar(g)', weight: 24, align: 'right', font: FONT.semibold },
      { header: 'Test pressure, psig', weight: 24, align: 'right', font: FONT.semibold },
    ],
    rows: [['Tube side', h.tubeSideFluid, tube.bar, tube.psig], ['Shell side', h.shellSideFluid, shell.bar, shell.psig]],
  }, 70); // the basis stays with the table
  doc.moveDown(0.4);
  const each = h.shells > 1 ? [`Test each of the ${h.shells} shells on both sides.`] : [];
  drawParagraphs(doc, [...each, `Basis: ${h.basis}`, 'Pressures are rounded up to 0.1 bar and 1 psi.'], 9);
}

/** Renders the build sheet as an A4 PDF. */
export async function renderBuildSheetPdf(input: BuildSheet): Promise<Buffer> {
  const sheet = latinStrings(input);
  const o = sheet.order;
  const doc = createPdf({
    title: `Build sheet ${o.number}`,
    author: FABRICATOR.name,
    subject: `Shop build sheet: shell-and-tube cooler for ${o.customer} (quote ${o.quoteNumber})`,
    keywords: `${o.number}, ${o.quoteNumber}, build sheet, drilling pattern`,
    // the sheet carries no issue date; a fixed one keeps the same sheet rendering the same bytes
    createdAt: new Date(0),
  });
  const t = sheet.tubesheet;
  const drawing: DrillingDrawing = { holes: sheet.holes, holeDiameter_mm: t.holeDiameter_mm, outerTubeLimit_mm: t.outerTubeLimit_mm, tubesheetDiameter_mm: t.diameter_mm };
  drawOpening(doc, sheet);
  drawDesignAndCuts(doc, sheet);
  drawTubesheet(doc, sheet, drillingPageScale(doc, drawing));
  drawShellParts(doc, sheet);
  drawMaterials(doc, sheet);
  drawHydrotest(doc, sheet);
  drawHeading(doc, '7  Inspection', checklistKeepHeight(doc, sheet.inspection));
  drawChecklist(doc, sheet.inspection);
  drawDrillingPage(doc, {
    drawing,
    caption: [
      `Order ${o.number} · ${t.holeCount} tube holes and ${t.tieRodHoles} tie-rod holes, Ø ${mm(t.holeDiameter_mm)}, pitch ${mm(t.pitch_mm)}, ${layoutName(t.layout)} layout, ${t.passLanes} pass-partition lane${t.passLanes === 1 ? '' : 's'}`,
      `Drill ${t.quantity} tubesheets to this pattern (2 per shell × ${plural(sheet.shells.inSeries, 'shell')}): Ø ${mm(t.diameter_mm)} × ${mm(t.thickness_mm)}, outer tube limit Ø ${mm(t.outerTubeLimit_mm)} (dashed)`,
    ],
  });
  drawPageFrames(doc, {
    name: FABRICATOR.name,
    tagline: 'Shell-and-tube coolers built to order',
    headerRight: `Build sheet ${o.number}`,
    footerLeft: `${o.number} · quote ${o.quoteNumber} · ${o.customer} · shop copy`,
  });
  return pdfToBuffer(doc);
}
