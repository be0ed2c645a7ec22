import { extname } from 'node:path';
import { decodeUtf8 } from '../core/input/decode-text.ts';
import { INPUT_LIMITS } from '../core/input/input-limits.ts';
import { parseSpecText, textFormatOf } from '../core/input/parse-spec-text.ts';
import { parseSpecWorkbook } from '../core/input/parse-spec-workbook.ts';
import type { ReadSpec } from '../core/input/read-spec-result.ts';
import { issue } from '../core/spec/input-issue.ts';
import { pathKind, readCapped } from './read-capped.ts';
import { workbookLimitIssues } from './workbook-limits.ts';

/**
 * Read a specification from YAML, JSON or (unless `workbooks` is false) a
 * fill-in workbook (.xlsx), by the file's extension; the file is only read,
 * and only a regular file within the input limits (INPUT_LIMITS).
 */
export async function readSpec(path: string, { workbooks = true } = {}): Promise<ReadSpec> {
  const fail = (...args: Parameters<typeof issue>): ReadSpec => ({ ok: false, issues: [issue(...args)] });
  const kind = await pathKind(path);
  if (kind === 'missing') return fail([], 'fileMissing', { path });
  if (kind === 'directory') return fail([], 'fileIsDirectory', { path });
  const workbook = workbooks && extname(path).toLowerCase() === '.xlsx';
  const format = textFormatOf(path);
  if (!workbook && !format) return fail([], 'fileKind', { path });
  const read = workbook ? await readCapped(path, INPUT_LIMITS.workbookBytes, 'a workbook (.xlsx)') : await readCapped(path, INPUT_LIMITS.textBytes, `a ${format} file`);
  if (!read.ok) return fail([], read.key, read.params);
  if (!workbook) {
    const decoded = decodeUtf8(read.bytes, path);
    return decoded.ok ? parseSpecText(decoded.text, format!, path) : { ok: false, issues: [decoded.issue] };
  }
  const limits = workbookLimitIssues(read.bytes, path);
  return limits.length ? { ok: false, issues: limits } : parseSpecWorkbook(read.bytes, path);
}
