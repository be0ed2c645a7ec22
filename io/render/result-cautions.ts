import type { CheckResult } from '../../src/result/check-result.ts';

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

/** The one-line caution repeated on every sheet and page: the core lists it first. */
export function headlineCaution(result: CheckResult): string {
  return requireCautions(result)[0];
}
