import type { Finding } from '../../core/findings/finding.ts';
import { findingsWorstFirst } from '../severity-order.ts';
import type { NumberedFinding } from './findings-table.ts';

/** The graded findings worst first, numbered from 1; the notes (info) apart, numbered N1, N2, ... */
export function numberedFindings(findings: readonly Finding[]): { graded: NumberedFinding[]; notes: NumberedFinding[] } {
  const graded = findingsWorstFirst(findings.filter((f) => f.severity !== 'info')).map((finding, i) => ({ ref: String(i + 1), finding }));
  const notes = findings.filter((f) => f.severity === 'info').map((finding, i) => ({ ref: `N${i + 1}`, finding }));
  return { graded, notes };
}
