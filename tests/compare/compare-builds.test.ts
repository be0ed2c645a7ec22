// compare against separate checks: the figures and severities of the two
// demos computed here from two independent runs of the check, and a build
// compared with itself.
import { beforeAll, describe, expect, it } from 'vitest';
import type { AccountLine } from '../../src/core/compare/account-line.ts';
import { compareBuilds } from '../../src/core/compare/compare-builds.ts';
import type { CompareResult } from '../../src/core/compare/compare-result.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import type { CheckResult } from '../../src/core/result/check-result.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import { readDemo, rulesData } from '../support/fixtures.ts';

/** A phrase of a line that is a line of its own. */
const nested = (l: AccountLine, name: string) => (l.params[name] as { line: AccountLine }).line;

type Lp = Awaited<ReturnType<typeof loadLpSolver>>;

function checked(name: string, lp: Lp) {
  const p = prepareSpec(readDemo(name), rulesData);
  if (!p.ok) throw new Error(`${name} is refused`);
  return { spec: p.spec, result: runCheck(p.spec, p.entries, rulesData, { lp }) };
}

function compared(list: { spec: ReturnType<typeof checked>['spec']; result: CheckResult }[], lp: Lp): CompareResult {
  return compareBuilds({ builds: list.map((b, i) => ({ ...b, label: String.fromCharCode(65 + i), file: `${i}.yaml` })), data: rulesData, inputs: { lp, ride: true }, rules: RULES });
}

describe('a build compared with itself', () => {
  let c: CompareResult;
  beforeAll(async () => {
    const lp = await loadLpSolver();
    const a = checked('demo-two-crew', lp);
    c = compared([a, checked('demo-two-crew', lp)], lp);
  });

  it('shows no differences', () => {
    expect(c.spec_differences).toEqual([]);
    expect(c.findings_differing).toEqual([]);
    expect(c.findings_not_in_all).toEqual([]);
    for (const f of c.figures) {
      expect(f.values[1], f.name).toBe(f.values[0]);
      if (f.values[0] !== null) expect(f.difference[1], f.name).toBe(0);
      // A baseline of zero has no ratio, never NaN.
      expect(f.ratio[1], f.name).toBe(f.values[0] ? 1 : null);
    }
    expect(c.accounts[0].lines.map((l) => l.key)).toEqual(['noDifference']);
    expect(c.accounts[0].reruns).toBe(0);
  });
});

describe('the two demos compared', () => {
  let lp: Lp;
  let rear: ReturnType<typeof checked>;
  let central: ReturnType<typeof checked>;
  let c: CompareResult;
  beforeAll(async () => {
    lp = await loadLpSolver();
    rear = checked('demo-rear-axle', lp);
    central = checked('demo-two-crew', lp);
    c = compared([rear, central], lp);
  });

  it('gives every figure of the separate checks, with their difference and ratio', () => {
    const names = new Set([...Object.keys(rear.result.figures), ...Object.keys(central.result.figures), ...Object.keys(rear.result.figures_not_applicable)]);
    expect(new Set(c.figures.map((f) => f.name))).toEqual(names);
    for (const f of c.figures) {
      const [a, b] = [rear.result.figures[f.name]?.value, central.result.figures[f.name]?.value];
      if (a === undefined || b === undefined) {
        expect(f.difference[1]).toBeNull();
        expect(f.not_applicable.some((w) => w !== null)).toBe(true);
        continue;
      }
      expect(f.values).toEqual([a, b]);
      expect(f.difference[1]).toBe(b - a);
      expect(f.ratio[1]).toBe(a === 0 ? null : b / a);
    }
    // The reason of a figure that does not apply is the check's own.
    const damping = c.figures.find((f) => f.name === 'floor_damping_ratio_needed')!;
    expect(damping.not_applicable[0]).toBe(rear.result.figures_not_applicable.floor_damping_ratio_needed);
  });

  it('lists exactly the findings whose severity differs, and those one build lacks', () => {
    const key = (f: { rule: string; subject: string }) => `${f.rule}|${f.subject}`;
    const a = new Map(rear.result.findings.map((f) => [key(f), f.severity]));
    const b = new Map(central.result.findings.map((f) => [key(f), f.severity]));
    const differ = [...a].filter(([k, s]) => b.has(k) && b.get(k) !== s).map(([k]) => k);
    const lacking = [...new Set([...a.keys(), ...b.keys()])].filter((k) => !a.has(k) || !b.has(k));
    expect(c.findings_differing.map(key).sort()).toEqual(differ.sort());
    expect(c.findings_not_in_all.map(key).sort()).toEqual(lacking.sort());
    for (const f of c.findings_differing) expect(f.severities).toEqual([a.get(key(f)), b.get(key(f))]);
    // The two demos differ in the yoke-lift advice (the central axle leaves the yoke light with the crew aft).
    expect(differ).toContain('balance.yoke-lift|case.crew-aft-accelerating.seated');
  });

  it('names as the reason a change that, made alone in the baseline and checked afresh, gives the other build\'s severity', () => {
    const lines = c.accounts[0].lines;
    const deciding = lines.find((l) => l.key === 'deciding')!;
    expect(deciding.params.rule).toBe('balance.yoke-lift');
    const reaching = lines.filter((l) => l.key === 'effectLine' && nested(l, 'outcome').key === 'reaches');
    expect(reaching.length).toBeGreaterThan(0);
    // The change it names, applied to the baseline file and checked from scratch (not through the account's partial re-runs).
    const change = nested(nested(reaching[0], 'effect'), 'change').params.path;
    expect(change).toBe('axle.x_mm');
    const raw = readDemo('demo-rear-axle') as { axle: { x_mm: number } };
    raw.axle.x_mm = central.spec.axle.x_mm;
    const p = prepareSpec(raw, rulesData);
    if (!p.ok) throw new Error('the changed baseline is refused');
    const again = runCheck(p.spec, p.entries, rulesData, { lp }).findings.find((f) => f.rule === 'balance.yoke-lift' && f.subject === 'case.crew-aft-accelerating.seated');
    expect(again?.severity).toBe('advice');
    expect(c.accounts[0].text).toContain('axle.x_mm');
  });

  it('holds no number that is not finite', () => {
    expect(JSON.stringify(c)).not.toMatch(/NaN|Infinity/);
    const numbers = c.figures.flatMap((f) => [...f.values, ...f.difference, ...f.ratio]).filter((v) => v !== null);
    for (const v of numbers) expect(Number.isFinite(v)).toBe(true);
  });
});
