import type { CheckResult } from '../../core/result/check-result.ts';

/**
 * Each cited source's number in the Sources section (1, 2, ...), in the
 * result's order: a dense table names a source by its number, which a reader
 * of the printed page finds in the numbered list, and HTML links it there.
 */
export function sourceNumbers(result: CheckResult): Map<string, number> {
  return new Map(result.sources.map((s, i) => [s.id, i + 1]));
}
