import { expect } from 'vitest';
import type { Finding, WorkingStep } from '../../src/core/findings/finding.ts';
import { literalText } from '../../src/core/format/template.ts';
import { RULES } from '../../src/core/rules/index.ts';
import type { RulesData } from '../../src/core/data/rules-data.ts';
import { findingsOf, fractionHitting, rulesData } from './fixtures.ts';

// Helpers of the member rules' tests, for findings in the defineRule shape:
// a stable subject id, the `utilisation` limit, working as steps.

type Pick = (found: Finding[]) => Finding;

/** The finding about one subject, by its stable id (`pole.root`, `wheel.spoke.strut`). */
export const bySubjectId = (id: string): Pick => (found) => {
  const f = found.find((x) => x.subject === id);
  if (!f) throw new Error(`no finding about ${id}: ${found.map((x) => x.subject).join(', ')}`);
  return f;
};

/** The working steps whose formula starts with `formula`, in order. */
export function stepsOf(f: Finding, formula: string): WorkingStep[] {
  return f.working.filter((s) => s.formula.startsWith(formula));
}

/** The one working step whose formula starts with `formula` after the governing line: the governing case's own. */
export function governingStep(f: Finding, formula: string): WorkingStep {
  const all = f.working;
  const caseTitle = f.params.case as string;
  const start = all.findIndex((s) => s.formula.startsWith(`${caseTitle} [`));
  if (start < 0) throw new Error(`no working for the case ${caseTitle}`);
  const s = all.slice(start + 1).find((x) => x.formula.startsWith(formula));
  if (!s) throw new Error(`no step ${formula} in the case ${caseTitle}`);
  return s;
}

/**
 * Boundary case of a member rule: with the hard level of `utilisation` set so
 * that the limit equals the governing value exactly, the finding passes; a
 * hair lower, it fails.
 */
export async function expectUtilisationBoundary(rule: string, raw: unknown, pick: Pick, data: RulesData = rulesData): Promise<void> {
  const before = pick(await findingsOf(rule, raw, {}, data));
  const capacity = before.limit!; // the hard level is 1 as shipped
  // The level whose limit equals the value, or, where no double times the capacity gives it exactly, the least above it.
  let u = fractionHitting(before.value!, capacity);
  while (u * capacity < before.value!) u += Number.EPSILON * u;
  const at = pick(await findingsOf(rule, raw, { 'utilisation.hard': u }, data));
  expect(at.limit! - before.value!).toBeGreaterThanOrEqual(0);
  expect(at.limit! - before.value!).toBeLessThanOrEqual(4 * Number.EPSILON * before.value!);
  expect(at.severity).toBe('pass');
  expect(at.utilisation!).toBeLessThanOrEqual(1);
  const over = pick(await findingsOf(rule, raw, { 'utilisation.hard': u * 0.999 }, data));
  expect(over.severity).toBe('fail');
  expect(over.message_key).toMatch(/[Oo]ver$/);
}

/** Every message template of the rule holds no number of its own. */
export function expectPlainTemplates(ruleId: string): void {
  const rule = RULES.find((r) => r.id === ruleId)!;
  for (const [key, m] of Object.entries(rule.messages)) expect(literalText(m.text), `${ruleId}.${key}`).not.toMatch(/\d/);
}
