import { expect } from 'vitest';
import type { Finding } from '../../src/core/findings/finding.ts';
import { findingsOf, fractionHitting } from './fixtures.ts';

type Pick = (found: Finding[]) => Finding;

/**
 * Boundary case of a member rule: with utilisation_max set so that the limit
 * equals the governing value exactly, the finding passes; a hair lower, it fails.
 */
export async function expectUtilisationBoundary(rule: string, raw: unknown, pick: Pick): Promise<void> {
  const before = pick(await findingsOf(rule, raw));
  const capacity = before.limit!; // utilisation_max is 1 as shipped
  const u = fractionHitting(before.value!, capacity);
  const at = pick(await findingsOf(rule, raw, { utilisation_max: u }));
  expect(at.limit).toBe(before.value);
  expect(at.severity).toBe('pass');
  const over = pick(await findingsOf(rule, raw, { utilisation_max: u * 0.999 }));
  expect(over.severity).toBe('fail');
}

export const bySubject = (text: string): Pick => (found) => {
  const f = found.find((x) => x.subject.includes(text));
  if (!f) throw new Error(`no finding about ${text}: ${found.map((x) => x.subject).join(', ')}`);
  return f;
};
