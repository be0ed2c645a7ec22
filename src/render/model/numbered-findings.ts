import type { Finding } from '../../core/findings/finding.ts';
import { findingsWorstFirst } from '../severity-order.ts';
import type { NumberedFinding } from './findings-table.ts';
import { familyId } from './rule-families.ts';

/** The findings by rule family, families in the order the rules run, worst first within each. */
function byFamily(findings: readonly Finding[]): Finding[] {
  const order = [...new Set(findings.map((f) => familyId(f.rule)))];
  return order.flatMap((family) => findingsWorstFirst(findings.filter((f) => familyId(f.rule) === family)));
}

/**
 * The graded findings by family, worst first within a family, numbered from
 * 1; the notes (info) apart, numbered N1, N2, ...: one numbering for every
 * table, list and working that names a finding.
 */
export function numberedFindings(findings: readonly Finding[]): { graded: NumberedFinding[]; notes: NumberedFinding[] } {
  const graded = byFamily(findings.filter((f) => f.severity !== 'info')).map((finding, i) => ({ ref: String(i + 1), finding }));
  const notes = byFamily(findings.filter((f) => f.severity === 'info')).map((finding, i) => ({ ref: `N${i + 1}`, finding }));
  return { graded, notes };
}
