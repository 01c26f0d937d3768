/**
 * The build sheet of an order, derived from the frozen revision: cut list and bill of materials
 * (the pricing BOM, without prices), the drilling pattern from the engine's layout, baffles,
 * nozzles, the tube-to-tubesheet joint, hydrotest pressures with their basis, inspection points.
 * A cooler of N identical shells in series is built as N shells of the one design (tube and baffle
 * counts per shell, totals over the shells); which fluid goes in the tubes and which on the shell
 * side sets the nozzle marking and each side's test pressure. `sheetFromDesign` is the pure part.
 */
import type { SessionUser } from '../../../shared/schemas/auth';
import type { BuildSheet, SideFluid } from '../../../shared/schemas/build-sheet';
import type { PriceBook } from '../../../shared/schemas/price-book';
import type { Design, SizeRequest } from '../../../shared/schemas/thermal';
import { baffleThickness_m, tubesheetDiameter_m, tubesheetThickness_m } from '../pricing/bom-rules';
import { billOfMaterials, interconnections, nozzleSizes, shellSpec, tubeLabels } from '../pricing/bom';
import { baffleCutOf, bafflesPerShell, processSideOf, shellsOf } from '../pricing/design-fields';
import { getPriceBookVersion } from '../pricing/repository';
import * as quoteRepo from '../quotes/repository';
import { materialName } from '../../lib/pdf/design-rows';
import { fluidName } from '../../lib/pdf/duty-rows';
import type { OrderDeps } from './deps';
import { drillingPattern } from './drilling';
import { getOrder } from './service';
import { hydrotest, wallSides } from '../../../shared/thermal/checks/walls';

const ATM = 101_325;

export const SHEET_CAUTIONS = [
  'Pressure equipment: dimensions, thicknesses and test pressures on this sheet are estimates from the quotation design.',
  'Build only to drawings and calculations released by the fabricator’s responsible engineer under the pressure-vessel code in force where the unit is installed (ASME Section VIII, PED or local rules), and to the customer’s site rules.',
];

export async function buildSheet(deps: OrderDeps, viewer: SessionUser, orderId: string): Promise<BuildSheet> {
  const order = await getOrder(deps, viewer, orderId);
  // the revision the buyer accepted and paid for, whatever the quote did afterwards
  const revision = (await quoteRepo.findRevision(deps.db, order.quoteId, order.revisionNumber))!;
  const book = await getPriceBookVersion(deps.db, revision.priceBookVersion);
  return sheetFromDesign({
    order: { id: order.id, number: order.number, quoteNumber: order.quoteNumber, customer: order.organizationName, poNumber: order.poNumber, needBy: order.needBy, quantity: order.quantity, status: order.status },
    design: order.design,
    duty: revision.data.duty,
    book,
  });
}

/** Which fluid is on each side: the process where the design put it, the coolant (or a bath) on the other. */
export function sidesOf(d: Design, duty: SizeRequest): { tube: SideFluid & { pressure_Pa: number }; shell: SideFluid & { pressure_Pa: number } } {
  const b = duty.boundary;
  const process = { stream: 'process' as const, fluid: fluidName(duty.process.fluid), pressure_Pa: duty.process.pressure_Pa };
  const other = b.kind === 'coolant'
    ? { stream: 'coolant' as const, fluid: fluidName(b.fluid), pressure_Pa: b.pressure_Pa }
    : { stream: 'wall' as const, fluid: 'Bath at constant wall temperature', pressure_Pa: ATM };
  // a wall boundary keeps the process in the tubes (issue 10 contract)
  return processSideOf(d) === 'shell' && b.kind === 'coolant' ? { tube: other, shell: process } : { tube: process, shell: other };
}

const streamWord = (s: SideFluid) => (s.stream === 'process' ? 'process' : s.stream === 'coolant' ? 'coolant' : 'bath');

