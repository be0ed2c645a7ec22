import { describe, expect, it } from 'vitest';
import type { RulesData } from '../../src/core/data/rules-data.ts';
import { Analysis } from '../support/analysis.ts';
import { defineRule } from '../../src/core/pipeline/define-rule.ts';
import { runRules } from '../../src/core/pipeline/run-rules.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';

// The context a rule reports through: it fills in the severity, utilisation,
// sources and the rendered message from the limit, and turns every way a rule
// can lie or break into an error finding that names it, while the other rules run.

const ID = 'test.probe';
const level = (value: number) => ({ value, sources: ['demo-data'], source: 'test' });
const data: RulesData = {
  ...rulesData,
  limits: { ...rulesData.limits, [ID]: { force: { unit: 'N', advisory: level(80), hard: level(100) }, step_mm: { value: 5, unit: 'mm', sources: ['common-practice'], source: 'common practice' } } },
};
const spec = prepared(readDemo('demo-two-crew'));

function probe(run: Parameters<typeof defineRule>[0]['run'], kind: 'check' | 'note' = 'check') {
  return defineRule({
    id: ID,
    title: 'probe',
    checks: 'a rule for the tests',
    kind,
    method: ['design-basis-balance'],
    needs: ['staticCase'],
    limits: { force: { direction: 'max', unit: 'N' } },
    params: ['step_mm'],
    messages: { ok: { code: 9001, text: 'The force is {value:N} against {limit:N}.' }, note: { code: 9002, text: 'A note: {what}.' } },
    run,
  });
}
const base = { subject: 'part.x', label: 'the part', fix: 'none', working: ['a step'] };
const one = (run: Parameters<typeof probe>[0], kind?: 'check' | 'note') => runRules([probe(run, kind)], spec, data, new Analysis(spec, data))[0];

describe('reporting through the rule context', () => {
  it('grades against the limit and fills the message from raw params and the limit', () => {
    const f = one((ctx) => ctx.report({ ...base, message: 'ok', value: 90, unit: 'N', against: { limit: 'force' } }));
    expect(f).toMatchObject({ rule: ID, code: 9001, severity: 'warning', value: 90, limit: 100, utilisation: 0.9, message_key: 'ok', subject: 'part.x', subject_label: 'the part' });
    expect(f.params).toMatchObject({ value: 90, limit: 100, advisory: 80, hard: 100 });
    expect(f.message).toBe('The force is 90\u00a0N against 100\u00a0N.');
    expect(f.sources).toEqual(['design-basis-balance', 'demo-data']);
    expect(f.working).toEqual([{ formula: 'a step', substituted: '', result: null, unit: '' }]);
  });

  it('reads declared parameters and declared models only', () => {
    expect(one((ctx) => ctx.report({ ...base, message: 'ok', value: ctx.param('step_mm').value, against: { limit: 'force' } })).value).toBe(5);
    const undeclared = one((ctx) => void (ctx.models as unknown as Record<string, unknown>).turn);
    expect(undeclared.severity).toBe('error');
    expect(undeclared.message).toContain('reads the model "turn" but does not name it');
  });

  it('turns a rule that lies or breaks into an error finding naming it', () => {
    const cases: [string, Parameters<typeof probe>[0], 'check' | 'note'][] = [
      ['a note that warns', (ctx) => ctx.report({ ...base, message: 'note', params: { what: 'x' }, severity: 'warning' }), 'note'],
      ['a check that gives info', (ctx) => ctx.report({ ...base, message: 'note', params: { what: 'x' }, severity: 'info' }), 'check'],
      ['a severity beside a limit', (ctx) => ctx.report({ ...base, message: 'ok', value: 1, against: { limit: 'force' }, severity: 'pass' }), 'check'],
      ['a value that is not a number', (ctx) => ctx.report({ ...base, message: 'ok', value: NaN, against: { limit: 'force' } }), 'check'],
      ['a message param left out', (ctx) => ctx.report({ ...base, message: 'note', severity: 'pass' }), 'check'],
      ['a thrown fault', () => { throw new Error('boom'); }, 'check'],
    ];
    for (const [what, run, kind] of cases) {
      const f = one(run, kind);
      expect(f.severity, what).toBe('error');
      expect(f.rule, what).toBe(ID);
      expect(f.code, what).toBe(2999);
    }
  });

  it('a rule that fails keeps none of its findings, and the next rule still runs', () => {
    const broken = probe((ctx) => {
      ctx.report({ ...base, message: 'ok', value: 1, against: { limit: 'force' } });
      throw new Error('half way');
    });
    const fine = probe((ctx) => ctx.report({ ...base, message: 'ok', value: 1, against: { limit: 'force' } }));
    const found = runRules([broken, fine], spec, data, new Analysis(spec, data));
    expect(found.map((f) => f.severity)).toEqual(['error', 'pass']);
  });
});
