/** The recommended design as labelled facts, grouped for the design card, in the chosen unit system. */
import { formatNumber } from '@shared/format';
import type { Design, SizeRequest } from '@shared/schemas/thermal';
import { correctionMethods } from '@shared/thermal/correlations/methods';
import { formatQuantity, type QuantityKind, type UnitSystem } from '@shared/thermal/units';
import { allocationSentence, readDesign, SHELL_METHOD_LABELS, shellsWords } from './design-words';
import { layoutLabel, lengthLabel, materialName, tubeLabel } from './labels';
import { constructionFacts } from './construction-facts';
import { vibrationFacts } from './vibration-words';

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

/** grouped, a few significant digits ("12,300"), as every page writes numbers */
const num = (value: number, digits = 3) => formatNumber(value, digits);

/** A tube-side correction in words (the method table's name), never its code. */
function correctionName(code: string): string {
  return (correctionMethods as Record<string, { name: string } | undefined>)[code]?.name ?? code.replace(/-/g, ' ');
}

/** `duty` names the fluids in the allocation line; without it the line says "process fluid" and "coolant". */
export function designFacts(d: Design, system: UnitSystem, duty?: Pick<SizeRequest, 'process' | 'boundary'> | null): FactGroup[] {
  const r = d.rating;
  const v = readDesign(d);
  const hasShell = d.shellInnerDiameter_m !== undefined && duty?.boundary.kind !== 'wall';
  const J = v.shellCorrections;
  const q = (value: number, kind: QuantityKind, digits = 3) => formatQuantity(value, kind, system, { digits });
  const optional = (label: string, value: number | undefined, show: (v: number) => string, test?: string): Fact[] =>
    value === undefined ? [] : [{ label, value: show(value), test }];
  const dp = r.pressureDrop;
  return [
    {
      title: 'Bundle',
      facts: [
        { label: 'Where the fluids go', value: allocationSentence(v.processSide, duty), test: 'design-allocation' },
        ...(v.allocationReason ? [{ label: 'Why', value: v.allocationReason, test: 'design-allocation-reason' }] : []),
        ...(hasShell ? [{ label: 'Shells', value: shellsWords(v.shellsInSeries), test: 'design-shells' }] : []),
        { label: v.shellsInSeries > 1 ? 'Tubes per shell' : 'Tubes', value: `${d.tubeCount}`, test: 'design-tubes' },
        { label: 'Tube', value: tubeLabel(d.tubeOuterDiameter_m, d.tubeWallLabel, system), test: 'design-tube' },
        { label: 'Material', value: materialName(d.tubeMaterial) },
        { label: 'Tube length', value: `${lengthLabel(d.tubeLength_m, system)} (needs ${lengthLabel(d.requiredLength_m, system)})`, test: 'design-length' },
        { label: 'Tube passes', value: `${d.tubePasses}` },
        { label: 'Layout', value: `${layoutLabel(d.layout)}${d.tubePitch_m ? `, pitch ${q(d.tubePitch_m, 'length')}` : ''}` },
        ...optional('Shell', d.shellInnerDiameter_m, (v) => `${d.shellLabel ?? 'shell'}, ID ${q(v, 'length')}`, 'design-shell'),
        ...(hasShell && v.baffleSpacing_m !== undefined
          ? [
              {
                label: 'Baffles',
                value: `${v.baffleCount !== undefined ? `${v.baffleCount} per shell, ` : ''}spacing ${q(v.baffleSpacing_m, 'length')}, cut ${Math.round(v.baffleCut * 100)} % of the shell diameter${
                  v.inletBaffleSpacing_m && Math.abs(v.inletBaffleSpacing_m - v.baffleSpacing_m) > 1e-4 ? `; ends ${q(v.inletBaffleSpacing_m, 'length')} / ${q(v.outletBaffleSpacing_m ?? v.inletBaffleSpacing_m, 'length')}` : ''
                }`,
                test: 'design-baffles',
              },
            ]
          : []),
        { label: v.shellsInSeries > 1 ? 'Heat-transfer area (all shells)' : 'Heat-transfer area', value: q(d.area_m2, 'area'), test: 'design-area' },
      ],
    },
    {
      title: 'Thermal',
      facts: [
        { label: 'Duty', value: q(r.duty_W, 'power'), test: 'design-duty' },
        ...optional('of which condensing', r.latentDuty_W, (v) => q(v, 'power')),
        {
          label: 'Process outlet',
          value: `${q(r.outletTemp_C, 'temperature', 4)}${r.outletUncertainty_K !== undefined ? ` ± ${q(r.outletUncertainty_K, 'temperatureDifference', 2)} (the correlations' stated accuracy)` : ''}`,
          test: 'design-outlet',
        },
        ...optional('Coolant outlet', r.coolantOutletTemp_C, (v) => q(v, 'temperature', 4), 'design-coolant-outlet'),
        {
          label: 'Over-surface margin',
          value: `${num(d.overSurface_pct, 2)} %${d.designMargin_pct ? ` (sized with a ${num(d.designMargin_pct, 3)} % design margin on area)` : ''}`,
          test: 'design-margin',
        },
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
        ...(r.corrections.length ? [{ label: 'Corrections', value: r.corrections.map(correctionName).join('; ') }] : []),
      ],
    },
    ...(r.shellHtc_W_m2K === undefined
      ? []
      : [
          {
            title: 'Shell-side method',
            facts: [
              { label: 'Method', value: v.shellMethod ? SHELL_METHOD_LABELS[v.shellMethod] : 'Kern (ideal bundle)', test: 'design-shell-method' },
              { label: 'Shell-side h', value: q(r.shellHtc_W_m2K, 'heatTransferCoefficient'), test: 'design-shell-h' },
              ...(v.shellMethod === 'bell-delaware'
                ? optional('Kern, second opinion', v.shellHtcKern_W_m2K, (k) => `h ${q(k, 'heatTransferCoefficient')}${v.shellPressureDropKern_Pa !== undefined ? `, ΔP ${q(v.shellPressureDropKern_Pa, 'pressureDrop')}` : ''}`, 'design-shell-kern')
                : []),
              ...(J
                ? [
                    {
                      label: 'Correction factors J',
                      value: `cut ${num(J.Jc, 3)} · leakage ${num(J.Jl, 3)} · bypass ${num(J.Jb, 3)} · end spacing ${num(J.Js, 3)} · laminar ${num(J.Jr, 3)}`,
                      test: 'design-shell-j',
                    },
                  ]
                : []),
              ...(v.shellPressureDropBreakdown
                ? [
                    {
                      label: 'Shell ΔP by zone',
                      value: `crossflow ${q(v.shellPressureDropBreakdown.crossflow_Pa, 'pressureDrop', 2)}, windows ${q(v.shellPressureDropBreakdown.window_Pa, 'pressureDrop', 2)}, ends ${q(v.shellPressureDropBreakdown.ends_Pa, 'pressureDrop', 2)}${
                        v.shellPressureDropBreakdown.nozzles_Pa ? `, nozzles ${q(v.shellPressureDropBreakdown.nozzles_Pa, 'pressureDrop', 2)}` : ''
                      }`,
                      test: 'design-shell-dp-zones',
                    },
                  ]
                : []),
            ],
          },
        ]),
    ...(r.vibration ? [{ title: 'Tube vibration screen', facts: vibrationFacts(r.vibration, system) }] : []),
    ...((mechanical) => (mechanical.length ? [{ title: 'Construction and pressure', facts: mechanical }] : []))(constructionFacts(d, system, duty)),
  ];
}
