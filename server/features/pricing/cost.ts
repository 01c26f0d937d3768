/**
 * The sizing search's cost function from a price book: the per-unit price in minor units (before
 * quantity breaks and expedite), computed with the same estimating rules as the itemised price but
 * without rounding, strings or line objects: the search calls it for every candidate. Nozzles are
 * sized by shell size here (a candidate has no rating yet). A candidate the book cannot price costs
 * Infinity, so it ranks last; this function never throws.
 *
 * Shells in series and baffles count as in the bill (bom.ts): N identical shells multiply every
 * per-shell item and its labour, each neighbouring pair adds a flanged spool on each side (two
 * nozzle-priced ends and their labour), and the baffles are those of the candidate's own spacing
 * (bafflesPerShell), so the search ranks multi-shell and closely baffled designs at their price.
 *
 * Issue 11: a rated design's nozzles and construction count as in the bill: its sized nozzles, an
 * impingement plate, a U-tube bundle's single tubesheet, half the tube ends and its U-bends, a
 * floating head's second pair of heads, gasket and bolting sets and fit-up. A candidate without
 * them (the search's) is priced as a BEM with nozzles by shell size, as before.
 */
import type { PriceBook } from '../../../shared/schemas/price-book';
import type { CostInput } from '../../../shared/thermal/cost-proxy';
import { PIPE_SHELLS, tieRodCount, TUBE_SIZES } from '../../../shared/thermal/geometry';
import {
  BAFFLE_AREA_FRACTION, baffleThickness_m, nozzleNpsByShell, paintArea_m2, plateDensity,
  plateGrades, rolledShellMass, tubesheetDiameter_m, tubesheetThickness_m,
} from './bom-rules';
import { indexBook } from './book-index';
import { demoPriceBook } from './demo-price-book';
import { bafflesPerShell, shellsOf, type TrainFields } from './design-fields';

const tubeKey = (od: number, wall: number) => Math.round(od * 1e5) * 1e5 + Math.round(wall * 1e6);
const shellKey = (ds: number) => Math.round(ds * 1e4);

interface PlateCost { sheetPerKg: number; sheetRho: number; bafflePerKg: number; baffleRho: number }
interface ShellCost { fixed: number; heads: number; nozzleEach: number; spool: number; pipePerMetre?: number; wall: number; tts: number; sheetDiscArea: number; baffleDiscArea: number; rods: number }

