/**
 * The build sheet of an order, derived from the frozen revision: cut list and bill of materials
 * (the pricing BOM, without prices), the drilling pattern from the engine's layout, baffles,
 * nozzles, the tube-to-tubesheet joint, hydrotest pressures with their basis, inspection points.
 */
import type { SessionUser } from '../../../shared/schemas/auth';
import type { BuildSheet } from '../../../shared/schemas/build-sheet';
import { baffleCount, baffleThickness_m, tubesheetDiameter_m, tubesheetThickness_m } from '../pricing/bom-rules';
import { billOfMaterials, nozzleSizes, shellSpec, tubeLabels } from '../pricing/bom';
import { getPriceBookVersion } from '../pricing/repository';
import * as quoteRepo from '../quotes/repository';
import { materialName } from '../../lib/pdf/design-rows';
import type { OrderDeps } from './deps';
import { drillingPattern } from './drilling';
import { getOrder } from './service';

const ATM = 101_325;
/** 1.3: ASME VIII-1 UG-99(b) hydrostatic test factor, stress ratio taken as 1 (memory; verify against the edition in force). */
const HYDROTEST_FACTOR = 1.3;
/**
 * Design pressure from the operating pressure: 10 % above it and at least 1 bar above it (common
 * practice). The responsible engineer sets the MAWP; this sheet shows the estimate it was built on.
 */
const designPressure = (operatingGauge_Pa: number) => Math.max(operatingGauge_Pa * 1.1, operatingGauge_Pa + 1e5);

export const SHEET_CAUTIONS = [
  'Pressure equipment: dimensions, thicknesses and test pressures on this sheet are estimates from the quotation design.',
  'Build only to drawings and calculations released by the fabricator’s responsible engineer under the pressure-vessel code in force where the unit is installed (ASME Section VIII, PED or local rules), and to the customer’s site rules.',
];

export async function buildSheet(deps: OrderDeps, viewer: SessionUser, orderId: string): Promise<BuildSheet> {
  const order = await getOrder(deps, viewer, orderId);
  // the revision the buyer accepted and paid for, whatever the quote did afterwards
  const revision = (await quoteRepo.findRevision(deps.db, order.quoteId, order.revisionNumber))!;
  const book = await getPriceBookVersion(deps.db, revision.priceBookVersion);
  const d = order.design;
  const labels = tubeLabels(d);
  const ds = d.shellInnerDiameter_m ?? 0;
  const shell = shellSpec(d);
  const drilling = drillingPattern(d);
  const bom = billOfMaterials(d, book);
  const duty = revision.data.duty;
  const tubeGauge = Math.max(duty.process.pressure_Pa - ATM, 0);
  const shellGauge = duty.boundary.kind === 'coolant' ? Math.max(duty.boundary.pressure_Pa - ATM, 0) : 0;
  const nozzles = nozzleSizes(d, ds);
  const cut = d.tubeLength_m + book.tubeCutAllowance_m;
  return {
    order: { id: order.id, number: order.number, quoteNumber: order.quoteNumber, customer: order.organizationName, poNumber: order.poNumber, needBy: order.needBy, quantity: order.quantity, status: order.status },
    design: {
      tubeCount: d.tubeCount, tubeOd: labels.od, tubeWall: labels.wall, tubeMaterial: materialName(d.tubeMaterial), tubeLength_m: d.tubeLength_m,
      tubePasses: d.tubePasses, layout: drilling.layout, pitch_mm: drilling.pitch_mm, shell: shell.label, shellInnerDiameter_mm: Math.round(ds * 1000 * 10) / 10, area_m2: d.area_m2,
    },
    cutList: { tubes: d.tubeCount, cutLength_m: cut, finishedLength_m: d.tubeLength_m, allowance_m: book.tubeCutAllowance_m, material: materialName(d.tubeMaterial), od: labels.od, wall: labels.wall, totalLength_m: cut * d.tubeCount },
    billOfMaterials: bom.filter((b) => b.group === 'material').map(({ key, description, quantity, unit }) => ({ key, description, quantity, unit })),
    labour: bom.filter((b) => b.group === 'labour').map(({ key, description, quantity }) => ({ key, description, hours: quantity })),
    baffles: {
      count: baffleCount(d.tubeLength_m, d.baffleSpacing_m),
      spacing_mm: Math.round((d.baffleSpacing_m ?? 0) * 1000),
      cut_pct: 25,
      thickness_mm: baffleThickness_m(ds) * 1000,
    },
    tubesheet: {
      holeCount: drilling.tubeHoles,
      tieRodHoles: drilling.holes.length - drilling.tubeHoles,
      holeDiameter_mm: drilling.holeDiameter_mm,
      pitch_mm: drilling.pitch_mm,
      layout: drilling.layout,
      outerTubeLimit_mm: drilling.outerTubeLimit_mm,
      passLanes: d.tubePasses <= 1 ? 0 : d.tubePasses === 2 ? 1 : d.tubePasses / 2,
      thickness_mm: Math.round(tubesheetThickness_m(ds) * 1000),
      diameter_mm: Math.round(tubesheetDiameter_m(ds) * 1000),
    },
    holes: drilling.holes,
    nozzles: [
      { side: 'tube', nps: nozzles.tube, rating: 'Class 150' },
      { side: 'shell', nps: nozzles.shell, rating: 'Class 150' },
    ],
    joint: d.tubeMaterial.startsWith('stainless') || d.tubeMaterial.startsWith('titanium')
      ? 'Tubes expanded into grooved holes and seal-welded (common practice for this material)'
      : 'Tubes roller-expanded into holes with two grooves (common practice)',
    hydrotest: {
      tubeSide_Pa: Math.round(HYDROTEST_FACTOR * designPressure(tubeGauge)),
      shellSide_Pa: Math.round(HYDROTEST_FACTOR * designPressure(shellGauge)),
      basis: 'ASME VIII-1 UG-99(b): 1.3 × design pressure × stress ratio (ratio taken as 1); design pressure estimated as the larger of 1.1 × and 1 bar above the operating gauge pressure of the duty (memory; the responsible engineer confirms the MAWP and the test pressure).',
    },
    inspection: [
      'Material certificates of tubes, tubesheets, shell and nozzles checked against the bill of materials',
      'Tubesheet drilling checked against the hole pattern (hole count, pitch, diameter, ligaments)',
      'Tube expansion checked on sample holes (wall reduction per the joint procedure)',
      'Welds visually inspected; NDE as the code and the customer specification require',
      'Hydrotest shell side, then tube side, at the pressures above, held and inspected for leaks',
      'Nameplate, painting and nozzle covers checked before shipment',
    ],
    cautions: SHEET_CAUTIONS,
  };
}
