import { describe, expect, it } from 'vitest';
import { TOLERANCE } from '../../src/core/decisive/break-even.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { optionsFor } from '../../src/core/size/one-input-options.ts';
import { PartialCheck } from '../../src/core/size/partial-check.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { readDemo, rulesData } from '../support/fixtures.ts';

// A demo build driven too fast for its turn (demo data), so turn.rollover
// fails. The option found for the design speed is checked against a plain
// bisection of the whole check on that one input, carried to a tenth of the
// search's resolution: the two agree to the search's resolution.

function fastTurn(speed: number): Record<string, any> {
  const raw = readDemo('demo-two-crew') as Record<string, any>;
  raw.operation.turn_radius_m = 5;
  raw.operation.speed_kmh = speed;
  return raw;
}

function rolloverPasses(speed: number): boolean {
  const p = prepareSpec(fastTurn(speed), rulesData);
  if (!p.ok) throw new Error('refused');
  const r = runCheck(p.spec, p.entries, rulesData, { rules: RULES.filter((x) => x.id === 'turn.rollover'), ride: false });
  return r.findings.every((f) => f.severity === 'pass' || f.severity === 'advice');
}

describe('one-input options', () => {
  const given = 30;
  const p = prepareSpec(fastTurn(given), rulesData);
  if (!p.ok) throw new Error('refused');
  const check = new PartialCheck({ spec: p.spec, data: rulesData, rules: RULES, inputs: { ride: true } });
  const failing = check.base.findings.find((f) => f.rule === 'turn.rollover' && f.severity === 'fail')!;

  it('finds the design speed at which the rollover check passes, agreeing with a plain bisection', () => {
    expect(failing).toBeDefined();
    const found = optionsFor({ spec: p.spec, entries: p.entries, data: rulesData, check, memo: new Map() }, failing);
    const speed = found.options.find((o) => o.input === 'operation.speed_kmh')!;
    expect(speed).toBeDefined();
    expect(speed.from).toBe(given);
    expect(speed.to).toBeLessThan(given);
    // A plain bisection between a passing and the failing speed, to a tenth of the search's tolerance.
    let lo = speed.to * 0.5;
    let hi = given;
    expect(rolloverPasses(lo)).toBe(true);
    while (hi - lo > (TOLERANCE / 10) * lo) {
      const mid = (lo + hi) / 2;
      if (rolloverPasses(mid)) lo = mid;
      else hi = mid;
    }
    expect(Math.abs(speed.to - lo)).toBeLessThanOrEqual(TOLERANCE * lo);
    // The option's value passes on the whole check (it is the passing end of the search's bracket).
    expect(rolloverPasses(speed.to)).toBe(true);
    expect(speed.change).toBeCloseTo(speed.to / given - 1, 12);
  });
});
