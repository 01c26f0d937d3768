/**
 * Fluid allocation (domain brief 2.8, common practice): which sides the search may put the process
 * on, the fouling each fluid brings to its side, and the reasons in words.
 */
import type { ProcessSide, SizeRequest } from '../schemas/thermal';
import type { Stream } from './exchanger/streams';

/**
 * Fouling resistance a fluid brings to whichever side it is on, m²K/W (domain brief 2.3, memory of
 * TEMA-style tables; confirm against the current TEMA edition): water 0.00018 (treated cooling-tower
 * water), glycol solutions 0.00009 (closed-loop treated water: glycol loops are closed), hydraulic
 * and lube oils 0.00018, compressed air 0.00018 (oily intake). A customer's own fluid: 0.00018.
 */
export function defaultFouling(s: Stream): number {
  const id = s.fluid.id;
  if (id.includes('glycol')) return 0.00009;
  return 0.00018;
}

/** Tube-side and shell-side fouling for an allocation: the request's per-side values, else each fluid's. */
export function foulingFor(req: SizeRequest, process: Stream, coolant: Stream, side: ProcessSide): { inside: number; outside: number } {
  const b = req.boundary.kind === 'coolant' ? req.boundary : undefined;
  const tube = side === 'tubes' ? process : coolant;
  const shell = side === 'tubes' ? coolant : process;
  return {
    inside: req.constraints.foulingInside_m2K_W ?? b?.foulingInside_m2K_W ?? defaultFouling(tube),
    outside: req.constraints.foulingOutside_m2K_W ?? b?.foulingOutside_m2K_W ?? defaultFouling(shell),
  };
}

const isOil = (s: Stream) => s.fluid.id.startsWith('oil-');
const name = (s: Stream) => (isOil(s) ? 'the oil' : s.fluid.phase === 'gas' ? 'the compressed air' : s.aqueous ? (s.fluid.id === 'water' ? 'the water' : 'the glycol solution') : 'the process fluid');

/**
 * Sides the search tries for the process. A wall boundary keeps it in the tubes. Otherwise the
 * request's choice, and for 'either': a gas process stays in the tubes (compressed air in
 * aftercoolers: the tubes hold the line pressure cheaply and the condensate drains from the
 * channel, common practice); every other pair is tried both ways and the cost decides.
 */
export function processSides(req: SizeRequest, process: Stream): { sides: ProcessSide[]; rule?: string } {
  if (req.boundary.kind === 'wall') return { sides: ['tubes'] };
  const asked = req.constraints.processSide ?? 'either';
  if (asked !== 'either') return { sides: [asked], rule: `the request puts the process on the ${asked === 'tubes' ? 'tube' : 'shell'} side` };
  if (process.fluid.phase === 'gas') {
    return { sides: ['tubes'], rule: `${name(process)} stays in the tubes (common practice for aftercoolers): the tubes hold its pressure cheaply, its condensate drains from the channel, and the water on the shell side is at low pressure` };
  }
  return { sides: ['tubes', 'shell'] };
}

export interface AllocationFacts {
  side: ProcessSide;
  tubeH: number;
  shellH: number;
  tubeRe: number;
  /** h the same process fluid reaches on the other side in the best design there (if any) */
  otherProcessH?: number;
}

/** One or two sentences: where each fluid is and why (coefficient, fouling, pressure, cleaning). */
export function allocationReason(process: Stream, coolant: Stream, f: AllocationFacts, rule?: string): string {
  const p = name(process);
  const c = name(coolant);
  const h = (x: number) => `h ≈ ${Math.round(x / 10) * 10} W/m²K`;
  if (f.side === 'shell') {
    const why =
      f.otherProcessH === undefined ? `baffled crossflow gives ${h(f.shellH)}`
      : f.otherProcessH < f.shellH ? `baffled crossflow gives ${h(f.shellH)} where ${p} in the tubes would reach ${h(f.otherProcessH)}`
      : `${h(f.shellH)} in baffled crossflow (${h(f.otherProcessH)} in the tubes, but the exchanger as a whole comes out dearer that way)`;
    const clean = coolant.aqueous ? `; ${c} in the tubes, which foul more and are cleaned mechanically` : `; ${c} in the tubes (${h(f.tubeH)})`;
    return `${cap(p)} on the shell side: ${why}${clean}.${rule ? ` (${rule}.)` : ''}`;
  }
  const regime = f.tubeRe < 2300 ? 'laminar' : f.tubeRe < 1e4 ? 'transitional' : 'turbulent';
  const why = rule ?? (f.otherProcessH !== undefined ? `in the tubes it reaches ${h(f.tubeH)} (${regime}), against ${h(f.otherProcessH)} on the shell side` : `${h(f.tubeH)} (${regime})`);
  return `${cap(p)} in the tubes: ${why}; ${c} on the shell side (${h(f.shellH)}).`;
}

const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
