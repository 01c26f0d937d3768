/**
 * The workspace's duty editor: the sizing page's form, filled from a quote's stored duty (SI) so the
 * same form parts can show and edit it. What the form does not cover (baffle cut, shell limits,
 * length step …) is kept from the stored duty when the edited one is sent back.
 */
import type { SizeRequest } from '@shared/schemas/thermal';
import { CONSTANT_FLUID, useSizingForm, type SizingForm } from './use-sizing-form';
import { flowQuantity, quantity } from './use-units';

/** Puts a stored duty into the sizing form, in SI units. */
export function fillSizingForm(form: SizingForm, duty: SizeRequest): void {
  const m = form.model;
  const p = duty.process;
  m.system = 'SI';
  if (typeof p.fluid === 'string') m.process.fluid = p.fluid;
  else {
    m.process.fluid = CONSTANT_FLUID;
    const c = p.fluid.constant;
    m.process.constant.density = quantity('density', c.density, 'kg/m^3');
    m.process.constant.specificHeat = quantity('specificHeat', c.specificHeat, 'J/(kg K)');
    m.process.constant.viscosity = quantity('viscosity', c.viscosity, 'Pa s');
    m.process.constant.conductivity = quantity('conductivity', c.conductivity, 'W/(m K)');
  }
  if (p.intake) {
    m.process.intake.temp = quantity('temperature', p.intake.temp_C, 'degC');
    m.process.intake.humidity_pct = Math.round(p.intake.relativeHumidity * 1000) / 10;
    m.process.intake.pressure = quantity('pressure', p.intake.pressure_Pa / 1e5, 'bar', 'absolute');
  }
  m.process.massFlow = flowQuantity(p);
  m.process.inletTemp = quantity('temperature', p.inletTemp_C, 'degC');
  m.process.outletTemp = quantity('temperature', p.outletTemp_C, 'degC');
  m.process.pressure = quantity('pressure', p.pressure_Pa / 1e5, 'bar', 'absolute');

  const b = duty.boundary;
  m.sink = b.kind;
  if (b.kind === 'wall') m.wallTemp = quantity('temperature', b.wallTemp_C, 'degC');
  else {
    if (typeof b.fluid === 'string') m.coolant.fluid = b.fluid;
    m.coolant.massFlow = flowQuantity(b);
    m.coolant.inletTemp = quantity('temperature', b.inletTemp_C, 'degC');
    m.coolant.pressure = quantity('pressure', b.pressure_Pa / 1e5, 'bar', 'absolute');
    m.coolant.foulingInside = quantity('fouling', b.foulingInside_m2K_W ?? null, 'm^2 K/W');
    m.coolant.foulingOutside = quantity('fouling', b.foulingOutside_m2K_W ?? null, 'm^2 K/W');
  }
  const c = duty.constraints;
  m.limits.maxTubeLength = quantity('length', c.maxTubeLength_m, 'm');
  m.limits.maxPressureDrop = quantity('pressureDrop', c.maxPressureDrop_Pa / 1000, 'kPa');
  m.limits.maxShellPressureDrop = quantity('pressureDrop', c.maxShellPressureDrop_Pa === undefined ? null : c.maxShellPressureDrop_Pa / 1000, 'kPa');
  m.limits.designMargin_pct = c.designMargin_pct ?? null;
  m.limits.tubeOuterDiameters_m = [...(c.tubeOuterDiameters_m ?? [])];
  m.limits.materials = [...(c.materials ?? [])];
  m.limits.tubePasses = [...(c.tubePasses ?? [])];
  m.limits.layouts = [...(c.layouts ?? [])];
  m.correlation = duty.correlation;
}

/** The edited duty over the stored one: the form's fields win, the rest is kept. */
export function mergeDuty(stored: SizeRequest, edited: SizeRequest): SizeRequest {
  const boundary = edited.boundary.kind === stored.boundary.kind ? { ...stored.boundary, ...edited.boundary } : edited.boundary;
  return {
    ...stored,
    ...edited,
    process: { ...edited.process },
    boundary: boundary as SizeRequest['boundary'],
    constraints: {
      ...stored.constraints,
      ...edited.constraints,
      tubeOuterDiameters_m: edited.constraints.tubeOuterDiameters_m,
      materials: edited.constraints.materials,
      tubePasses: edited.constraints.tubePasses,
      layouts: edited.constraints.layouts,
    },
  };
}

export function useReviewDuty() {
  const form = useSizingForm();
  return { form, fill: (duty: SizeRequest) => fillSizingForm(form, duty), mergeDuty };
}
