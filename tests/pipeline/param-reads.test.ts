import { readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { RulesData } from '../../src/core/data/rules-data.ts';
import { Analysis } from '../support/analysis.ts';
import { ModelGraph } from '../../src/core/pipeline/model-graph.ts';
import { MODELS } from '../../src/core/pipeline/models.ts';
import type { ModelId } from '../../src/core/pipeline/model-values.ts';
import { runRules } from '../../src/core/pipeline/run-rules.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';

// Every model parameter a model reads while it computes is one it declares
// (so the loader's check of declarations covers it). Reads are recorded on
// the data and laid to the model the graph is computing at the time.

function recordingData(graph: () => ModelGraph | undefined, reads: Map<string, Set<string>>): RulesData {
  const params = new Proxy(rulesData.params, {
    get(target, group: string) {
      const g = target[group];
      if (typeof group !== 'string' || g === undefined) return g;
      return new Proxy(g, {
        get(t, name: string) {
          const who = graph()?.current ?? '(outside a model)';
          if (!reads.has(who)) reads.set(who, new Set());
          reads.get(who)!.add(`${group}.${name}`);
          return t[name];
        },
      });
    },
  });
  return { ...rulesData, params };
}

// Parameters whose name follows the build (a ground, a species, a material): the model reads the
// one the specification names, which no declaration can list.
const BY_BUILD = [/^ride\.ground-(contact|damping)\./, /^timber-strength\.intersection_moisture_pct/, /^cutlist\.usable_hide_m2/];

describe('model parameters', () => {
  // The demos and the validation specs between them reach every kind of part (iron tyres, round bars).
  const specs = ['demo-two-crew', 'demo-rear-axle', 'teaching-flawed', ...readdirSync(new URL('../../specs/validation/', import.meta.url)).filter((f) => f.endsWith('.yaml')).map((f) => `validation/${f.slice(0, -5)}`)];
  for (const demo of specs) {
    it(`${demo}: every parameter a model reads is one it declares`, () => {
      const reads = new Map<string, Set<string>>();
      const holder: { graph?: ModelGraph } = {};
      const data = recordingData(() => holder.graph, reads);
      const spec = prepared(readDemo(demo));
      const graph = (holder.graph = new ModelGraph(MODELS, { spec, data, ride: true }));
      runRules(RULES, spec, data, new Analysis(spec, data, undefined, { graph }));
      for (const m of MODELS) graph.get(m.id);
      expect(reads.size).toBeGreaterThan(3);
      const undeclared: string[] = [];
      for (const [who, keys] of reads) {
        if (who === '(outside a model)') continue;
        const declared = new Set<string>(MODELS.find((m) => m.id === (who as ModelId))!.params);
        for (const k of keys) if (!declared.has(k) && !BY_BUILD.some((re) => re.test(k))) undeclared.push(`${who}: ${k}`);
      }
      expect(undeclared).toEqual([]);
    });
  }
});
