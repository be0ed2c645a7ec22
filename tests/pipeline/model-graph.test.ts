import { describe, expect, it } from 'vitest';
import { defineModel } from '../../src/core/pipeline/define-model.ts';
import { ModelGraph } from '../../src/core/pipeline/model-graph.ts';
import { MODELS } from '../../src/core/pipeline/models.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { Analysis } from '../support/analysis.ts';
import { runRules } from '../../src/core/pipeline/run-rules.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';

const spec = prepared(readDemo('demo-two-crew'));

describe('the model graph', () => {
  it('computes only what is asked for, each model once', () => {
    const g = new ModelGraph(MODELS, { spec, data: rulesData, ride: true });
    const t = g.get('turn');
    expect(g.get('turn')).toBe(t);
    expect([...g.computed].sort()).toEqual(['loadCases', 'mass', 'staticCase', 'turn']);
  });

  it('runs the turn rules without starting the floor or the ride model', () => {
    const a = new Analysis(spec, rulesData);
    runRules(RULES.filter((r) => r.id.startsWith('turn.')), spec, rulesData, a);
    expect(a.graph.computed).not.toContain('ride');
    expect(a.graph.computed).not.toContain('floorStatic');
  });

  it('a statics-only run never starts the ride model', () => {
    const p = prepareSpec(readDemo('demo-two-crew'), rulesData);
    if (!p.ok) throw new Error('demo');
    const result = runCheck(p.spec, p.entries, rulesData, { ride: false });
    expect(result.ride).toBeUndefined();
    expect(result.findings.some((f) => f.severity === 'error')).toBe(false);
    // The ride rules say they were not checked.
    expect(result.findings.filter((f) => f.rule.startsWith('ride.')).every((f) => f.severity === 'advice')).toBe(true);
  });

  it('names a circle of models instead of recursing for ever', () => {
    const a = defineModel({ id: 'mass', needs: ['turn'], params: [], compute: (m) => m.turn as never });
    const b = defineModel({ id: 'turn', needs: ['mass'], params: [], compute: (m) => m.mass as never });
    const g = new ModelGraph([a, b] as never, { spec, data: rulesData, ride: true });
    expect(() => g.get('turn')).toThrow(/circle: turn -> mass -> turn/);
  });
});
