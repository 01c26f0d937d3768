/**
 * The offer's datasheet page (issue 12): per side the fluid, design pressure and temperature
 * (shared/thermal/checks/walls.ts designConditions: the duty's design point or the stated default),
 * passes and connections (the design's nozzles); the construction (TEMA type and class) and the
 * materials; the estimated empty and full weights (pricing/weights.ts); and the temperature profile
 * drawn from the rating.
 */
import type { Revision } from '../../../shared/schemas/quotes';
import { designConditions, type DesignPoint } from '../../../shared/thermal/checks/walls';
import type { UnitSystem } from '../../../shared/thermal/units';
import { drawHeading, drawParagraphs } from '../../lib/pdf/blocks';
import { CONSTRUCTION_NAMES, materialName, TEMA_CLASS_NAMES } from '../../lib/pdf/design-rows';
import { fluidName } from '../../lib/pdf/duty-rows';
import { drawProfileChart } from '../../lib/pdf/profile-chart';
import { formatNumber, showQuantity } from '../../lib/pdf/quantities';
import { drawTable, factsTable } from '../../lib/pdf/table';
import { plateGrades } from '../pricing/bom-rules';
import { processSideOf, shellsOf } from '../pricing/design-fields';
import { estimateWeights } from '../pricing/weights';

const DASH = '–';
const KG_PER_LB = 0.45359237;

const weight = (kg: number, units: UnitSystem) => (units === 'US' ? `${formatNumber(kg / KG_PER_LB, 3)} lb` : `${formatNumber(kg, 3)} kg`);

function designPoint(p: DesignPoint, units: UnitSystem): [string, string] {
  const basis = p.stated ? 'as stated' : 'operating + 10 %, at least 1 bar more';
  return [`${showQuantity(p.pressure_Pa, 'pressure', units, { pressureBasis: 'gauge' })} (${basis})`, showQuantity(p.temp_C, 'temperature', units)];
}

/** "inlet NPS 2, outlet NPS 2" from the design's nozzles on `side`. */
function connections(r: Revision, side: 'tube' | 'shell'): string {
  const ns = (r.design.nozzles ?? []).filter((z) => z.side === side);
  if (!ns.length) return 'sized in the detail design';
  return ns.map((z) => `${z.role} ${z.label}${z.impingementPlate ? ' (impingement plate)' : ''}`).join(', ');
}

/** Rows `[item, tube side, shell side]`. */
export function datasheetRows(r: Revision, units: UnitSystem): string[][] {
  const { duty, design } = r;
  const dc = designConditions(duty);
  const bath = duty.boundary.kind === 'wall';
  const processOnShell = processSideOf(design) === 'shell' && !bath;
  const coolantName = duty.boundary.kind === 'coolant' ? fluidName(duty.boundary.fluid) : 'Bath at constant wall temperature';
  const process = { name: `${fluidName(duty.process.fluid)} (process)`, point: designPoint(dc.process, units) };
  const coolant = { name: bath ? coolantName : `${coolantName} (coolant)`, point: bath ? ([DASH, DASH] as [string, string]) : designPoint(dc.boundary, units) };
  const [tube, shell] = processOnShell ? [coolant, process] : [process, coolant];
  const n = shellsOf(design);
  return [
    ['Fluid', tube.name, shell.name],
    ['Design pressure', tube.point[0], shell.point[0]],
    ['Design temperature', tube.point[1], shell.point[1]],
    ['Passes', `${design.tubePasses} tube pass${design.tubePasses === 1 ? '' : 'es'}`, `1 shell pass${n > 1 ? ` per shell, ${n} shells in series` : ''}`],
    ['Connections', connections(r, 'tube'), bath ? DASH : connections(r, 'shell')],
  ];
}

/** Label/value pairs of the construction, materials and weights. */
export function constructionFacts(r: Revision, units: UnitSystem): [string, string][] {
  const d = r.design;
  const cons = d.construction ?? 'BEM';
  const cls = d.temaClass ?? 'C';
  const grades = plateGrades(d.tubeMaterial);
  const w = estimateWeights(d);
  const n = shellsOf(d);
  return [
    ['TEMA type', `${cons} (${CONSTRUCTION_NAMES[cons] ?? cons})`],
    ['TEMA class', `${cls} (${TEMA_CLASS_NAMES[cls] ?? cls})`],
    ['Tubes', materialName(d.tubeMaterial)],
    ['Tubesheets', materialName(grades.tubesheets)],
    ['Baffles', materialName(grades.baffles)],
    ['Shell and channels', materialName('carbon-steel')],
    ['Empty weight', `about ${weight(w.empty_kg, units)}${n > 1 ? ` (${n} shells)` : ''}`],
    ['Full of water', `about ${weight(w.full_kg, units)}`],
  ];
}

/** The cold side as levels, where the profile has no coolant curve (as on the sizing page). */
function coldLevels(r: Revision): { label: string; temp_C: number }[] {
  const b = r.duty.boundary;
  if (b.kind === 'wall') return [{ label: 'Bath (wall temperature)', temp_C: b.wallTemp_C }];
  const out = r.design.rating.coolantOutletTemp_C;
  return [{ label: 'Coolant inlet', temp_C: b.inletTemp_C }, ...(out === undefined ? [] : [{ label: 'Coolant outlet', temp_C: out }])];
}

/** Draws the datasheet on a page of its own. */
export function drawDatasheet(doc: PDFKit.PDFDocument, r: Revision, units: UnitSystem, title: string): void {
  doc.addPage();
  drawHeading(doc, title, 120);
  drawTable(doc, {
    columns: [{ header: 'Item', weight: 22 }, { header: 'Tube side', weight: 39 }, { header: 'Shell side', weight: 39 }],
    rows: datasheetRows(r, units),
  });
  doc.moveDown(0.6);
  drawTable(doc, factsTable(constructionFacts(r, units)));
  doc.moveDown(0.4);
  drawParagraphs(
    doc,
    [
      'Weights per unit, estimated for quotation (about ±15 %): tubes, tubesheets, baffles, shell and channel heads from the same ' +
        'dimensions the price is built on, plus 10 % for nozzles, flanges, tie rods and bolting; full means both sides filled with water (the hydrotest weight).',
    ],
    8.5,
  );
  const profile = r.design.rating.profile;
  if (profile.length >= 2) {
    const bath = r.duty.boundary;
    drawHeading(doc, 'Temperature profile', 250);
    drawProfileChart(doc, {
      profile,
      units,
      processLabel: `${fluidName(r.duty.process.fluid)} (process)`,
      coolantLabel: bath.kind === 'coolant' ? `${fluidName(bath.fluid)} (coolant)` : 'Bath',
      levels: coldLevels(r),
    });
  }
}
