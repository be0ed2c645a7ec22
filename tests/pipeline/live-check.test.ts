// The workbench's checks of a build as it is edited reuse the models an edit
// does not reach, and give exactly what a fresh runCheck gives (the
// reference) after every edit: values changed, changed back, a list entry
// added, statics and with the ride.
import { describe, expect, it } from 'vitest';
import { LiveChecker } from '../../src/core/pipeline/live-check.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { readDemo, rulesData } from '../support/fixtures.ts';

type Raw = Record<string, any>;

function prepared(raw: unknown) {
  const p = prepareSpec(raw, rulesData);
  if (!p.ok) throw new Error(p.issues.map((i) => i.message).join('; '));
  return p;
}

const same = (a: unknown, b: unknown) => expect(JSON.stringify(a)).toBe(JSON.stringify(b));

describe('the live checker', () => {
  it.each([false, true])('equals a fresh check after each edit (ride %s), and reuses what an edit does not reach', (ride) => {
    const live = new LiveChecker(rulesData);
    const raw = readDemo('demo-two-crew') as Raw;
    const edits: ((r: Raw) => void)[] = [
      () => undefined,
      (r) => (r.axle.x_mm = 120),
      (r) => (r.team.horse_mass_kg = 420),
      (r) => (r.crew[0].x_mm = 250),
      (r) => (r.axle.x_mm = 280),
      (r) => r.loads.push({ name: 'water skin', mass_kg: 6, x_mm: 100, y_mm: 0, z_mm: 300 }),
      (r) => (r.crew[0].mass_kg = 90),
    ];
    const reused: string[][] = [];
    for (const edit of edits) {
      edit(raw);
      const p = prepared(structuredClone(raw));
      same(live.check(p.spec, p.entries, { ride }), runCheck(p.spec, p.entries, rulesData, { ride }));
      reused.push(live.reused);
    }
    // The first check computes everything; the horses' mass reaches neither the mass of the build nor the strap
    // floor (the axle's position does: the floor's frame rests on it); adding a load starts afresh.
    expect(reused[0]).toEqual([]);
    expect(reused[2]).toEqual(expect.arrayContaining(['mass', 'floorStatic', 'floorLoaded']));
    expect(reused[1]).not.toContain('floorStatic');
    expect(reused[5]).toEqual([]);
  }, 300_000);
});
