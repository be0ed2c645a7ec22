// The small parts of compare, each against a hand-made case.
import { describe, expect, it } from 'vitest';
import { ACCOUNT_TEMPLATES } from '../../src/core/compare/account-templates.ts';
import { accountText, line, lineText } from '../../src/core/compare/account-text.ts';
import { changeLine } from '../../src/core/compare/change-words.ts';
import { decidingFindings } from '../../src/core/compare/deciding-findings.ts';
import { withValue } from '../../src/core/compare/set-value.ts';
import { diffSpecs } from '../../src/core/compare/spec-diff.ts';
import { literalText } from '../../src/core/format/template.ts';
import type { Finding } from '../../src/core/findings/finding.ts';
import type { CheckResult } from '../../src/core/result/check-result.ts';

describe('the structural difference of specifications', () => {
  const a = { axle: { x_mm: 0, species: 'ash' }, crew: [{ role: 'driver', x_mm: 300 }, { role: 'archer', x_mm: 290 }], loads: [], lengths_mm: [2400, 3000] };
  const b = { axle: { x_mm: 235, species: 'ash' }, crew: [{ role: 'driver', x_mm: 320 }], loads: [{ name: 'water skin', mass_kg: 4 }], lengths_mm: [2400] };

  it('gives each leaf that differs by its dotted path, a part one build lacks as one difference', () => {
    expect(diffSpecs([a, b])).toEqual([
      { path: 'axle.x_mm', unit: 'mm', values: [0, 235] },
      { path: 'crew.0.x_mm', unit: 'mm', values: [300, 320] },
      { path: 'crew.1', unit: '', values: [{ role: 'archer', x_mm: 290 }, null] },
      { path: 'loads.0', unit: '', values: [null, { name: 'water skin', mass_kg: 4 }] },
      { path: 'lengths_mm', unit: 'mm', values: [[2400, 3000], [2400]] },
    ]);
    expect(diffSpecs([a, structuredClone(a)])).toEqual([]);
  });

  it('sets a value, or takes one out, copying only the path', () => {
    const c = withValue(a, 'axle.x_mm', 235);
    expect(c.axle.x_mm).toBe(235);
    expect(a.axle.x_mm).toBe(0);
    expect(c.crew).toBe(a.crew);
    expect(withValue(a, 'crew.1', null).crew).toEqual([{ role: 'driver', x_mm: 300 }]);
    expect(withValue(a, 'loads.0', { name: 'w' }).loads).toEqual([{ name: 'w' }]);
  });

  it('puts a change in words, which way and how far', () => {
    const [axle, crew, gone, added] = diffSpecs([a, b]);
    expect(lineText(changeLine(axle, 1, a, b))).toBe('the axle 235\u00A0mm further forward (axle.x_mm 0\u00A0mm -> 235\u00A0mm)');
    expect(lineText(changeLine(crew, 1, a, b))).toBe('the crew driver 20\u00A0mm further forward (crew.0.x_mm 300\u00A0mm -> 320\u00A0mm)');
    expect(lineText(changeLine(gone, 1, a, b))).toBe('the crew archer left out (crew.1)');
    expect(lineText(changeLine(added, 1, a, b))).toBe('the loads water skin added (loads.0)');
  });
});

describe('the account\'s templates', () => {
  it('hold no number of their own and each has its own code', () => {
    const all = Object.entries(ACCOUNT_TEMPLATES);
    for (const [key, t] of all) expect(literalText(t.text), key).not.toMatch(/\d/);
    expect(new Set(all.map(([, t]) => t.code)).size).toBe(all.length);
  });

  it('write numbers through the number formatter and nest phrases', () => {
    const l = line('inputsRead', { differing: 51, read: 43, base: 'A', other: 'B' });
    expect(lineText(l)).toMatch(/^Of the 51 values .* reads 43;/);
    expect(accountText([line('effectLine', { effect: line('effectSeverity', { change: 'the axle moved' }), outcome: line('noMove', { severity: 'PASS' }) })])).toBe('the axle moved on its own, which leaves the finding PASS.');
  });
});

describe('the findings that decide', () => {
  const f = (rule: string, subject: string, severity: Finding['severity']) => ({ rule, subject, severity }) as Finding;
  const result = (findings: Finding[]) => ({ findings }) as CheckResult;

  it('are those that differ at the worst severity either build gives them', () => {
    const base = result([f('r1', 's', 'pass'), f('r2', 's', 'advice'), f('r3', 's', 'info')]);
    const other = result([f('r1', 's', 'fail'), f('r2', 's', 'warning'), f('r4', 's', 'fail'), f('r5', 's', 'pass')]);
    expect(decidingFindings(base, other).map((p) => [p.base?.rule ?? null, p.other?.rule ?? null])).toEqual([['r1', 'r1'], [null, 'r4']]);
  });

  it('leave out a pass or a note that one build lacks', () => {
    expect(decidingFindings(result([f('r3', 's', 'info')]), result([f('r5', 's', 'pass')]))).toEqual([]);
  });
});
