import type { CheckResult } from '../core/result/check-result.ts';
import { SHORT_CAUTION } from '../core/cautions.ts';

/**
 * The cautions the core supplied. A report without them must not go out, so
 * an empty list is an error rather than a silent omission.
 */
export function requireCautions(result: CheckResult): string[] {
  const cautions = result.cautions.filter((c) => c.trim() !== '');
  if (cautions.length === 0) {
    throw new Error('check result carries no cautions; refusing to render a report without them');
  }
  return cautions;
}

/**
 * The core's one-line caution, repeated on every sheet and at the end of the
 * report beside the full cautions of the result (which must be present).
 */
export function headlineCaution(result: CheckResult): string {
  requireCautions(result);
  return SHORT_CAUTION;
}
