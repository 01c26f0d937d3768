/**
 * Bill of materials of one cooler: what the shop buys and the hours it spends, with quantities in
 * the units the price book charges (m, kg, each, pair, set, m², h). Book-independent except for
 * the cut allowance and the labour hours per operation, which are the shop's own figures.
 */
import type { PriceBook } from '../../../shared/schemas/price-book';
import type { Design } from '../../../shared/schemas/thermal';
import type { CostInput } from '../../../shared/thermal/cost-proxy';
import { PIPE_SHELLS, tieRodCount, tubeSizeOf } from '../../../shared/thermal/geometry';
import {
  BAFFLE_AREA_FRACTION, baffleThickness_m, discMass, nozzleNpsByFlow, nozzleNpsByShell, paintArea_m2,
  plateDensity, plateGrades, rolledShellMass, round2, shellLength_m, tubesheetDiameter_m, tubesheetThickness_m,
} from './bom-rules';
import { demoPriceBook } from './demo-price-book';
import { bafflesPerShell, shellsOf, type TrainFields } from './design-fields';
import { noPrice } from './errors';

export type FlangeClass = '150' | '300';

/** The price-book entry a BOM item is priced from. */
export type BomRef =
  | { kind: 'tube'; material: string; od: string; wall: string }
  | { kind: 'plate'; material: string }
  | { kind: 'shell-pipe'; label: string }
  | { kind: 'heads'; shellDiameter_m: number }
  | { kind: 'nozzle'; nps: number; rating: FlangeClass }
  | { kind: 'sundry'; item: keyof PriceBook['sundries'] }
  | { kind: 'labour'; op: keyof PriceBook['labourHours'] };

export interface BomItem {
  key: string;
  group: 'material' | 'labour';
  description: string;
  quantity: number;
  unit: string;
  ref: BomRef;
}

/**
 * A sizing candidate (CostInput) or a full Design; labels and rating are used when present. The
 * issue-10 fields (shells in series, baffles) are optional: an old stored design is one shell.
 */
export type BomInput = CostInput & TrainFields & Partial<Pick<Design, 'tubeWallLabel' | 'shellLabel' | 'tubePasses' | 'tubePitch_m' | 'rating' | 'nozzles' | 'construction'>>;

export type BomRules = Pick<PriceBook, 'tubeCutAllowance_m' | 'labourHours'>;

export interface BomOptions {
  /** flange class of the four nozzles; default '150' */
  flangeClass?: FlangeClass;
}

/** Catalogue labels of the tube (`3/4 in`, `BWG 16`); a tube outside the catalogue cannot be priced. */
export function tubeLabels(d: Pick<BomInput, 'tubeOuterDiameter_m' | 'tubeWall_m' | 'tubeWallLabel'>): { od: string; wall: string } {
  const size = tubeSizeOf(d.tubeOuterDiameter_m);
  if (!size) throw noPrice(`tubes of ${(d.tubeOuterDiameter_m * 1000).toFixed(2)} mm OD (not a catalogue size)`);
  const wall = d.tubeWallLabel ?? size.walls.find((w) => Math.abs(w.wall_m - d.tubeWall_m) < 1e-6)?.label;
  if (!wall) throw noPrice(`tubes ${size.label} with a ${(d.tubeWall_m * 1000).toFixed(3)} mm wall (not a catalogue gauge)`);
  return { od: size.label, wall };
}

export interface ShellSpec {
  label: string;
  kind: 'pipe' | 'rolled';
  innerDiameter_m: number;
  wall_m: number;
}

/** The shell by label, else by inner diameter (pipe within 0.5 mm), else rolled plate with a 10 mm wall. */
export function shellSpec(d: Pick<BomInput, 'shellInnerDiameter_m' | 'shellWall_m' | 'shellLabel'>): ShellSpec {
  const ds = d.shellInnerDiameter_m;
  if (!ds) throw noPrice('a design without a shell diameter (nothing to price the shell, heads and tubesheets by)');
  const pipe = PIPE_SHELLS.find((s) => (d.shellLabel ? s.label === d.shellLabel : Math.abs(s.innerDiameter_m - ds) < 5e-4));
  if (pipe) return { label: pipe.label, kind: 'pipe', innerDiameter_m: ds, wall_m: d.shellWall_m ?? pipe.wall_m };
  if (d.shellLabel?.startsWith('NPS')) return { label: d.shellLabel, kind: 'pipe', innerDiameter_m: ds, wall_m: d.shellWall_m ?? 0.0095 };
  return { label: d.shellLabel ?? `rolled ${Math.round(ds * 1000)} mm ID`, kind: 'rolled', innerDiameter_m: ds, wall_m: d.shellWall_m ?? 0.01 };
}

