/**
 * The small copper cooler of the pricing tests: 20 tubes 3/4 in BWG 16 copper, 1.0 m, in an NPS 6
 * STD shell (ID 168.3 − 2 × 7.11 = 154.08 mm, ASME B36.10M (memory)), baffles every 0.25 m.
 */
import { PIPE_SHELLS } from '../../shared/thermal/geometry';

const INCH = 0.0254;
export const nps6 = PIPE_SHELLS.find((s) => s.label === 'NPS 6 STD')!;

export const smallCooler = {
  tubeCount: 20,
  tubeLength_m: 1.0,
  tubeOuterDiameter_m: 0.75 * INCH,
  tubeWall_m: 0.065 * INCH,
  tubeWallLabel: 'BWG 16',
  tubeMaterial: 'copper',
  shellInnerDiameter_m: nps6.innerDiameter_m,
  shellLabel: nps6.label,
  baffleSpacing_m: 0.25,
};
