import { readFile, stat } from 'node:fs/promises';
import { extname } from 'node:path';
import { parseSpecText, textFormatOf } from '../core/input/parse-spec-text.ts';
import { parseSpecWorkbook } from '../core/input/parse-spec-workbook.ts';
import type { ReadSpec } from '../core/input/read-spec-result.ts';
import { issue } from '../core/spec/input-issue.ts';

/**
 * Read a specification from YAML, JSON or (unless `workbooks` is false) a
 * fill-in workbook (.xlsx), by the file's extension; the file is only read.
 */
export async function readSpec(path: string, { workbooks = true } = {}): Promise<ReadSpec> {
  const fail = (...args: Parameters<typeof issue>): ReadSpec => ({ ok: false, issues: [issue(...args)] });
  const info = await stat(path).catch(() => undefined);
  if (!info) return fail([], 'fileMissing', { path });
  if (info.isDirectory()) return fail([], 'fileIsDirectory', { path });
  const workbook = workbooks && extname(path).toLowerCase() === '.xlsx';
  const format = textFormatOf(path);
  if (!workbook && !format) return fail([], 'fileKind', { path });
  let bytes: Buffer;
  try {
    bytes = await readFile(path);
  } catch (e) {
    return fail([], 'fileUnreadable', { path, reason: (e as Error).message });
  }
  return workbook ? parseSpecWorkbook(bytes, path) : parseSpecText(bytes.toString('utf8'), format!, path);
}
