import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { runRules } from '../../src/core/pipeline/run-rules.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const RULE = 'ride.crew-airborne';
const demo = (operation: Record<string, unknown>) => deepMerge(readDemo('demo-two-crew'), { operation });

describe(RULE, () => {
  it('passes when the crew stay on the floor over the demo\'s rough ground; the stone, no worse, is not reported apart', async () => {
    const found = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(found).toHaveLength(4); // two crew, two rough-ground cases
    expect(found.map((f) => [f.subject, f.load_case, f.combination])).toEqual([
      ['crew.0.rough-ridge', 'rough-ground', 'characteristic'],
      ['crew.1.rough-ridge', 'rough-ground', 'characteristic'],
      ['crew.0.rough-one-wheel', 'rough-ground', 'characteristic'],
      ['crew.1.rough-one-wheel', 'rough-ground', 'characteristic'],
    ]);
    expect(found[0].subject_label).toBe('driver, rough-ground ridge across both tracks');
    expect(found.every((f) => f.severity === 'pass')).toBe(true);
    expect(found[0].working_text).toContain('Dormand-Prince 5(4)');
    expect(found[0].working_text).toMatch(/stone strike under both wheels: off the floor 0\sms, at most 0\smm above it: no further than over rough ground/);
    // The limits and the model's stiffnesses are from memory (rules/limits/ride.yaml, rules/parameters/ride.yaml); the contact law is Hunt and Crossley's.
    expect(found[0].sources).toEqual(expect.arrayContaining(['design-basis-ride', 'hunt-crossley-1975', 'from-memory']));
  });

  it('on a very long, low ridge the floor never falls away: the floor force stays at the weight', async () => {
    // Hand calculation: a raised cosine h high and L long taken at v accelerates the floor by at most
    // (h/2)(2πv/L)²; 10 mm over 10 m at 20 km/h gives 0.005 × (2π × 5.56 / 10)² = 0.061 m/s², 0.6 % of g,
    // far too slow to excite the crew on the floor (about 2.6 Hz against 0.56 Hz), so the peak floor force is the weight within 1 %.
    const found = await findingsOf(RULE, demo({ rough_ground: { height_mm: 10, length_mm: 10_000 } }));
    const rough = found.filter((f) => f.load_case === 'rough-ground');
    for (const f of rough) {
      expect(f.params.airborne).toBe(0);
      expect(Math.abs((f.params.dlf as number) - 1)).toBeLessThan(0.01);
    }
  });

  it('fails when a 40 mm ridge of rough ground throws the crew off the floor', async () => {
    const found = await findingsOf(RULE, demo({ rough_ground: { height_mm: 40, length_mm: 800 } }));
    const ridge = found.filter((f) => f.subject.endsWith('rough-ridge'));
    expect(ridge.every((f) => f.severity === 'fail')).toBe(true);
    expect(ridge[0].params.airborne as number).toBeGreaterThan(20);
    expect(ridge[0].message).toContain('leaves the floor over the rough-ground ridge across both tracks');
  });

  it('reports the stone apart where it throws the crew further: accidental, a warning at most', async () => {
    const found = await findingsOf(RULE, demo({ bump_height_mm: 40 }));
    const stone = found.filter((f) => f.load_case === 'stone');
    expect(stone.length).toBeGreaterThan(0);
    expect(stone.map((f) => f.subject)).toContain('crew.1.stone-ridge');
    for (const f of stone) expect([f.combination, f.severity === 'fail']).toEqual(['accidental', false]);
    const thrown = stone.filter((f) => f.subject.endsWith('stone-ridge'));
    for (const f of thrown) {
      expect([f.severity, f.code]).toEqual(['warning', 2806]);
      expect(f.params.airborne as number).toBeGreaterThan(20);
    }
    expect(thrown[0].message).toContain('is thrown off the floor at the stone strike under both wheels');
    // The rough ground still passes: the stone does not make the build fail.
    expect(found.filter((f) => f.load_case === 'rough-ground').every((f) => f.severity === 'pass')).toBe(true);
  });

  /**
   * Boundary of one measure: with the other limit out of the way, a limit
   * equal to the largest value passes, a hair below it gives the level's severity.
   */
  async function boundary(operation: Record<string, unknown>, loadCase: string, measure: 'airborne' | 'lift', limit: string, other: string, unit: string, beyond: string) {
    const raw = demo(operation);
    const probe = (await findingsOf(RULE, raw)).filter((f) => f.load_case === loadCase).reduce((w, f) => ((f.params[measure] as number) > (w.params[measure] as number) ? f : w));
    const v = probe.params[measure] as number;
    expect(v).toBeGreaterThan(0);
    const pick = async (limits: Record<string, number>) => (await findingsOf(RULE, raw, limits)).find((f) => f.subject === probe.subject)!;
    const at = await pick({ [`${limit}.hard`]: v, [`${other}.hard`]: 1e3 });
    expect(at.severity).toBe('pass');
    // The measure governs: the value is it, against its own limit.
    expect([at.value, at.limit, at.unit]).toEqual([v, v, unit]);
    const over = await pick({ [`${limit}.hard`]: v * (1 - 1e-9), [`${other}.hard`]: 1e3 });
    expect(over.severity).toBe(beyond);
  }

  const ROUGH = { rough_ground: { height_mm: 30, length_mm: 800 } };
  it('boundary: a time off the floor over rough ground equal to the limit passes, a hair less fails', () => boundary(ROUGH, 'rough-ground', 'airborne', 'airborne_ms', 'rise_mm', 'ms', 'fail'));

  it('boundary: a rise above the floor over rough ground equal to the limit passes, a hair less fails', () => boundary(ROUGH, 'rough-ground', 'lift', 'rise_mm', 'airborne_ms', 'mm', 'fail'));

  it('boundary: at the stone, a time off the floor equal to the limit passes, a hair less warns', () => boundary({ bump_height_mm: 30 }, 'stone', 'airborne', 'stone_airborne_ms', 'stone_rise_mm', 'ms', 'warning'));

  it('says so, and does not pass, where the ride model was not run (a statics-only run)', () => {
    const rule = RULES.find((r) => r.id === RULE)!;
    const spec = prepared(readDemo('demo-two-crew'));
    const found = runRules([rule], spec, rulesData, new Analysis(spec, rulesData, undefined, { ride: false }));
    expect(found.map((f) => [f.severity, f.code, f.subject])).toEqual([['advice', 2804, 'ride.model']]);
  });
});
