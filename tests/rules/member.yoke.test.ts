import { describe, expect, it } from 'vitest';
import { Analysis } from '../../src/core/engine/analysis.ts';
import { G } from '../../src/core/units/units.ts';
import { dataWithGround, deepMerge, rulesData, findingsOf, handSpec, prepared, readDemo } from '../support/fixtures.ts';

// The hand spec runs on a test ground of its own.
const rigid = dataWithGround('hand-rigid', 0);
import { expectUtilisationBoundary } from '../support/limit-boundary.ts';

const RULE = 'member.yoke';
const one = async (raw: unknown, data = rulesData) => (await findingsOf(RULE, raw, {}, data))[0];

describe(RULE, () => {
  it('passes for the rear-axle demo', async () => {
    expect((await one(readDemo('demo-rear-axle'))).severity).toBe('pass');
  });

  it('hand calculation: M = R·s/4 + w·s²/8 on a 50 × 50 yoke, necks 700 mm apart', async () => {
    // Roark, Table 8.1: centre load W l/4 and uniform load w l²/8 on a simply supported span.
    const raw = handSpec();
    const a = new Analysis(prepared(raw, rigid), rigid);
    const f = await one(raw, rigid);
    const w = (4 * G) / 1100; // measured 4 kg over 1100 mm, N/mm
    const W = 50 ** 3 / 6;
    const gov = a.memberCases.find((c) => f.message.includes(`"${c.title}"`))!;
    expect(f.value).toBeCloseTo(((gov.pole_N * 700) / 4 + (w * gov.gravityFactor * 700 ** 2) / 8) / W, 9);
  });

  it('fails a lath of a yoke on wide-set necks', async () => {
    const f = await one(deepMerge(readDemo('demo-rear-axle'), { yoke: { width_mm: 20, height_mm: 20, neck_spacing_mm: 1000 } }));
    expect(f.severity).toBe('fail');
  });

  it('boundary: a stress equal to the design strength passes', async () => {
    await expectUtilisationBoundary(RULE, readDemo('teaching-flawed'), (f) => f[0]);
  });
});
