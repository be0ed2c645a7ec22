import { describe, expect, it } from 'vitest';
import type { Finding, Severity } from '../../src/core/findings/finding.ts';
import { worstFindings } from '../../src/core/review/worst-findings.ts';

// The three worst findings of a proposal, by severity then utilisation: the
// expectation is written out by hand for a small list.

function finding(rule: string, severity: Severity, utilisation: number | null): Finding {
  return { rule, severity, utilisation, code: 0, subject: rule, subject_label: rule, message_key: '', params: {}, message: '', value: null, unit: '', limit: null, combination: null, load_case: null, fix: '', sources: [], working: [], working_text: '' };
}

describe('the worst findings of a proposal', () => {
  it('are the worst severities first, the higher utilisation first within one, notes left out', () => {
    const list = [
      finding('a', 'pass', 0.95),
      finding('b', 'warning', 0.9),
      finding('c', 'info', null),
      finding('d', 'fail', 1.2),
      finding('e', 'warning', null),
      finding('f', 'warning', 0.97),
      finding('g', 'error', null),
    ];
    // error above fail above warning; among the warnings 0.97 before 0.9, and the one without a utilisation last.
    expect(worstFindings(list).map((f) => f.rule)).toEqual(['g', 'd', 'f']);
    expect(worstFindings(list, 6).map((f) => f.rule)).toEqual(['g', 'd', 'f', 'b', 'e', 'a']);
  });

  it('keep the check’s order where severity and utilisation tie, and show passes where nothing is worse', () => {
    const list = [finding('x', 'pass', 0.5), finding('y', 'pass', 0.5), finding('z', 'info', null), finding('w', 'pass', 0.7)];
    expect(worstFindings(list).map((f) => f.rule)).toEqual(['w', 'x', 'y']);
  });
});
