import { describe, expect, it } from 'vitest';
import { sizeRequestSchema } from '../schemas/thermal';
import { ThermalInputError } from './errors';
import { sizeParsed } from './size';

// invented hydraulic-oil coolers (ISO VG 46 cooled by plant water)
const duty = (maxTubeLength_m: number, massFlow_kg_s = 1.2, water_kg_s = 2.0) =>
  sizeRequestSchema.parse({
    process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s, inletTemp_C: 62, outletTemp_C: 47 },
    boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, massFlow_kg_s: water_kg_s, inletTemp_C: 27 },
    constraints: { maxTubeLength_m, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
  });
const shop = { minTubeLength_m: 1.0, maxShellInnerDiameter_m: 1.5 };
const thrown = (f: () => unknown) => {
  try {
    f();
  } catch (err) {
    return err as ThermalInputError;
  }
  throw new Error('expected a refusal');
};

describe("the shop's limits in sizing", () => {
  it('a maximum length below the shortest bundle the shop builds is refused, naming the limit', () => {
    const err = thrown(() => sizeParsed(duty(0.2), { shop }));
    expect(err).toBeInstanceOf(ThermalInputError);
    expect(err.field).toBe('constraints.maxTubeLength_m');
    expect(err.message).toBe('The maximum tube length 0.2 m is below the shortest bundle this shop builds, 1.0 m: allow at least 1.0 m.');
  });

  it('no offered design is shorter than the shortest bundle (without the limit the search offers 0.8 m bundles)', () => {
    const free = sizeParsed(duty(1.0));
    expect(Math.min(...free.candidates.map((d) => d.tubeLength_m))).toBeLessThan(1.0);
    const r = sizeParsed(duty(1.0), { shop });
    expect(r.candidates.length).toBeGreaterThan(0);
    for (const d of r.candidates) expect(d.tubeLength_m).toBeGreaterThanOrEqual(1.0 - 1e-9);
  }, 60_000);

  it('a duty that fits only a shell larger than the shop builds is refused, naming the largest shell', () => {
    const err = thrown(() => sizeParsed(duty(3.5, 12, 20), { shop: { minTubeLength_m: 1.0, maxShellInnerDiameter_m: 0.2 } }));
    expect(err.code).toBe('beyond-shop-largest-shell');
    expect(err.message).toMatch(/^This duty fits only a shell larger than this shop builds: it needs a [\d,]+ mm shell, and the largest we build is 200 mm inside diameter\./);
  }, 60_000);
});
