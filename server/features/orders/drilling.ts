/**
 * The tubesheet drilling pattern of an order's design, from the engine's own tube layout (the same
 * lattice that gave the tube count): hole centres in mm from the tubesheet centre, tube holes and
 * tie-rod holes (TEMA's rods in free room at the rim or in a pass lane, each at the rod's diameter),
 * and the pass each tube hole serves. Identical shells in series share the one pattern:
 * every tubesheet of the cooler (two per shell) is drilled alike, and the pattern says how many.
 */
import type { Design } from '../../../shared/schemas/thermal';
import { MIN_PITCH_RATIO } from '../../../shared/thermal/geometry/tubes';
import { impingementClearance, tubeLayout, type Layout } from '../../../shared/thermal/geometry/layout';
import { unprocessable } from '../../lib/errors';
import { shellsOf } from '../pricing/design-fields';

/** Tube hole over the tube OD for a standard expanded fit, mm (common practice; confirm with TEMA RCB-7.2). */
export const HOLE_OVERSIZE_MM = 0.2;

export interface Hole {
  n: number;
  x_mm: number;
  y_mm: number;
  kind: 'tube' | 'tie-rod';
  pass: number;
  /** this hole's diameter, mm: the tube hole's, or the tie rod's (the rod threads into it) */
  diameter_mm: number;
}

export interface DrillingPattern {
  holes: Hole[];
  tubeHoles: number;
  pitch_mm: number;
  holeDiameter_mm: number;
  /** room kept free of tubes under the shell inlet for its impingement plate, mm (0: none or no room to spare) */
  clearUnderInlet_mm: number;
  /** TEMA RCB-4.71 rods of this shell (memory): how many and their diameter, mm */
  tieRods: { count: number; diameter_mm: number };
  outerTubeLimit_mm: number;
  layout: Layout;
  /** shells in series, each with two tubesheets */
  shells: number;
  /** tubesheets to drill to this pattern: 2 × shells */
  tubesheets: number;
}

const mm = (m: number) => Math.round(m * 1e5) / 100;

export function drillingPattern(design: Design): DrillingPattern {
  if (design.shellInnerDiameter_m === undefined || design.layout === undefined) {
    throw unprocessable('This design has no shell or layout to drill; set them in the quote first.', 'no-layout');
  }
  const pitch = design.tubePitch_m ?? MIN_PITCH_RATIO * design.tubeOuterDiameter_m;
  const key = {
    shellInnerDiameter_m: design.shellInnerDiameter_m,
    tubeOuterDiameter_m: design.tubeOuterDiameter_m,
    tubePitch_m: pitch,
    layout: design.layout,
    tubePasses: design.tubePasses,
  };
  // an impingement plate under the shell inlet (design.nozzles): leave its room free of tubes when
  // the shell still holds the design's tubes without them; else drill the full layout
  const plate = design.nozzles?.find((z) => z.side === 'shell' && z.role === 'inlet' && z.impingementPlate);
  const cleared = plate ? tubeLayout({ ...key, clearUnderInlet_m: impingementClearance(plate.innerDiameter_m) }) : undefined;
  const lay = cleared && cleared.tubeCount >= design.tubeCount ? cleared : tubeLayout(key);
  if (lay.tubeCount < design.tubeCount) {
    throw unprocessable(`The ${mm(design.shellInnerDiameter_m)} mm shell holds ${lay.tubeCount} tubes at this pitch and layout, fewer than the ${design.tubeCount} of the design.`, 'shell-too-small');
  }
  const tubes: number[] = [];
  const ties: number[] = [];
  for (let i = 0; i < lay.x.length; i++) (lay.tieRod[i] ? ties : tubes).push(i);
  // a hand-set design may use fewer tubes than the shell holds: leave out the outermost holes,
  // taking them from each pass in turn so the passes stay as even as the count allows
  const keep = new Set(tubes);
  const byPass = new Map<number, number[]>();
  for (const i of tubes) byPass.set(lay.region[i]!, [...(byPass.get(lay.region[i]!) ?? []), i]);
  const radius = (i: number) => Math.hypot(lay.x[i]!, lay.y[i]!);
  for (const list of byPass.values()) list.sort((a, b) => radius(b) - radius(a));
  const passes = [...byPass.keys()].sort((a, b) => (byPass.get(b)!.length - byPass.get(a)!.length) || a - b);
  for (let extra = tubes.length - design.tubeCount, k = 0; extra > 0; k++) {
    const list = byPass.get(passes[k % passes.length]!)!;
    const drop = list.shift();
    if (drop !== undefined) {
      keep.delete(drop);
      extra--;
    }
  }
  const order = [...keep, ...ties].sort((a, b) => lay.y[b]! - lay.y[a]! || lay.x[a]! - lay.x[b]!);
  const holeDiameter_mm = mm(design.tubeOuterDiameter_m) + HOLE_OVERSIZE_MM;
  const rodDiameter_mm = mm(lay.tieRods.diameter_m);
  const holes = order.map((i, n) => {
    const rod = lay.tieRod[i] === 1;
    return { n: n + 1, x_mm: mm(lay.x[i]!), y_mm: mm(lay.y[i]!), kind: rod ? ('tie-rod' as const) : ('tube' as const), pass: lay.region[i]! + 1, diameter_mm: rod ? rodDiameter_mm : holeDiameter_mm };
  });
  return {
    holes,
    tubeHoles: keep.size,
    pitch_mm: mm(pitch),
    holeDiameter_mm,
    tieRods: { count: lay.tieRods.count, diameter_mm: rodDiameter_mm },
    clearUnderInlet_mm: lay === cleared && plate ? mm(impingementClearance(plate.innerDiameter_m)) : 0,
    outerTubeLimit_mm: mm(lay.outerTubeLimit_m),
    layout: design.layout,
    shells: shellsOf(design),
    tubesheets: 2 * shellsOf(design),
  };
}

/**
 * The CSV the drilling machine reads: one hole a line, mm from the tubesheet centre, each with its
 * own diameter (a tie-rod row gives the rod's). The last column repeats how many tubesheets get this
 * pattern (2 per shell), so a file read on its own still says it.
 */
export function drillingCsv(p: DrillingPattern): string {
  const lines = ['hole,x_mm,y_mm,kind,pass,diameter_mm,tubesheets'];
  for (const h of p.holes) lines.push(`${h.n},${h.x_mm.toFixed(2)},${h.y_mm.toFixed(2)},${h.kind},${h.kind === 'tube' ? h.pass : ''},${h.diameter_mm.toFixed(2)},${p.tubesheets}`);
  return `${lines.join('\n')}\n`;
}
