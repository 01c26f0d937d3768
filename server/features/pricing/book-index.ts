/**
 * A price book indexed once into Maps and sorted ladders, so pricing a design (and ranking
 * thousands of sizing candidates) never scans the book's arrays.
 */
import type { PriceBook } from '../../../shared/schemas/price-book';
import type { BomRef } from './bom';
import { demoPriceBook } from './demo-price-book';
import { noPrice } from './errors';

export interface Rate {
  rate_minor: number;
  /** the book entry, e.g. `tubes · copper 3/4 in BWG 16` */
  entry: string;
}

export interface BookIndex {
  book: PriceBook;
  tube(material: string, od: string, wall: string): number | undefined;
  plate(material: string): number | undefined;
  shellPipe(label: string): number | undefined;
  /** the cheapest pair of heads that fits: smallest max diameter ≥ D_s */
  heads(ds: number): PriceBook['heads'][number] | undefined;
  /** the smallest nozzle entry with max NPS ≥ nps in that class */
  nozzle(nps: number, rating: '150' | '300'): PriceBook['nozzles'][number] | undefined;
}

const tubeKey = (material: string, od: string, wall: string) => `${material}|${od}|${wall}`;

export function indexBook(book: PriceBook): BookIndex {
  const tubes = new Map(book.tubes.map((t) => [tubeKey(t.material, t.od, t.wall), t.perMetre_minor]));
  const plate = new Map(book.plate.map((p) => [p.material, p.perKg_minor]));
  const pipe = new Map(book.shellPipe.map((p) => [p.label, p.perMetre_minor]));
  const heads = [...book.heads].sort((a, b) => a.maxShellDiameter_m - b.maxShellDiameter_m);
  const nozzles = {
    '150': book.nozzles.filter((n) => n.rating === '150').sort((a, b) => a.maxNps - b.maxNps),
    '300': book.nozzles.filter((n) => n.rating === '300').sort((a, b) => a.maxNps - b.maxNps),
  };
  return {
    book,
    tube: (m, od, wall) => tubes.get(tubeKey(m, od, wall)),
    plate: (m) => plate.get(m),
    shellPipe: (label) => pipe.get(label),
    heads: (ds) => heads.find((h) => h.maxShellDiameter_m >= ds - 1e-9),
    nozzle: (nps, rating) => nozzles[rating].find((n) => n.maxNps >= nps - 1e-9),
  };
}

const SUNDRY_NAMES: Record<keyof PriceBook['sundries'], string> = {
  tieRodPerMetre_minor: 'tie rod per metre',
  gasketSet_minor: 'gasket set',
  boltingSet_minor: 'bolting set',
  paintPerM2_minor: 'paint per m²',
  impingementPlate_minor: 'impingement plate',
  uBendPerTube_minor: 'U-bend per tube',
};

/** The rate of a BOM item and the entry it came from; a missing entry is a `no-price` PricingError. */
export function rateOf(ix: BookIndex, ref: BomRef): Rate {
  const b = ix.book;
  switch (ref.kind) {
    case 'tube': {
      const entry = `tubes · ${ref.material} ${ref.od} ${ref.wall}`;
      return found(ix.tube(ref.material, ref.od, ref.wall), entry);
    }
    case 'plate':
      return found(ix.plate(ref.material), `plate · ${ref.material}`);
    case 'shell-pipe':
      return found(ix.shellPipe(ref.label), `shell pipe · ${ref.label}`);
    case 'heads': {
      const h = ix.heads(ref.shellDiameter_m);
      if (!h) throw noPrice(`heads · a shell of ${Math.round(ref.shellDiameter_m * 1000)} mm ID (larger than every heads entry)`);
      return { rate_minor: h.perPair_minor, entry: `heads · up to ${h.maxShellDiameter_m} m shell` };
    }
    case 'nozzle': {
      const n = ix.nozzle(ref.nps, ref.rating);
      if (!n) throw noPrice(`nozzles · NPS ${ref.nps} class ${ref.rating}`);
      return { rate_minor: n.each_minor, entry: `nozzles · up to NPS ${n.maxNps} class ${n.rating}` };
    }
    case 'sundry': {
      const rate = b.sundries[ref.item];
      if (rate !== undefined) return { rate_minor: rate, entry: `sundries · ${SUNDRY_NAMES[ref.item]}` };
      // an entry added in issue 11 that a book saved before it lacks: the demo book's figure, said so
      const demo = demoPriceBook.sundries[ref.item];
      if (demo === undefined) throw noPrice(`sundries · ${SUNDRY_NAMES[ref.item]}`);
      return { rate_minor: demo, entry: `sundries · ${SUNDRY_NAMES[ref.item]} (demo book's figure: this book has no entry)` };
    }
    case 'labour':
      return { rate_minor: b.shopRatePerHour_minor, entry: `shop rate · labour hours ${ref.op}` };
  }
}

function found(rate: number | undefined, entry: string): Rate {
  if (rate === undefined) throw noPrice(entry);
  return { rate_minor: rate, entry };
}
