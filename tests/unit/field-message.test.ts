/** Issue 12: messages under a quantity field speak the field's unit with sensible digits. */
import { describe, expect, it } from 'vitest';
import { sizeRequestSchema } from '../../shared/schemas/thermal';
import { inFieldUnit } from '../../src/composables/field-message';
import { quantity } from '../../src/composables/use-units';

describe('inFieldUnit', () => {
  it("rewrites the engine's kg/h and the schema's kg/s bounds in the field's flow unit (1 lb = 0.45359237 kg, exact)", () => {
    const lbh = quantity('flow', -5, 'lb/h');
    expect(inFieldUnit('The mass flow must be above zero (got -18 kg/h): with no flow there is nothing to cool.', lbh)).toBe(
      'The mass flow must be above zero (got -39.68 lb/h): with no flow there is nothing to cool.',
    );
    expect(inFieldUnit('The mass flow must be above zero (got -5 kg/h).', quantity('flow', -0.0014, 'kg/s'))).toBe('The mass flow must be above zero (got -0.001389 kg/s).');
    const bound = sizeRequestSchema.safeParse({ process: { massFlow_kg_s: 5000 } });
    const message = bound.success ? '' : bound.error.issues.find((i) => i.path.join('.') === 'process.massFlow_kg_s')!.message;
    expect(message).toBe('Process mass flow must be between -1000 and 1000 kg/s.');
    expect(inFieldUnit(message, quantity('flow', 5000, 'kg/h'))).toBe('Process mass flow must be between -3,600,000 and 3,600,000 kg/h.');
    // a volume flow's message in m³/h, shown in L/min; a mass message is left alone under a volume field
    expect(inFieldUnit('The volume flow must be above zero (got -0.6 m³/h).', quantity('flow', -10, 'L/min'))).toBe('The volume flow must be above zero (got -10 L/min).');
    expect(inFieldUnit('between -1000 and 1000 kg/s', quantity('flow', 1, 'L/min'))).toBe('between -1000 and 1000 kg/s');
  });

  it('temperatures in °F where the field is in °F, bounds and fluid ranges alike', () => {
    const f = quantity('temperature', 932, 'degF');
    expect(inFieldUnit('Mineral oil ISO VG 46: 500 °C is outside the range of its property data, -10 °C to 150 °C (source).', f)).toBe(
      'Mineral oil ISO VG 46: 932 °F is outside the range of its property data, 14 °F to 302 °F (source).',
    );
    expect(inFieldUnit('Process inlet temperature must be between -100 and 600 °C.', f)).toBe('Process inlet temperature must be between -148 and 1,112 °F.');
    expect(inFieldUnit('Process inlet temperature must be between -100 and 600 °C.', quantity('temperature', 1, 'degC'))).toBe('Process inlet temperature must be between -100 and 600 °C.');
  });

  it('pressures in the field unit, absolute', () => {
    const psi = quantity('pressure', 50, 'psi', 'gauge');
    expect(inFieldUnit('Process pressure must be between 1000 and 30000000 Pa (absolute).', psi)).toBe('Process pressure must be between 0.145 and 4,351 psia.');
  });
});
