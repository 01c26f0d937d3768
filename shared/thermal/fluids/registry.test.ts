import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { ThermalInputError } from '../errors';
import { constantFluid, fluidIds, getFluid, listFluids } from './index';

describe('fluid registry', () => {
  it('lists every id once, each with a name, range and source', () => {
    const list = listFluids();
    expect(list.map((f) => f.id)).toEqual([...fluidIds]);
    for (const f of list) {
      expect(f.name.length).toBeGreaterThan(3);
      expect(f.source.length).toBeGreaterThan(10);
      expect(f.maxTemp_C).toBeGreaterThan(f.minTemp_C);
      expect(Object.keys(f).sort()).toEqual(['id', 'maxTemp_C', 'minTemp_C', 'name', 'phase', 'source']);
    }
  });

  it('every fluid gives finite positive properties at mid-range, consistent with its Prandtl number', () => {
    for (const id of fluidIds) {
      const f = getFluid(id);
      const t = (Math.max(f.minTemp_C, 0) + Math.min(f.maxTemp_C, 100)) / 2;
      const p = f.properties(t, 5e5);
      for (const v of Object.values(p)) expect(Number.isFinite(v) && v > 0, id).toBe(true);
      expect(p.prandtl).toBeCloseTo((p.specificHeat * p.viscosity) / p.conductivity, 10);
      expect(f.stateProblem(t, 5e5)).toBeNull();
    }
  });

  it('every fluid throws fluid-range with its name and range, never NaN', () => {
    for (const id of fluidIds) {
      const f = getFluid(id);
      for (const t of [f.maxTemp_C + 1, Number.NaN]) {
        const why = f.stateProblem(t, 25e5);
        expect(why, `${id} ${t}`).toContain(f.name);
        expect(() => f.properties(t, 25e5)).toThrow(ThermalInputError);
      }
    }
  });

  it('unknown id → unknown-fluid on the caller field', () => {
    expect(() => getFluid('mercury', 'process.shellFluid')).toThrow(
      expect.objectContaining({ code: 'unknown-fluid', field: 'process.shellFluid' }),
    );
    expect(() => getFluid('mercury')).toThrow(expect.objectContaining({ field: 'process.fluid' }));
  });

  it('glycol ids: 10…60 % in steps of 5 exist; a strength outside or off the steps → fluid-range naming the field', () => {
    expect(getFluid('ethylene-glycol-40').name).toBe('Ethylene glycol–water, 40 % by mass');
    expect(listFluids().map((f) => f.id)).toEqual(expect.arrayContaining(['ethylene-glycol-10', 'propylene-glycol-60']));
    expect(() => getFluid('ethylene-glycol-70', 'boundary.fluid')).toThrow(
      expect.objectContaining({ code: 'fluid-range', field: 'boundary.fluid', message: expect.stringMatching(/10 to 60 %/) }),
    );
    expect(() => getFluid('propylene-glycol-42')).toThrow(
      expect.objectContaining({ code: 'fluid-range', message: expect.stringMatching(/propylene-glycol-40 or propylene-glycol-45/) }),
    );
  });

  it('fluidIds works as a zod enum', () => {
    const schema = z.enum(fluidIds);
    expect(schema.parse('oil-vg46')).toBe('oil-vg46');
    expect(schema.safeParse('mercury').success).toBe(false);
  });
});

describe('constant-properties fluid', () => {
  it('returns the given values at any state', () => {
    const f = constantFluid({ density: 900, specificHeat: 2000, viscosity: 0.05, conductivity: 0.13 });
    expect(f.id).toBe('constant');
    expect(f.properties(-50, 1e5)).toEqual({ density: 900, specificHeat: 2000, viscosity: 0.05, conductivity: 0.13, prandtl: (2000 * 0.05) / 0.13 });
  });

  it('names the offending field', () => {
    expect(() => constantFluid({ density: 900, specificHeat: 2000, viscosity: 0, conductivity: 0.13 })).toThrow(
      expect.objectContaining({ code: 'invalid-fluid-property', field: 'process.fluid.constant.viscosity' }),
    );
    expect(() =>
      constantFluid({ density: Number.NaN, specificHeat: 2000, viscosity: 1, conductivity: 0.13 }, 'shell.fluid.constant'),
    ).toThrow(expect.objectContaining({ field: 'shell.fluid.constant.density' }));
  });
});
