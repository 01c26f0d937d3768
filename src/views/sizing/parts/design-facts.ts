/** The recommended design as labelled facts, grouped for the design card, in the chosen unit system. */
import type { Design } from '@shared/schemas/thermal';
import { formatQuantity, type QuantityKind, type UnitSystem } from '@shared/thermal/units';
import { layoutLabel, lengthLabel, materialName, tubeLabel } from './labels';

export interface Fact {
  label: string;
  value: string;
  test?: string;
}
export interface FactGroup {
  title: string;
  facts: Fact[];
}

const REGIME: Record<string, string> = {
  laminar: 'laminar',
  transitional: 'transitional (uncertain between Re 2300 and 10⁴)',
  turbulent: 'turbulent',
};

const num = (value: number, digits = 3) => String(Number(value.toPrecision(digits)));

export function designFacts(d: Design, system: UnitSystem): FactGroup[] {
  const r = d.rating;
  const q = (value: number, kind: QuantityKind, digits = 3) => formatQuantity(value, kind, system, { digits });
  const optional = (label: string, value: number | undefined, show: (v: number) => string, test?: string): Fact[] =>
    value === undefined ? [] : [{ label, value: show(value), test }];
  const dp = r.pressureDrop;
  return [
    {
      title: 'Bundle',
      facts: [
        { label: 'Tubes', value: `${d.tubeCount}`, test: 'design-tubes' },
        { label: 'Tube', value: tubeLabel(d.tubeOuterDiameter_m, d.tubeWallLabel, system), test: 'design-tube' },
        { label: 'Material', value: materialName(d.tubeMaterial) },
        { label: 'Tube length', value: `${lengthLabel(d.tubeLength_m, system)} (needs ${lengthLabel(d.requiredLength_m, system)})`, test: 'design-length' },
        { label: 'Tube passes', value: `${d.tubePasses}` },
        { label: 'Layout', value: `${layoutLabel(d.layout)}${d.tubePitch_m ? `, pitch ${q(d.tubePitch_m, 'length')}` : ''}` },
        ...optional('Shell', d.shellInnerDiameter_m, (v) => `${d.shellLabel ?? 'shell'}, ID ${q(v, 'length')}`, 'design-shell'),
        ...optional('Baffle spacing', d.baffleSpacing_m, (v) => q(v, 'length')),
        { label: 'Heat-transfer area', value: q(d.area_m2, 'area'), test: 'design-area' },
      ],
    },
    {
      title: 'Thermal',
      facts: [
        { label: 'Duty', value: q(r.duty_W, 'power'), test: 'design-duty' },
        ...optional('of which condensing', r.latentDuty_W, (v) => q(v, 'power')),
        { label: 'Process outlet', value: q(r.outletTemp_C, 'temperature', 4), test: 'design-outlet' },
        ...optional('Coolant outlet', r.coolantOutletTemp_C, (v) => q(v, 'temperature', 4), 'design-coolant-outlet'),
        { label: 'Over-surface margin', value: `${num(d.overSurface_pct, 2)} %`, test: 'design-margin' },
        ...optional('Overall U (outside area)', r.overallU_W_m2K, (v) => q(v, 'heatTransferCoefficient')),
        ...optional('LMTD correction F', r.lmtdCorrectionF, (v) => num(v, 3), 'design-f'),
        ...optional('Effectiveness ε / NTU', r.effectiveness, (v) => `${num(v, 3)} / ${num(r.ntu ?? NaN, 3)}`),
        ...optional('Condensate', r.condensate_kg_s, (v) => q(v, 'massFlow'), 'design-condensate'),
      ],
    },
    {
      title: 'Pressure drop and velocity',
      facts: [
        {
          label: 'Tube side ΔP',
          value: `${q(dp.total_Pa, 'pressureDrop')} (friction ${q(dp.friction_Pa, 'pressureDrop', 2)}, returns ${q(dp.returns_Pa, 'pressureDrop', 2)}${dp.nozzles_Pa ? `, nozzles ${q(dp.nozzles_Pa, 'pressureDrop', 2)}` : ''})`,
          test: 'design-dp',
        },
        { label: 'Tube velocity', value: q(r.velocity_m_s, 'velocity') },
        ...optional('Shell side ΔP', r.shellPressureDrop_Pa, (v) => q(v, 'pressureDrop'), 'design-shell-dp'),
        ...optional('Shell velocity', r.shellVelocity_m_s, (v) => q(v, 'velocity')),
      ],
    },
    {
      title: 'Tube-side method',
      facts: [
        { label: 'Correlation', value: r.correlationName, test: 'design-correlation' },
        { label: 'Regime', value: REGIME[r.regime] ?? r.regime, test: 'design-regime' },
        { label: 'Re / Pr / Nu', value: `${num(r.reynolds, 4)} / ${num(r.prandtl, 3)} / ${num(r.nusselt, 3)}` },
        { label: 'Tube-side h', value: q(r.htc_W_m2K, 'heatTransferCoefficient') },
        ...optional('Shell-side h (Kern)', r.shellHtc_W_m2K, (v) => q(v, 'heatTransferCoefficient')),
        ...(r.corrections.length ? [{ label: 'Corrections', value: r.corrections.join(', ') }] : []),
      ],
    },
  ];
}
