import { describe, expect, it } from 'vitest';
import fixture from '../../tests/reference/fixtures/properties.json';
import { sizeRequestSchema } from '../schemas/thermal';
import { caseDuty } from './size-cases';
import { resolveStream } from './exchanger/streams';
import { ThermalInputError } from './errors';
import { convertFlow, flowFields, flowText, STANDARD_REFERENCES } from './flow-units';
import { flowInUnit } from './flow-convert';

const water22 = fixture.water.states.find((s) => s.temp_C === 22 && s.pressure_Pa === 3e5)!;

describe('volume flows become mass flows with the fluid density (issue 12)', () => {
  it('60 m³/h of water at 22 °C and 3 bar(a) is ρ·V̇ with ρ from IAPWS-95 (python3-iapws fixture, 997.86 kg/m³)', () => {
    const s = resolveStream({ fluid: 'water', pressure_Pa: 3e5, inletTemp_C: 22, ...flowFields(60, 'm^3/h') }, 'boundary');
    expect(water22.density).toBeCloseTo(997.86, 2);
    expect(s.massFlow_kg_s).toBeCloseTo((60 / 3600) * water22.density, 3); // 16.63 kg/s
  });

  it('1000 Nm³/h of dry air is 1000/3600 × 1.2922 kg/m³ at 0 °C, 101.325 kPa (memory: 1.293 kg/m³ for dry air at normal conditions)', () => {
    const s = resolveStream({ fluid: 'air', pressure_Pa: 8e5, inletTemp_C: 120, ...flowFields(1000, 'Nm^3/h') }, 'process');
    expect(s.massFlow_kg_s / (1000 / 3600)).toBeCloseTo(1.293, 2);
    // the air fixture (Lemmon et al. 2000, python3-iapws) at 0 °C and 1 bar, scaled to 1.01325 bar as an ideal gas: 1.2931
    const lemmon = fixture.air.states.find((x) => x.temp_C === 0 && x.pressure_Pa === 1e5)!.density * 1.01325;
    expect(s.massFlow_kg_s / (1000 / 3600)).toBeCloseTo(lemmon, 2);
  });

  it('SCFM is at 60 °F and 14.696 psia: 0.0763 lb/ft³ of dry air (memory), i.e. 1.223 kg/m³', () => {
    expect(STANDARD_REFERENCES.standard.temp_C).toBeCloseTo(15.556, 3);
    const s = resolveStream({ fluid: 'air', pressure_Pa: 8e5, inletTemp_C: 120, ...flowFields(100, 'SCFM') }, 'process');
    const ft3 = 0.3048 ** 3;
    expect(s.massFlow_kg_s / ((100 * ft3) / 60)).toBeCloseTo(1.223, 2);
  });

  it('humid air counts its water on top of the dry normal volume', () => {
    const intake = { temp_C: 30, relativeHumidity: 0.6, pressure_Pa: 101325 };
    const s = resolveStream({ fluid: 'air-moist', intake, pressure_Pa: 8e5, inletTemp_C: 120, ...flowFields(1000, 'Nm^3/h') }, 'process');
    const dry = resolveStream({ fluid: 'air', pressure_Pa: 8e5, inletTemp_C: 120, ...flowFields(1000, 'Nm^3/h') }, 'process');
    expect(s.massFlow_kg_s).toBeCloseTo(dry.massFlow_kg_s * (1 + s.humidityRatio!), 9);
  });

  it('60 L/min of oil-vg46 at its inlet state is 60 L/min × its density there; unit menus convert back', () => {
    const oil = { fluid: 'oil-vg46' as const, pressure_Pa: 4e5, inletTemp_C: 60 };
    const s = resolveStream({ ...oil, ...flowFields(60, 'L/min') }, 'process');
    expect(s.massFlow_kg_s).toBeCloseTo((60 / 60000) * s.properties(60).density, 9);
    expect(flowInUnit(oil, 60, 'L/min', 'kg/s')).toBeCloseTo(s.massFlow_kg_s, 9);
    expect(flowInUnit(oil, s.massFlow_kg_s, 'kg/s', 'L/min')).toBeCloseTo(60, 9);
    // 1 US gpm = 3.785411784 L/min (exact, NIST SP 811)
    expect(convertFlow(1, 'gpm', 'L/min')).toBeCloseTo(3.785411784, 9);
    // normal and standard volumes of one gas scale as an ideal gas: 288.706 K / 273.15 K
    expect(convertFlow(1, 'Nm^3/h', 'SCFM')! * 0.3048 ** 3 * 60).toBeCloseTo(288.7056 / 273.15, 6);
    expect(flowText({ volumeFlow_m3_s: 0.001 })).toBe('60 L/min');
  });

  it('a volume flow that is not positive, or a reference the fluid has no data at, names the field', () => {
    const err = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        if (e instanceof ThermalInputError) return [e.code, e.field];
      }
      return null;
    };
    expect(err(() => resolveStream({ fluid: 'water', pressure_Pa: 3e5, inletTemp_C: 22, volumeFlow_m3_s: 0 }, 'boundary'))).toEqual(['flow-not-positive', 'boundary.volumeFlow_m3_s']);
    expect(err(() => resolveStream({ fluid: 'water', pressure_Pa: 3e5, inletTemp_C: 22, volumeFlow_m3_s: 900 }, 'boundary'))).toEqual(['flow-too-large', 'boundary.volumeFlow_m3_s']);
    // water at 0 °C is at its freezing line: the reference is what is wrong, not the flow
    const frozen = err(() => resolveStream({ fluid: 'water', pressure_Pa: 3e5, inletTemp_C: 22, standardVolumeFlow_m3_s: 0.01, standardReference: 'normal' }, 'boundary'));
    expect(frozen?.[1]).toBe('boundary.standardReference');
  });

  it('an absurd inlet temperature blames the temperature, not the fluid', () => {
    const s = resolveStream({ fluid: 'oil-vg46', pressure_Pa: 4e5, inletTemp_C: 500, massFlow_kg_s: 1 }, 'process');
    expect(() => s.properties(500)).toThrow(expect.objectContaining({ code: 'fluid-range', field: 'process.inletTemp_C' }));
  });

  it("an operating case keeps the design point's mass flow when the design point gave a volume", () => {
    const duty = sizeRequestSchema.parse({
      process: { fluid: 'oil-vg46', pressure_Pa: 4e5, inletTemp_C: 60, outletTemp_C: 45, volumeFlow_m3_s: 0.001 },
      boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 3e5, inletTemp_C: 25, volumeFlow_m3_s: 0.002 },
      constraints: { maxTubeLength_m: 3, maxPressureDrop_Pa: 8e4 },
      cases: [{ name: 'Hot oil', process: { inletTemp_C: 70 } }, { name: 'Half water', boundary: { massFlow_kg_s: 1 } }],
    });
    const base = resolveStream(duty.process, 'process').massFlow_kg_s;
    const hot = caseDuty(duty, duty.cases![0]!);
    expect(hot.process).toMatchObject({ inletTemp_C: 70, massFlow_kg_s: base });
    expect(hot.process.volumeFlow_m3_s).toBeUndefined();
    const half = caseDuty(duty, duty.cases![1]!);
    expect(half.boundary).toMatchObject({ massFlow_kg_s: 1 });
    expect('volumeFlow_m3_s' in half.boundary).toBe(false);
  });
});
