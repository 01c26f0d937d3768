/**
 * An invented order's build sheet for the PDF test, without the database: a glycol cooler sized by
 * the real engine, then the pure parts `buildSheet` (server/features/orders/build-sheet.ts) uses:
 * the drilling pattern, the bill of materials and the demo price book's cut allowance and hours.
 * Customer, order and PO are invented.
 */
import type { BuildSheet } from '../../shared/schemas/build-sheet';
import { sizeRequestSchema, type Design } from '../../shared/schemas/thermal';
import { sizeParsed } from '../../shared/thermal/size';
import { SHEET_CAUTIONS } from '../../server/features/orders/build-sheet';
import { drillingPattern } from '../../server/features/orders/drilling';
import { baffleCount, baffleThickness_m, tubesheetDiameter_m, tubesheetThickness_m } from '../../server/features/pricing/bom-rules';
import { billOfMaterials, nozzleSizes, shellSpec, tubeLabels } from '../../server/features/pricing/bom';
import { demoPriceBook } from '../../server/features/pricing/demo-price-book';
import { materialName } from '../../server/lib/pdf/design-rows';

const ATM = 101_325;

/** 50 % ethylene glycol, 5 kg/s from 80 °C to 50 °C at 4 bar(g), water 15 kg/s at 28 °C and 3 bar(g), four passes. */
export const glycolDuty = sizeRequestSchema.parse({
  process: { fluid: 'ethylene-glycol-50', pressure_Pa: 4e5 + ATM, massFlow_kg_s: 5, inletTemp_C: 80, outletTemp_C: 50 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 3e5 + ATM, massFlow_kg_s: 15, inletTemp_C: 28 },
  constraints: { maxTubeLength_m: 4.5, maxPressureDrop_Pa: 80000, tubePasses: [4], layouts: [30] },
});

/**
 * Hydrotest as build-sheet.ts states its basis: 1.3 × the larger of 1.1 × and 1 bar above the
 * operating gauge pressure. Tube side 4 bar(g): 1.3 × 5 bar = 6.5 bar = 650 000 Pa; shell side
 * 3 bar(g): 1.3 × 4 bar = 5.2 bar = 520 000 Pa (by hand).
 */
export const HYDROTEST = { tubeSide_Pa: 650_000, shellSide_Pa: 520_000 };

export const INSPECTION = [
  'Material certificates of tubes, tubesheets, shell and nozzles checked against the bill of materials',
  'Tubesheet drilling checked against the hole pattern (hole count, pitch, diameter, ligaments)',
  'Tube expansion checked on sample holes (wall reduction per the joint procedure)',
  'Welds visually inspected; NDE as the code and the customer specification require',
  'Hydrotest shell side, then tube side, at the pressures above, held and inspected for leaks',
  'Nameplate, painting and nozzle covers checked before shipment',
];

export const HYDROTEST_BASIS = 'ASME VIII-1 UG-99(b): 1.3 × design pressure × stress ratio (ratio taken as 1); design pressure estimated as the larger of 1.1 × and 1 bar above the operating gauge pressure of the duty (memory; the responsible engineer confirms the MAWP and the test pressure).';

export function glycolDesign(): Design {
  return sizeParsed(glycolDuty).recommended;
}

export function buildSheetFixture(d: Design = glycolDesign()): BuildSheet {
  const ds = d.shellInnerDiameter_m!;
  const labels = tubeLabels(d);
  const drilling = drillingPattern(d);
  const bom = billOfMaterials(d, demoPriceBook);
  const nozzles = nozzleSizes(d, ds);
  const allowance = demoPriceBook.tubeCutAllowance_m;
  const cut = d.tubeLength_m + allowance;
  return {
    order: { id: 'ord_test', number: 'O-2026-0017', quoteNumber: 'Q-2026-0051', customer: 'Harwick Process Cooling', poNumber: 'HPC-PO-88412', needBy: '2026-07-15', quantity: 1, status: 'released' },
    design: {
      tubeCount: d.tubeCount, tubeOd: labels.od, tubeWall: labels.wall, tubeMaterial: materialName(d.tubeMaterial), tubeLength_m: d.tubeLength_m, tubePasses: d.tubePasses,
      layout: drilling.layout, pitch_mm: drilling.pitch_mm, shell: shellSpec(d).label, shellInnerDiameter_mm: Math.round(ds * 10000) / 10, area_m2: d.area_m2,
    },
    cutList: { tubes: d.tubeCount, cutLength_m: cut, finishedLength_m: d.tubeLength_m, allowance_m: allowance, material: materialName(d.tubeMaterial), od: labels.od, wall: labels.wall, totalLength_m: cut * d.tubeCount },
    billOfMaterials: bom.filter((b) => b.group === 'material').map(({ key, description, quantity, unit }) => ({ key, description, quantity, unit })),
    labour: bom.filter((b) => b.group === 'labour').map(({ key, description, quantity }) => ({ key, description, hours: quantity })),
    baffles: { count: baffleCount(d.tubeLength_m, d.baffleSpacing_m), spacing_mm: Math.round((d.baffleSpacing_m ?? 0) * 1000), cut_pct: 25, thickness_mm: baffleThickness_m(ds) * 1000 },
    tubesheet: {
      holeCount: drilling.tubeHoles, tieRodHoles: drilling.holes.length - drilling.tubeHoles, holeDiameter_mm: drilling.holeDiameter_mm, pitch_mm: drilling.pitch_mm,
      layout: drilling.layout, outerTubeLimit_mm: drilling.outerTubeLimit_mm, passLanes: d.tubePasses <= 1 ? 0 : d.tubePasses === 2 ? 1 : d.tubePasses / 2,
      thickness_mm: Math.round(tubesheetThickness_m(ds) * 1000), diameter_mm: Math.round(tubesheetDiameter_m(ds) * 1000),
    },
    holes: drilling.holes,
    nozzles: [{ side: 'tube', nps: nozzles.tube, rating: 'Class 150' }, { side: 'shell', nps: nozzles.shell, rating: 'Class 150' }],
    joint: 'Tubes roller-expanded into holes with two grooves (common practice)',
    hydrotest: { ...HYDROTEST, basis: HYDROTEST_BASIS },
    inspection: INSPECTION,
    cautions: [...SHEET_CAUTIONS],
  };
}
