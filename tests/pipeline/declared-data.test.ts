import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { declaredDataProblems } from '../../src/core/pipeline/declared-data.ts';
import { MODELS } from '../../src/core/pipeline/models.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { defaultRulesDir, loadRulesData } from '../../src/node/load-rules-data.ts';
import { rulesData } from '../support/fixtures.ts';

// What models and rules declare they read must be in the data: a missing
// number is a load error naming its file and key, never a default at run time.

describe('declared data', () => {
  it('the shipped data holds everything the models and rules declare', () => {
    expect(declaredDataProblems(rulesData, MODELS, RULES)).toEqual([]);
  });

  it('names a model parameter the data lacks, and a limit given as a plain value', () => {
    const params = structuredClone(rulesData.params);
    delete (params['load-cases'] as Record<string, unknown>).stopping_shock_factor;
    const limits = structuredClone(rulesData.limits);
    limits['balance.horse-load'].load_fraction = { value: 0.1, unit: '1', sources: ['from-memory'], source: 'from memory' };
    const problems = declaredDataProblems({ ...rulesData, params, limits }, MODELS, RULES);
    expect(problems.map((p) => `${p.table} ${p.group}.${p.name}`)).toEqual(expect.arrayContaining(['params load-cases.stopping_shock_factor', 'limits balance.horse-load.load_fraction']));
  });

  it('the loader refuses such data, naming the file, the line and the key', () => {
    const dir = mkdtempSync(join(tmpdir(), 'axletree-declared-'));
    cpSync(defaultRulesDir(), dir, { recursive: true });
    const file = join(dir, 'parameters', 'load-cases.yaml');
    const text = readFileSync(file, 'utf8');
    writeFileSync(file, text.replace(/\n  routine_factor_bound:[\s\S]*?(?=\n  \w)/, ''));
    expect(() => loadRulesData(dir)).toThrow(/parameters\/load-cases\.yaml:\d+: load-cases: routine_factor_bound: the model "\w+" reads the parameter load-cases\.routine_factor_bound/);
  });

  it('an advisory level beyond the hard level is refused', () => {
    const limits = structuredClone(rulesData.limits);
    const l = limits['turn.rollover'].lateral_fraction as { advisory: { value: number } };
    l.advisory.value = 1.1;
    expect(declaredDataProblems({ ...rulesData, limits }, MODELS, RULES).map((p) => p.message)).toEqual([expect.stringContaining('the advisory level 1.1 lies beyond the hard level 1')]);
  });
});