export function costFromPriceBook(book: PriceBook): (d: CostInput & TrainFields) => number {
  const ix = indexBook(book);
  const s = book.sundries;
  const h = book.labourHours;
  const rate = book.shopRatePerHour_minor;
  const markup = (1 + book.overhead_pct / 100) * (1 + book.margin_pct / 100);
  const fixedLabour = (4 * h.perNozzle + h.fitUp + h.hydrotest + h.paint) * rate;
  const csPerKg = ix.plate('carbon-steel') ?? Infinity;

  // tube rate by material, then by numeric OD/wall key
  const tubes = new Map<string, Map<number, number>>();
  for (const row of book.tubes) {
    const size = TUBE_SIZES.find((t) => t.label === row.od);
    const wall = size?.walls.find((w) => w.label === row.wall);
    if (!size || !wall) continue;
    let m = tubes.get(row.material);
    if (!m) tubes.set(row.material, (m = new Map()));
    m.set(tubeKey(size.outerDiameter_m, wall.wall_m), row.perMetre_minor);
  }
  const plates = new Map<string, PlateCost>();
  const plateCost = (material: string): PlateCost => {
    let p = plates.get(material);
    if (!p) {
      const g = plateGrades(material);
      p = { sheetPerKg: ix.plate(g.tubesheets) ?? Infinity, sheetRho: plateDensity(g.tubesheets), bafflePerKg: ix.plate(g.baffles) ?? Infinity, baffleRho: plateDensity(g.baffles) };
      plates.set(material, p);
    }
    return p;
  };
  const shells = new Map<number, ShellCost>();
  const shellCost = (ds: number): ShellCost => {
    const key = shellKey(ds);
    let c = shells.get(key);
    if (!c) {
      const pipe = PIPE_SHELLS.find((p) => Math.abs(p.innerDiameter_m - ds) < 5e-4);
      const nozzle = ix.nozzle(nozzleNpsByShell(ds), '150')?.each_minor ?? Infinity;
      const heads = ix.heads(ds)?.perPair_minor ?? Infinity;
      const dts = tubesheetDiameter_m(ds);
      c = {
        fixed: heads + 4 * nozzle + s.gasketSet_minor + s.boltingSet_minor,
        heads,
        nozzleEach: nozzle,
        // one interconnection: two flanged ends at the nozzle rate, and their labour
        spool: 2 * nozzle + 2 * h.perNozzle * rate,
        // a pipe shell without a book row is unpriceable; a rolled shell is priced by plate mass
        pipePerMetre: pipe ? (ix.shellPipe(pipe.label) ?? Infinity) : undefined,
        wall: pipe?.wall_m ?? 0.01,
        tts: tubesheetThickness_m(ds),
        sheetDiscArea: (Math.PI / 4) * dts * dts,
        baffleDiscArea: BAFFLE_AREA_FRACTION * (Math.PI / 4) * ds * ds,
        rods: tieRodCount(ds),
      };
      shells.set(key, c);
    }
    return c;
  };

  const sundry = (k: 'impingementPlate_minor' | 'uBendPerTube_minor') => s[k] ?? demoPriceBook.sundries[k] ?? 0;
  /** what the design's nozzles and construction add to (or take from) the BEM with nozzles by shell size, per shell */
  const constructionExtra = (d: CostInput & TrainFields, c: ShellCost) => {
    let material = 0;
    let labour = 0;
    /** per pair of neighbours: the two spools' flanged ends at the sized nozzles instead of by shell size */
    let spool = 0;
    const nps = (side: 'tube' | 'shell') => Math.max(...(d.nozzles ?? []).filter((z) => z.side === side).map((z) => Number(/^NPS\s+([\d.]+)/.exec(z.label)?.[1])).filter(Number.isFinite));
    if (d.nozzles?.length) {
      const each = (n: number) => (Number.isFinite(n) ? (ix.nozzle(n, '150')?.each_minor ?? Infinity) : c.nozzleEach);
      spool = 2 * each(nps('tube')) + 2 * each(nps('shell')) - 4 * c.nozzleEach;
      material += spool;
      if (d.nozzles.some((z) => z.impingementPlate)) material += sundry('impingementPlate_minor');
    }
    const uTube = d.construction === 'BEU';
    if (uTube) {
      const p = plateCost(d.tubeMaterial);
      material += Math.floor(d.tubeCount / 2) * sundry('uBendPerTube_minor') - c.sheetDiscArea * c.tts * p.sheetRho * p.sheetPerKg;
    }
    if (d.construction === 'AES' || d.construction === 'AET') {
      material += c.heads + s.gasketSet_minor + s.boltingSet_minor;
      labour += h.fitUp * rate;
    }
    return { material, labour, spool, uTube };
  };

  return (d) => {
    const ds = d.shellInnerDiameter_m;
    const tubeRate = tubes.get(d.tubeMaterial)?.get(tubeKey(d.tubeOuterDiameter_m, d.tubeWall_m));
    if (!ds || tubeRate === undefined) return Infinity;
    const c = shellCost(ds);
    const p = plateCost(d.tubeMaterial);
    const len = d.tubeLength_m - 2 * c.tts;
    const baffles = bafflesPerShell(d);
    const nShells = shellsOf(d);
    const wall = d.shellWall_m ?? c.wall;
    const shell = c.pipePerMetre === undefined ? rolledShellMass(ds, wall, len) * csPerKg : c.pipePerMetre * len;
    const extra = constructionExtra(d, c);
    const material =
      d.tubeCount * (d.tubeLength_m + book.tubeCutAllowance_m) * tubeRate +
      2 * c.sheetDiscArea * c.tts * p.sheetRho * p.sheetPerKg +
      baffles * c.baffleDiscArea * baffleThickness_m(ds) * p.baffleRho * p.bafflePerKg +
      shell + c.fixed + c.rods * len * s.tieRodPerMetre_minor + paintArea_m2(ds, wall, len) * s.paintPerM2_minor + extra.material;
    const labour = ((extra.uTube ? 1 : 2) * d.tubeCount * h.perTubeEnd + baffles * h.perBaffle) * rate + fixedLabour + extra.labour;
    // N shells of one cost each, plus a spool per side between each pair of neighbours
    return (nShells * (material + labour) + (nShells - 1) * (2 * c.spool + extra.spool)) * markup;
  };
}
