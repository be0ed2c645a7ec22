import type { RulesData } from '../data/rules-data.ts';
import { ModelGraph } from './model-graph.ts';
import { MODELS } from './models.ts';
import type { Finding } from '../findings/finding.ts';
import { renderTemplate } from '../format/template.ts';
import { CORE_MESSAGES } from '../diagnostics/core-messages.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { Rule } from './define-rule.ts';
import type { ReadTracer } from './read-tracer.ts';
import { ruleContext } from './rule-context.ts';

/** A rule that threw: an error finding with its id and the fault, so the other rules still run. */
export function errorFinding(rule: Rule, e: unknown): Finding {
  const reason = (e instanceof Error ? e.message : String(e)).split('\n')[0];
  const params = { rule: rule.id, reason };
  const working = [{ formula: `the rule stopped: ${reason}`, substituted: '', result: null, unit: '' }];
  return {
    rule: rule.id,
    code: CORE_MESSAGES.ruleFailed.code,
    severity: 'error',
    subject: 'rule',
    subject_label: rule.title,
    message_key: 'ruleFailed',
    params,
    message: renderTemplate(CORE_MESSAGES.ruleFailed.text, params),
    value: null,
    unit: '',
    limit: null,
    utilisation: null,
    combination: null,
    load_case: null,
    fix: 'This is a fault in the tool, not in the build: report it with the specification. The other rules ran.',
    sources: [],
    working,
    working_text: working[0].formula,
  };
}

/** Every rule's findings, in rule order; a rule that throws gives an error finding instead. */
export function runRules(
  rules: readonly Rule[],
  spec: CheckedSpecification,
  data: RulesData,
  graph: ModelGraph | { graph: ModelGraph } = new ModelGraph(MODELS, { spec, data, ride: true }),
  tracer?: ReadTracer,
): Finding[] {
  const models = graph instanceof ModelGraph ? graph : graph.graph;
  const out: Finding[] = [];
  for (const rule of rules) {
    const mine: Finding[] = [];
    tracer?.enter(`rule:${rule.id}`);
    try {
      rule.run(ruleContext(rule, spec, data, models, mine));
      out.push(...mine);
    } catch (e) {
      out.push(errorFinding(rule, e));
    } finally {
      tracer?.leave();
    }
  }
  return out;
}
