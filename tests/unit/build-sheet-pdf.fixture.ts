/**
 * An invented order's build sheet for the PDF test, without the database: a glycol cooler as the
 * engine sized it before design engine v2 (process in the tubes, one shell; stored in
 * build-sheet-pdf.design.json so the PDF test does not move with the engine, and read like any
 * old stored design), turned into the sheet by the same pure function
 * the server uses (`sheetFromDesign`, server/features/orders/build-sheet.ts) with the demo price
 * book. `twoShellOilSheet` is the same geometry as two shells in series with the process on the
 * shell side and end spacings, as an engine-v2 design carries them. Customer, order and PO are invented.
 */
import type { BuildSheet } from '../../shared/schemas/build-sheet';
import { designSchema, sizeRequestSchema, type Design, type SizeRequest } from '../../shared/schemas/thermal';
import { sheetFromDesign } from '../../server/features/orders/build-sheet';
import { demoPriceBook } from '../../server/features/pricing/demo-price-book';
import storedDesign from './build-sheet-pdf.design.json';

const ATM = 101_325;

/**
 * 50 % ethylene glycol, 5 kg/s from 80 °C to 50 °C at 4 bar(g), water 15 kg/s at 28 °C and 3 bar(g),
 * four passes: the duty of the stored design.
 */
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

/** The basis in words (shared/thermal/checks/walls.ts): carbon-steel parts, stress ratio 1.00; design temperature 80 + 25 = 105 °C. */
export const HYDROTEST_BASIS =
  "ASME VIII-1 UG-99(b): 1.3 × MAWP × stress ratio (the lowest S at test over S at design temperature of the side's materials, ASME II-D, memory), the MAWP taken as the design pressure. " +
  'Tube side: 1.3 × 5.0 bar(g) × 1.00 = 6.5 bar(g) (design 5.0 bar(g) at 105 °C, default: the operating gauge pressure + 10 %, at least + 1 bar, and the process inlet + 25 K); ' +
  'shell side: 1.3 × 4.0 bar(g) × 1.00 = 5.2 bar(g) (design 4.0 bar(g) at 105 °C, default: the operating gauge pressure + 10 %, at least + 1 bar, and the process inlet + 25 K). The responsible engineer confirms the MAWP and the test pressure.';

export const ORDER: BuildSheet['order'] = { id: 'ord_test', number: 'O-2026-0017', quoteNumber: 'Q-2026-0051', customer: 'Harwick Process Cooling', poNumber: 'HPC-PO-88412', needBy: '2026-07-15', quantity: 1, status: 'released' };

/** 56 tubes 3/4 in BWG 20 carbon steel, 1.9 m, four passes, 30°, NPS 10 STD (ID 254.46 mm). */
export function glycolDesign(): Design {
  return designSchema.parse(storedDesign);
}

export function buildSheetFixture(d: Design = glycolDesign(), duty: SizeRequest = glycolDuty): BuildSheet {
  return sheetFromDesign({ order: ORDER, design: d, duty, book: demoPriceBook });
}

/**
 * The glycol cooler's geometry built as two shells in series, the process (glycol) on the shell
 * side, baffles every 200 mm with 300 mm at the nozzles, a 30 % cut, 14 baffles a shell: the sheet
 * must count the shells and say which fluid goes where (the numbers are the test's own inputs).
 */
export function twoShellDesign(d: Design = glycolDesign()): Design {
  return { ...d, shellsInSeries: 2, processSide: 'shell', baffleSpacing_m: 0.2, inletBaffleSpacing_m: 0.3, outletBaffleSpacing_m: 0.3, baffleCut: 0.3, baffleCount: 14, area_m2: 2 * d.area_m2, allocationReason: 'Glycol on the shell side: the baffled crossflow gives it the higher coefficient; the cooling water in the tubes can be cleaned mechanically.' };
}
