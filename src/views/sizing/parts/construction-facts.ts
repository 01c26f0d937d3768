/**
 * The mechanical half of a design as labelled facts (issue 11): construction and TEMA class, the
 * design point of each side, walls against what the pressure needs, the hydrotest, tie rods and
 * nozzles. Designs stored before these checks simply show fewer lines.
 */
import type { Design, SizeRequest } from '@shared/schemas/thermal';
import { hydrotest, wallSides } from '@shared/thermal/checks/walls';
import { formatQuantity, type QuantityKind, type UnitSystem } from '@shared/thermal/units';
import type { Fact } from './design-facts';
import { readDesign } from './design-words';

/** TEMA's letters in words: front head, shell, rear head (TEMA, memory). */
const CONSTRUCTION_WORDS: Record<string, string> = {
  BEM: 'fixed tubesheets (bonnet heads, one-pass shell)',
  BEU: 'U-tube bundle, removable (bonnet head, one-pass shell)',
  AES: 'floating head, removable bundle (channel with cover, one-pass shell)',
  AET: 'pull-through floating head, removable bundle',
};
const CLASS_WORDS: Record<string, string> = { R: 'class R (petroleum and process)', C: 'class C (general commercial)', B: 'class B (chemical process)' };

export function constructionFacts(d: Design, system: UnitSystem, duty?: Pick<SizeRequest, 'process' | 'boundary'> | null): Fact[] {
  const q = (value: number, kind: QuantityKind, digits = 3, gauge = false) => formatQuantity(value, kind, system, { digits, ...(gauge ? { pressureBasis: 'gauge' as const } : {}) });
  const facts: Fact[] = [];
  if (d.construction) {
    facts.push({ label: 'Construction (TEMA)', value: `${d.construction}: ${CONSTRUCTION_WORDS[d.construction] ?? d.construction}${d.temaClass ? `; ${CLASS_WORDS[d.temaClass] ?? d.temaClass}` : ''}`, test: 'design-construction' });
    if (d.constructionReason) facts.push({ label: 'Why this construction', value: d.constructionReason, test: 'design-construction-reason' });
  }
  const coolant = duty?.boundary.kind === 'coolant';
  if (duty) {
    const sides = wallSides(duty, readDesign(d).processSide);
    const point = (s: (typeof sides)['tube']) => `${q(s.design.pressure_Pa, 'pressure', 3, true)} at ${q(s.design.temp_C, 'temperature', 3)}${s.design.stated ? '' : ' (default)'}`;
    facts.push({ label: 'Design point, tube side', value: point(sides.tube), test: 'design-point-tube' });
    if (coolant) facts.push({ label: 'Design point, shell side', value: point(sides.shell), test: 'design-point-shell' });
    const h = hydrotest(d, sides);
    facts.push({
      label: 'Hydrotest (UG-99(b))',
      value: `tube side ${q(h.tube.test_Pa + 101_325, 'pressure', 3, true)}${coolant ? `, shell side ${q(h.shell.test_Pa + 101_325, 'pressure', 3, true)}` : ''}`,
      test: 'design-hydrotest',
    });
  }
  if (d.tubeWallRequired_m !== undefined) {
    const thin = d.tubeWall_m < d.tubeWallRequired_m - 1e-6;
    facts.push({
      label: 'Tube wall',
      value: `${d.tubeWallLabel} (${q(d.tubeWall_m, 'length')}); needs at least ${q(d.tubeWallRequired_m, 'length')} for pressure, corrosion and the minimum gauge${thin ? ': too thin' : ''}`,
      test: 'design-tube-wall',
    });
  }
  if (d.shellWallRequired_m !== undefined && d.shellWall_m !== undefined) {
    facts.push({ label: 'Shell wall', value: `${q(d.shellWall_m, 'length')}; needs at least ${q(d.shellWallRequired_m, 'length')}`, test: 'design-shell-wall' });
  }
  if (d.tieRods) facts.push({ label: 'Tie rods', value: `${d.tieRods.count} × ${q(d.tieRods.diameter_m, 'length')} per shell (TEMA)`, test: 'design-tie-rods' });
  const nozzles = d.nozzles ?? [];
  for (const side of ['tube', 'shell'] as const) {
    const mine = nozzles.filter((n) => n.side === side);
    if (!mine.length) continue;
    const inlet = mine.find((n) => n.role === 'inlet') ?? mine[0]!;
    const sizes = [...new Set(mine.map((n) => n.label))].join(' / ');
    const worst = Math.max(...mine.map((n) => n.rhoV2));
    facts.push({
      label: `Nozzles, ${side} side`,
      value: `${sizes} in and out, ${q(inlet.velocity_m_s, 'velocity')}, ρv² up to ${Math.round(worst).toLocaleString('en-US')} kg/(m·s²)${mine.some((n) => n.impingementPlate) ? '; impingement plate at the inlet' : ''}`,
      test: `design-nozzles-${side}`,
    });
  }
  return facts;
}
