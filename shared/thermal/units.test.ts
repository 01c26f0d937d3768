import { describe, expect, it } from 'vitest';
import { STANDARD_ATMOSPHERE_PA, UnitInputError, formatQuantity, fromSI, toSI } from './units';

// Check values: exact SI definitions and NIST Special Publication 811 (2008), Appendix B.8/B.9
// conversion factors (IT Btu). Values from memory of that table, to the digits shown.
describe('toSI: unit conversion to SI', () => {
  it.each([
    ['500 kg/h', 'massFlow', 500 / 3600],
    ['1 lb/h', 'massFlow', 0.45359237 / 3600], // 1 lb = 0.45359237 kg exactly
    ['40 degC', 'temperature', 40],
    ['104 degF', 'temperature', 40],
    ['104 °F', 'temperature', 40],
    ['313.15 K', 'temperature', 40],
    ['3/4 in', 'length', 0.01905], // 1 in = 0.0254 m exactly
    ['1 1/4 in', 'length', 0.03175],
    ['2 m/s', 'velocity', 2],
    ['30 gpm', 'volumetricFlow', (30 * 3.785411784e-3) / 60], // US gallon = 3.785411784 L exactly
    ['12 m³/h', 'volumetricFlow', 12 / 3600],
    ['12 m3/h', 'volumetricFlow', 12 / 3600],
    ['0.35 bar', 'pressureDrop', 35000],
    ['5 psi', 'pressureDrop', 5 * 6894.757], // NIST SP 811: 1 psi = 6.894757 kPa
    ['0.00018 m2 K/W', 'fouling', 0.00018],
    ['0.001 h ft^2 degF/BTU', 'fouling', 0.001 * 0.1761102], // NIST SP 811
    ['100 BTU/(h ft^2 degF)', 'heatTransferCoefficient', 567.8263], // NIST SP 811: 5.678263
    ['1 BTU/(h ft degF)', 'conductivity', 1.730735], // NIST SP 811
    ['250 kW', 'power', 250000],
    ['10 cP', 'viscosity', 0.01],
    ['46 cSt', 'kinematicViscosity', 46e-6],
    ['10 degF', 'temperatureDifference', 50 / 9],
    ['10 degC', 'temperatureDifference', 10],
  ] as const)('%s as %s', (text, kind, expected) => {
    expect(Math.abs(toSI(text, kind) / expected - 1)).toBeLessThan(2e-7);
  });

  it('accepts {value, unit} objects and bare SI numbers', () => {
    expect(toSI({ value: 500, unit: 'kg/h' }, 'massFlow')).toBeCloseTo(500 / 3600, 12);
    expect(toSI(0.5, 'massFlow')).toBe(0.5);
    expect(toSI({ value: 8, unit: 'barg' }, 'pressure')).toBe(8e5 + STANDARD_ATMOSPHERE_PA);
  });
});

describe('toSI: gauge and absolute pressure', () => {
  it.each([
    ['8 bar(g)', 901325],
    ['8 barg', 901325],
    ['8 bar g', 901325],
    ['120 psig', 120 * 6894.757 + 101325],
    ['8 bar(a)', 8e5],
    ['8 bara', 8e5],
    ['14.7 psia', 14.7 * 6894.757],
    ['800 kPa(a)', 8e5],
    ['0.8 MPag', 901325],
    ['8 bar abs', 8e5],
  ] as const)('%s', (text, expected) => {
    expect(Math.abs(toSI(text, 'pressure') / expected - 1)).toBeLessThan(2e-7);
  });

  it('refuses a bare "8 bar" unless a basis is given, and the written basis wins', () => {
    expect(() => toSI('8 bar', 'pressure')).toThrow(UnitInputError);
    expect(() => toSI('8 bar', 'pressure')).toThrow(/gauge or absolute/);
    expect(toSI('8 bar', 'pressure', { pressureBasis: 'gauge' })).toBe(901325);
    expect(toSI('8 bar', 'pressure', { pressureBasis: 'absolute' })).toBe(8e5);
    expect(toSI('8 bar(a)', 'pressure', { pressureBasis: 'gauge' })).toBe(8e5);
    expect(toSI('8 bar(g)', 'pressure', { atmosphere_Pa: 95000 })).toBe(895000);
  });

  it('refuses impossible pressures and gauge marks on pressure drops', () => {
    expect(() => toSI('-2 bar(g)', 'pressure')).toThrow(expect.objectContaining({ code: 'unit-range' }));
    expect(() => toSI('0.3 barg', 'pressureDrop')).toThrow(expect.objectContaining({ code: 'pressure-basis' }));
  });
});

describe('toSI: clear errors', () => {
  it("names the expected kind: '5 kg' is not a mass flow", () => {
    try {
      toSI('5 kg', 'massFlow', { field: 'process.tubeFlow' });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(UnitInputError);
      expect((e as Error).message).toMatch(/^'5 kg' is not a mass flow/);
      expect((e as UnitInputError).code).toBe('unit-kind');
      expect((e as UnitInputError).field).toBe('process.tubeFlow');
    }
  });

  it('reports missing numbers, missing units, unknown units and absolute zero', () => {
    expect(() => toSI('kg/h', 'massFlow')).toThrow(expect.objectContaining({ code: 'unit-syntax' }));
    expect(() => toSI('500', 'massFlow')).toThrow(/has no unit/);
    expect(() => toSI('5 furlongs', 'length')).toThrow(/unit mathjs does not know/);
    expect(() => toSI('1-1/4"', 'length')).toThrow(UnitInputError);
    expect(() => toSI('-500 degF', 'temperature')).toThrow(expect.objectContaining({ code: 'unit-range' }));
    expect(() => toSI({ value: Number.NaN, unit: 'm' }, 'length')).toThrow(UnitInputError);
  });
});

describe('fromSI / formatQuantity', () => {
  it('formats in SI and US customary, round-tripping through toSI', () => {
    expect(formatQuantity(40, 'temperature', 'US')).toBe('104 °F');
    expect(formatQuantity(40, 'temperature', 'SI')).toBe('40 °C');
    expect(formatQuantity(901325, 'pressure', 'SI', { pressureBasis: 'gauge' })).toBe('8 bar(g)');
    expect(formatQuantity(8e5, 'pressure', 'SI')).toBe('8 bar(a)');
    expect(formatQuantity(8e5, 'pressure', 'US', { pressureBasis: 'gauge' })).toBe('101.3 psig');
    expect(formatQuantity(500 / 3600, 'massFlow', 'SI')).toBe('500 kg/h');
    expect(formatQuantity(0.01905, 'length', 'US')).toBe('0.75 in');
    expect(formatQuantity(5, 'temperatureDifference', 'US')).toBe('9 °F');
    expect(formatQuantity(0.00018, 'fouling', 'US', { digits: 3 })).toBe('0.00102 h·ft²·°F/Btu');
    for (const kind of ['massFlow', 'volumetricFlow', 'fouling', 'heatTransferCoefficient', 'viscosity'] as const) {
      for (const system of ['SI', 'US'] as const) {
        const d = fromSI(1.2345, kind, system);
        expect(toSI({ value: d.value, unit: d.unit }, kind)).toBeCloseTo(1.2345, 10);
      }
    }
    expect(fromSI(1, 'power', { unit: 'MW' }).value).toBeCloseTo(1e-6, 15);
  });
});