/** NPS of a nozzle label ("NPS 1.5"), NaN if it is none. */
const npsOf = (label: string) => Number(/^NPS\s+([\d.]+)/.exec(label)?.[1]);

/**
 * Nozzle NPS of each side: the sized nozzles a design carries (issue 11, checks/nozzles.ts; the
 * larger of inlet and outlet), else from the rated flows when the design carries a rating (designs
 * stored before it), else by shell size.
 */
export function nozzleSizes(d: BomInput, ds: number): { tube: number; shell: number; basis: 'sized nozzles' | 'flow' | 'shell size' } {
  const sized = (side: 'tube' | 'shell') => Math.max(...(d.nozzles ?? []).filter((n) => n.side === side).map((n) => npsOf(n.label)).filter(Number.isFinite));
  if (d.nozzles?.length && Number.isFinite(sized('tube')) && Number.isFinite(sized('shell'))) return { tube: sized('tube'), shell: sized('shell'), basis: 'sized nozzles' };
  const r = d.rating;
  const byShell = nozzleNpsByShell(ds);
  if (!r || !d.tubePasses) return { tube: byShell, shell: byShell, basis: 'shell size' };
  const di = d.tubeOuterDiameter_m - 2 * d.tubeWall_m;
  const tubeFlow = r.velocity_m_s * (d.tubeCount / d.tubePasses) * (Math.PI / 4) * di * di;
  const tube = nozzleNpsByFlow(tubeFlow, r.velocity_m_s);
  // Kern's cross-flow area D_s B (p − d_o)/p for the shell stream
  const { shellVelocity_m_s: vs } = r;
  const shell = vs && d.baffleSpacing_m && d.tubePitch_m
    ? nozzleNpsByFlow(vs * ds * d.baffleSpacing_m * ((d.tubePitch_m - d.tubeOuterDiameter_m) / d.tubePitch_m), vs)
    : byShell;
  return { tube, shell, basis: 'flow' };
}

const mm = (m: number) => `${Math.round(m * 1000)} mm`;

/**
 * Interconnections of a train of `shells` in series: shell k's outlet to shell k+1's inlet, on the
 * tube side and on the shell side, one each per pair of neighbours.
 */
export function interconnections(shells: number): { from: number; to: number; side: 'tube' | 'shell' }[] {
  const out: { from: number; to: number; side: 'tube' | 'shell' }[] = [];
  for (let k = 1; k < shells; k++) out.push({ from: k, to: k + 1, side: 'tube' }, { from: k, to: k + 1, side: 'shell' });
  return out;
}

/**
 * The bill of one cooler. N identical shells in series (`shellsInSeries`, default 1) multiply every
 * per-shell item: tubes, two tubesheets, baffles, shell, a pair of heads, four nozzles, tie rods,
 * gaskets, bolting, paint, and the labour of tube ends, baffles, nozzles, fit-up, hydrotest (each
 * shell is tested on both sides) and painting. Between neighbouring shells each side gets an
 * interconnection: a short flanged spool whose two flanged ends are priced from the book's nozzle
 * table at the size of that side's nozzles. One shell gives exactly the lines it always did.
 */