export function sheetFromDesign(src: { order: BuildSheet['order']; design: Design; duty: SizeRequest; book: PriceBook }): BuildSheet {
  const { order, design: d, duty, book } = src;
  const labels = tubeLabels(d);
  const ds = d.shellInnerDiameter_m ?? 0;
  const shell = shellSpec(d);
  const drilling = drillingPattern(d);
  const bom = billOfMaterials(d, book);
  const N = shellsOf(d);
  const sides = sidesOf(d, duty);
  // test pressures from each side's design pressure (the duty's, else operating + margin): shared/thermal/checks/walls.ts
  const test = hydrotest(d, wallSides(duty, processSideOf(d)));
  const nozzles = nozzleSizes(d, ds);
  const cut = d.tubeLength_m + book.tubeCutAllowance_m;
  const baffles = bafflesPerShell(d);
  const spacing = d.baffleSpacing_m ?? 0;
  const cutFraction = baffleCutOf(d);
  const mmOf = (m: number) => Math.round(m * 1000);
  const tubeWhat = `${sides.tube.fluid} (${streamWord(sides.tube)})`;
  const shellWhat = `${sides.shell.fluid} (${streamWord(sides.shell)})`;
  const reason = d.allocationReason
    ?? (processSideOf(d) === 'shell' ? 'The process stream is on the shell side.' : 'The process stream is in the tubes (the arrangement of every design before fluid allocation was a design choice).');
  return {
    order,
    design: {
      tubeCount: d.tubeCount, tubeOd: labels.od, tubeWall: labels.wall, tubeMaterial: materialName(d.tubeMaterial), tubeLength_m: d.tubeLength_m,
      tubePasses: d.tubePasses, layout: drilling.layout, pitch_mm: drilling.pitch_mm, shell: shell.label, shellInnerDiameter_mm: Math.round(ds * 1000 * 10) / 10, area_m2: d.area_m2,
      shellsInSeries: N, areaPerShell_m2: d.area_m2 / N,
      construction: d.construction ?? 'BEM', temaClass: d.temaClass ?? 'C', ...(d.constructionReason ? { constructionReason: d.constructionReason } : {}),
    },
    shells: {
      inSeries: N,
      instruction: N === 1
        ? 'Build 1 shell.'
        : `Build ${N} identical shells to this sheet and connect them in series: on each side the outlet of shell k goes to the inlet of shell k + 1. Mark the shells 1 to ${N} in flow order.`,
      interconnections: interconnections(N).map((c) => ({ ...c, nps: c.side === 'tube' ? nozzles.tube : nozzles.shell })),
    },
    allocation: { tubeSide: { stream: sides.tube.stream, fluid: sides.tube.fluid }, shellSide: { stream: sides.shell.stream, fluid: sides.shell.fluid }, reason },
    cutList: {
      tubes: d.tubeCount, cutLength_m: cut, finishedLength_m: d.tubeLength_m, allowance_m: book.tubeCutAllowance_m, material: materialName(d.tubeMaterial), od: labels.od, wall: labels.wall,
      totalLength_m: cut * d.tubeCount * N, shells: N, tubesAllShells: d.tubeCount * N,
    },
    billOfMaterials: bom.filter((b) => b.group === 'material').map(({ key, description, quantity, unit }) => ({ key, description, quantity, unit })),
    labour: bom.filter((b) => b.group === 'labour').map(({ key, description, quantity }) => ({ key, description, hours: quantity })),
    baffles: {
      count: baffles,
      total: baffles * N,
      spacing_mm: mmOf(spacing),
      inletSpacing_mm: mmOf(d.inletBaffleSpacing_m ?? spacing),
      outletSpacing_mm: mmOf(d.outletBaffleSpacing_m ?? spacing),
      cut_pct: Math.round(cutFraction * 1000) / 10,
      cut_mm: mmOf(cutFraction * ds),
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
      quantity: drilling.tubesheets,
    },
    holes: drilling.holes,
    // the design's sized nozzles (issue 11), one per side and role; older designs: one line per side
    nozzles: d.nozzles?.length
      ? d.nozzles.map((z) => ({
          side: z.side, nps: z.side === 'tube' ? nozzles.tube : nozzles.shell, rating: 'Class 150', fluid: z.side === 'tube' ? tubeWhat : shellWhat, perShell: 1,
          role: z.role, innerDiameter_mm: Math.round(z.innerDiameter_m * 10000) / 10, velocity_m_s: Math.round(z.velocity_m_s * 100) / 100, rhoV2: Math.round(z.rhoV2), impingementPlate: z.impingementPlate,
        }))
      : [
          { side: 'tube', nps: nozzles.tube, rating: 'Class 150', fluid: tubeWhat, perShell: 2 },
          { side: 'shell', nps: nozzles.shell, rating: 'Class 150', fluid: shellWhat, perShell: 2 },
        ],
    joint: d.tubeMaterial.startsWith('stainless') || d.tubeMaterial.startsWith('titanium')
      ? 'Tubes expanded into grooved holes and seal-welded (common practice for this material)'
      : 'Tubes roller-expanded into holes with two grooves (common practice)',
    hydrotest: {
      tubeSide_Pa: Math.round(test.tube.test_Pa),
      shellSide_Pa: Math.round(test.shell.test_Pa),
      tubeSideFluid: sides.tube.fluid,
      shellSideFluid: sides.shell.fluid,
      shells: N,
      basis: test.basis,
    },
    inspection: [
      'Material certificates of tubes, tubesheets, shell and nozzles checked against the bill of materials',
      `Tubesheet drilling checked against the hole pattern (hole count, pitch, diameter, ligaments) on all ${drilling.tubesheets} tubesheets`,
      'Tube expansion checked on sample holes (wall reduction per the joint procedure)',
      `Baffles checked: ${baffles} per shell, cut ${Math.round(cutFraction * 100)} %, spacing as the sheet states`,
      'Welds visually inspected; NDE as the code and the customer specification require',
      N === 1
        ? 'Hydrotest shell side, then tube side, at the pressures above, held and inspected for leaks'
        : `Hydrotest each of the ${N} shells: shell side, then tube side, at the pressures above, held and inspected for leaks`,
      `Nozzles marked for their side: tube side ${tubeWhat}, shell side ${shellWhat}`,
      ...(d.nozzles?.some((z) => z.impingementPlate) ? ['Impingement plate fitted under the shell inlet nozzle, clear of the first tube row'] : []),
      ...(N > 1 ? [`Shells marked 1 to ${N} in flow order; interconnecting spools fitted as listed`] : []),
      'Nameplate, painting and nozzle covers checked before shipment',
    ],
    cautions: SHEET_CAUTIONS,
  };
}
