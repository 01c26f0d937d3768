/**
 * The build sheet's hydrotest follows each side's design pressure (issue 11): the duty's stated
 * `design` where given, else the operating pressure plus the default margin; ASME VIII-1 UG-99(b)
 * 1.3 × MAWP × stress ratio (memory), the MAWP taken as the design pressure.
 */
import { describe, expect, it } from 'vitest';
import { sizeRequestSchema } from '../../shared/schemas/thermal';
import { buildSheetFixture, glycolDuty, HYDROTEST } from './build-sheet-pdf.fixture';

const ATM = 101_325;

describe('build sheet hydrotest from the design pressures', () => {
  it('a stored duty without `design`: 1.3 × (operating + margin), as before', () => {
    expect(buildSheetFixture().hydrotest).toMatchObject(HYDROTEST);
  });

  it('a stated design pressure sets the test pressure of its side, and the basis shows it', () => {
    // glycol (process, in the tubes) designed for 10 bar(g) at 120 °C: 1.3 × 10 × 1.00 = 13 bar(g);
    // the water side keeps its default, 3 bar(g) + 1 bar = 4 bar(g): 1.3 × 4 = 5.2 bar(g)
    const duty = sizeRequestSchema.parse({ ...glycolDuty, process: { ...glycolDuty.process, design: { pressure_Pa: 10e5 + ATM, temp_C: 120 } } });
    const sheet = buildSheetFixture(undefined, duty);
    expect(sheet.hydrotest.tubeSide_Pa).toBe(1_300_000);
    expect(sheet.hydrotest.shellSide_Pa).toBe(HYDROTEST.shellSide_Pa);
    expect(sheet.hydrotest.basis).toContain('Tube side: 1.3 × 10.0 bar(g) × 1.00 = 13.0 bar(g) (design 10.0 bar(g) at 120 °C, as stated on the duty)');
  });
});