export function billOfMaterials(d: BomInput, rules: BomRules = demoPriceBook, opts: BomOptions = {}): BomItem[] {
  const flangeClass = opts.flangeClass ?? '150';
  const tube = tubeLabels(d);
  const shell = shellSpec(d);
  const ds = shell.innerDiameter_m;
  const n = d.tubeCount;
  const N = shellsOf(d);
  const grades = plateGrades(d.tubeMaterial);
  const tts = tubesheetThickness_m(ds);
  const dts = tubesheetDiameter_m(ds);
  const shellLen = shellLength_m(d.tubeLength_m, ds);
  const baffles = bafflesPerShell(d);
  const tb = baffleThickness_m(ds);
  const noz = nozzleSizes(d, ds);
  // TEMA construction (issue 11); a design stored before it is BEM, priced as it always was
  const cons = d.construction ?? 'BEM';
  const uTube = cons === 'BEU';
  const floating = cons === 'AES' || cons === 'AET';
  const sheets = uTube ? 1 : 2;
  const h = rules.labourHours;
  const items: BomItem[] = [];
  const mat = (key: string, description: string, quantity: number, unit: string, ref: BomRef) =>
    quantity > 0 && items.push({ key, group: 'material', description, quantity, unit, ref });
  const lab = (key: string, description: string, hours: number, op: keyof BomRules['labourHours']) =>
    hours > 0 && items.push({ key, group: 'labour', description, quantity: round2(hours), unit: 'h', ref: { kind: 'labour', op } });
  /** "2 shells × " in front of a per-shell quantity, nothing for one shell */
  const times = N > 1 ? `${N} shells × ` : '';
  /** " per shell" after a per-shell item, nothing for one shell */
  const each = N > 1 ? ' per shell' : '';

  mat('tubes', `Tubes ${d.tubeMaterial} ${tube.od} ${tube.wall}: ${times}${n} × (${d.tubeLength_m} m + ${rules.tubeCutAllowance_m} m cut allowance)`,
    round2(N * n * (d.tubeLength_m + rules.tubeCutAllowance_m)), 'm', { kind: 'tube', material: d.tubeMaterial, ...tube });
  mat('tubesheets', `Tubesheets ${grades.tubesheets}: ${N > 1 ? `${sheets * N} (${sheets} per shell)` : `${sheets}`}${uTube ? ' (U-tube bundle: one tubesheet)' : ''} × ⌀${mm(dts)} × ${mm(tts)} (estimating thickness; the code calculation sets the real one)`,
    round2(sheets * N * discMass(dts, tts, plateDensity(grades.tubesheets))), 'kg', { kind: 'plate', material: grades.tubesheets });
  if (uTube) {
    mat('u-bends', `U-bending: ${times}${Math.floor(n / 2)} U-tubes (${n} tube holes)`, N * Math.floor(n / 2), 'each', { kind: 'sundry', item: 'uBendPerTube_minor' });
  }
  mat('baffles', `Baffles ${grades.baffles}: ${times}${baffles} × segmental (0.8 of ⌀${mm(ds)}) × ${mm(tb)}`,
    round2(N * baffles * BAFFLE_AREA_FRACTION * discMass(ds, tb, plateDensity(grades.baffles))), 'kg', { kind: 'plate', material: grades.baffles });
  if (shell.kind === 'pipe') {
    mat('shell', `Shell pipe ${shell.label}: ${times}${round2(shellLen)} m between tubesheets`, round2(N * shellLen), 'm', { kind: 'shell-pipe', label: shell.label });
  } else {
    mat('shell', `Shell rolled from carbon-steel plate, ${shell.label} × ${mm(shell.wall_m)} wall, ${times}${round2(shellLen)} m`,
      round2(N * rolledShellMass(ds, shell.wall_m, shellLen)), 'kg', { kind: 'plate', material: 'carbon-steel' });
  }
  mat('heads', `Channel heads (bonnets) for a ${mm(ds)} shell${N > 1 ? `, one pair per shell` : ''}`, N, 'pair', { kind: 'heads', shellDiameter_m: ds });
  if (floating) {
    mat('floating-head', `Floating head (${cons}): floating-head cover with split backing ring and a shell cover for a ${mm(ds)} shell, priced as a second pair of heads${N > 1 ? `, one per shell` : ''}`, N, 'pair', { kind: 'heads', shellDiameter_m: ds });
    mat('gaskets-floating-head', `Gasket set of the floating head and shell cover${N > 1 ? `, one set per shell` : ''}`, N, 'set', { kind: 'sundry', item: 'gasketSet_minor' });
    mat('bolting-floating-head', `Bolting set of the floating head and shell cover${N > 1 ? `, one set per shell` : ''}`, N, 'set', { kind: 'sundry', item: 'boltingSet_minor' });
  }
  mat('nozzles-tube', `Tube-side nozzles NPS ${noz.tube} class ${flangeClass} (in + out${each}; by ${noz.basis})`, 2 * N, 'each', { kind: 'nozzle', nps: noz.tube, rating: flangeClass });
  mat('nozzles-shell', `Shell-side nozzles NPS ${noz.shell} class ${flangeClass} (in + out${each}; by ${noz.basis})`, 2 * N, 'each', { kind: 'nozzle', nps: noz.shell, rating: flangeClass });
  if (d.nozzles?.some((z) => z.impingementPlate)) {
    const inlet = d.nozzles.find((z) => z.impingementPlate)!;
    mat('impingement-plate', `Impingement plate under the shell inlet (ρv² ${Math.round(inlet.rhoV2)} kg/(m·s²) above TEMA's 2,230)${each}`, N, 'each', { kind: 'sundry', item: 'impingementPlate_minor' });
  }
  for (const c of interconnections(N)) {
    const nps = c.side === 'tube' ? noz.tube : noz.shell;
    mat(`interconnection-${c.from}-${c.to}-${c.side}`,
      `Interconnection shell ${c.from} → ${c.to}, ${c.side} side: flanged spool NPS ${nps} class ${flangeClass}, two flanged ends priced as nozzles from the book's nozzle table`,
      2, 'each', { kind: 'nozzle', nps, rating: flangeClass });
  }
  const rods = tieRodCount(ds);
  mat('tie-rods', `Tie rods: ${times}${rods} × ${round2(shellLen)} m`, round2(N * rods * shellLen), 'm', { kind: 'sundry', item: 'tieRodPerMetre_minor' });
  mat('gaskets', `Gasket set (two head gaskets)${N > 1 ? `, one set per shell` : ''}`, N, 'set', { kind: 'sundry', item: 'gasketSet_minor' });
  mat('bolting', `Bolting set (studs and nuts of both heads)${N > 1 ? `, one set per shell` : ''}`, N, 'set', { kind: 'sundry', item: 'boltingSet_minor' });
  mat('paint', `Paint, outside of shell and heads${N > 1 ? `, ${N} shells` : ''}`, round2(N * paintArea_m2(ds, shell.wall_m, shellLen)), 'm²', { kind: 'sundry', item: 'paintPerM2_minor' });

  lab('labour-tube-ends', `Expand tube ends: ${times}${sheets} × ${n} ends × ${h.perTubeEnd} h`, N * sheets * n * h.perTubeEnd, 'perTubeEnd');
  lab('labour-baffles', `Baffles: ${times}${baffles} × ${h.perBaffle} h`, N * baffles * h.perBaffle, 'perBaffle');
  lab('labour-nozzles', `Nozzles: ${times}4 × ${h.perNozzle} h`, N * 4 * h.perNozzle, 'perNozzle');
  const spools = interconnections(N).length;
  lab('labour-interconnections', `Interconnecting spools: ${spools} × 2 flanged ends × ${h.perNozzle} h`, spools * 2 * h.perNozzle, 'perNozzle');
  if (floating) lab('labour-floating-head', `Fit-up of the floating head and shell cover${N > 1 ? `: ${N} shells × ${h.fitUp} h` : ` (${h.fitUp} h, as a second assembly)`}`, N * h.fitUp, 'fitUp');
  lab('labour-fit-up', `Fit-up and assembly${N > 1 ? `: ${N} shells × ${h.fitUp} h` : ''}`, N * h.fitUp, 'fitUp');
  lab('labour-hydrotest', `Hydrostatic test${N > 1 ? `: ${N} shells × ${h.hydrotest} h (each shell, both sides)` : ''}`, N * h.hydrotest, 'hydrotest');
  lab('labour-paint', `Painting${N > 1 ? `: ${N} shells × ${h.paint} h` : ''}`, N * h.paint, 'paint');
  return items;
}
