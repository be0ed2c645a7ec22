import { describe, expect, it } from 'vitest';
import { G } from '../../src/core/units/units.ts';
import { dataWithGround, findingsOf, handSpec } from '../support/fixtures.ts';

const RULE = 'balance.axle-position';
const rigid = dataWithGround('hand-rigid', 0);

describe(RULE, () => {
  it('reports the centre of mass ahead of the axle and the effect of a 50 mm move', async () => {
    const [f] = await findingsOf(RULE, handSpec(), {}, rigid);
    expect(f.severity).toBe('info');
    // x_g = 47250/137 mm (tests/mass-balance.test.ts), axle at 250 mm
    expect(f.value!).toBeCloseTo(47250 / 137 - 250, 9);
    expect(f.message).toContain('forward of the axle');
    // Moving the axle (8 kg) and wheels (20 kg) 50 mm forward, by hand; the box
    // (20 kg at 250 mm) stays and now stands behind the axle:
    // R = [9*(1.25 - 0.30) + 80*(0.30 - 0.30) + 20*(0.25 - 0.30)] g / (2.5 - 0.30)
    //   = 7.55 g / 2.2 = 33.655 N, against 13 g / 2.25 = 56.661 N now: a change of -23.0 N.
    const expected = (7.55 * G) / 2.2 - (13 * G) / 2.25;
    expect(f.params.forward as number).toBeCloseTo(expected, 9);
    expect(f.params.step).toBe(50);
    expect(f.message).toContain(`by ${expected.toFixed(1)}\u00a0N`.replace(".0\u00a0", "\u00a0"));
    expect(f.working.find((s) => s.formula.includes('mm forward'))!.result!).toBeCloseTo((7.55 * G) / 2.2, 9);
  });

  it('says "behind" when the centre of mass falls behind the axle', async () => {
    const s = handSpec();
    s.crew[0].x_mm = 160;
    s.pole.mass_kg = 1;
    const [f] = await findingsOf(RULE, s, {}, rigid);
    expect(f.value!).toBeLessThan(0);
    expect(f.message).toContain('behind the axle');
  });

  it('boundary: the trial step comes from the rules data', async () => {
    const [f] = await findingsOf(RULE, handSpec(), { step_mm: 100 }, rigid);
    expect(f.params.step).toBe(100);
    expect(f.working_text).toContain('100 mm forward');
    expect(f.sources).toContain('common-practice');
  });
});
