/** What a sizing request fixes before any geometry: both streams' temperatures, properties and NTU. */
import type { SizeRequest } from '../schemas/thermal';
import { ThermalInputError } from './errors';
import { effectiveCp } from './exchanger/rate-wall';
import { roundedCache, type DutyContext } from './exchanger/required-length';
import { propertiesOrNull, requireFinite, resolveStream, type Stream } from './exchanger/streams';
import { ntuRequiredWall } from './exchanger/wall';
import { requireCooling } from './rate';

export function dutyContext(req: SizeRequest): DutyContext {
  const s = resolveStream(req.process, 'process');
  const tIn = s.inletTemp_C;
  const tOut = req.process.outletTemp_C;
  requireFinite(tOut, 'process.outletTemp_C', 'The target outlet temperature');
  if (!(tOut < tIn)) {
    throw new ThermalInputError('target-not-below-inlet', `The target outlet ${tOut} °C is not below the inlet ${tIn} °C: this engine sizes coolers, so the process must leave colder than it enters.`, 'process.outletTemp_C');
  }
  const b = req.boundary;
  const sinkTemp = b.kind === 'wall' ? b.wallTemp_C : b.inletTemp_C;
  const sinkField = b.kind === 'wall' ? 'boundary.wallTemp_C' : 'boundary.inletTemp_C';
  requireFinite(sinkTemp, sinkField, 'The wall or coolant temperature');
  requireCooling(tIn, sinkTemp, sinkField, b.kind === 'wall' ? 'wall' : 'coolant');
  if (!(tOut > sinkTemp)) {
    throw new ThermalInputError(
      'target-beyond-sink',
      `The target outlet ${tOut} °C is at or below the ${b.kind === 'wall' ? 'wall' : 'coolant inlet'} temperature ${sinkTemp} °C: heat only flows from hot to cold, so no length of tube reaches it. Raise the target or lower the ${b.kind === 'wall' ? 'wall' : 'coolant'} temperature.`,
      'process.outletTemp_C',
    );
  }
  s.properties(tIn);
  s.properties(tOut);
  const tMean = 0.5 * (tIn + tOut);
  const bulk = s.properties(tMean);
  const cpEff = effectiveCp(s, bulk, tOut).cp;
  const base = { s, tIn, tOut, tMean, bulk, cpEff, choice: req.correlation, hotAt: roundedCache(s) };
  if (b.kind === 'wall') {
    return { ...base, wall: { temp: b.wallTemp_C, props: propertiesOrNull(s, b.wallTemp_C), ntu: ntuRequiredWall(tIn, tOut, b.wallTemp_C) } };
  }
  const c = resolveStream(b, 'boundary');
  c.properties(c.inletTemp_C);
  const duty = s.massFlow_kg_s * cpEff * (tIn - tOut);
  let tCout = c.inletTemp_C + duty / (c.massFlow_kg_s * c.properties(c.inletTemp_C).specificHeat);
  for (let k = 0; k < 4; k++) {
    const problem = c.fluid.stateProblem(0.5 * (c.inletTemp_C + tCout), c.pressure_Pa);
    if (problem) break;
    tCout = c.inletTemp_C + duty / (c.massFlow_kg_s * c.properties(0.5 * (c.inletTemp_C + tCout)).specificHeat);
  }
  if (!(tCout < tIn)) {
    throw new ThermalInputError('temperature-cross', `To take ${(duty / 1000).toFixed(1)} kW the coolant would leave at ${tCout.toFixed(1)} °C, not below the process inlet ${tIn} °C: a temperature cross no single exchanger can reach. Raise the coolant flow or accept a warmer outlet.`, 'boundary.massFlow_kg_s');
  }
  const problem = c.fluid.stateProblem(tCout, c.pressure_Pa);
  if (problem) {
    throw new ThermalInputError('coolant-outlet-state', `To take ${(duty / 1000).toFixed(1)} kW the coolant would leave at ${tCout.toFixed(1)} °C, which it cannot: ${problem} Raise the coolant flow.`, 'boundary.massFlow_kg_s');
  }
  const tCm = 0.5 * (c.inletTemp_C + tCout);
  const cold = c.properties(tCm);
  const ch = s.massFlow_kg_s * cpEff;
  const cc = c.massFlow_kg_s * cold.specificHeat;
  return { ...base, coolant: { c, tCin: c.inletTemp_C, tCout, tCm, cold, coldAt: roundedCache(c), ch, cc, cmin: Math.min(ch, cc), cr: Math.min(ch, cc) / Math.max(ch, cc) } };
}

/**
 * Tube velocities the search aims at (a search range, not a limit): water and glycols 0.9–2.5 m/s
 * (domain brief 2.4, common practice); other liquids 0.1–2.5 m/s; gases 2–40 m/s, where the
 * pressure-drop limit decides (common practice). Returned as tube counts per pass for a bore area.
 */
export function velocityWindow(s: Stream, density: number) {
  const [vMin, vMax] = s.aqueous ? [0.9, 2.5] : s.fluid.phase === 'liquid' ? [0.1, 2.5] : [2, 40];
  return {
    nMin: (area: number) => Math.max(1, s.massFlow_kg_s / (density * area * vMax)),
    nMax: (area: number) => s.massFlow_kg_s / (density * area * vMin),
  };
}
