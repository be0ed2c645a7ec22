// A floor-test record as CSV: a header row naming the columns, then one row per
// sample. time_s and displacement_mm are read, other columns ignored. Lines
// starting with # are comments (a record can say where it came from), blank
// lines are skipped. Fields are comma-separated and may be double-quoted.

import type { DropRecord } from '../core/floor-test/floor-test-types.ts';
import { issue, type InputIssue } from '../core/spec/input-issue.ts';
import type { MessageKey } from '../core/diagnostics/messages.ts';
import type { Located } from '../core/input/read-spec-result.ts';
import { INPUT_LIMITS } from '../core/input/input-limits.ts';
import { pathKind, readCapped } from './read-capped.ts';

export const TIME_COLUMN = 'time_s';
export const DISPLACEMENT_COLUMN = 'displacement_mm';
/** Fewest samples the estimator can work with. */
export const MIN_SAMPLES = 20;
/** Problems listed before the reader stops. */
const MAX_ISSUES = 10;

export type CsvIssue = InputIssue & { at?: Located };
export type ReadDrop = { ok: true; record: DropRecord; ignored: string[] } | { ok: false; issues: CsvIssue[] };

/** The record in a CSV file: a regular file within the size limit (a pipe or a device is refused, never waited on). */
export async function readDropCsvFile(path: string): Promise<ReadDrop> {
  const kind = await pathKind(path);
  if (kind === 'missing') return fail('fileMissing', { path });
  if (kind === 'directory') return fail('fileUnreadable', { path, reason: 'it is a directory' });
  const read = await readCapped(path, INPUT_LIMITS.csvBytes, 'a floor-test record (.csv)');
  if (!read.ok) return fail(read.key, read.params);
  return parseDropCsv(read.bytes.toString('utf8'), path);
}

export function parseDropCsv(text: string, path = 'input'): ReadDrop {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  const rows = lines.map((line, i) => ({ n: i + 1, line })).filter(({ line }) => line.trim() !== '' && !line.trimStart().startsWith('#'));
  if (rows.length === 0) return fail('floorCsvEmpty', { path });
  const [head, ...body] = rows;
  const header = splitFields(head.line);
  const names = header.map((f) => f.text.trim());
  const issues: CsvIssue[] = [];
  const at = (line: number, column: number) => ({ line, column });
  const columnOf = (name: string): number => {
    const found = names.flatMap((n, i) => (n === name ? [i] : []));
    if (found.length === 0) issues.push(located('floorCsvColumn', { column: name, found: names.join(', ') || 'nothing' }, at(head.n, 1)));
    if (found.length > 1) issues.push(located('floorCsvTwice', { column: name }, at(head.n, header[found[1]].column)));
    return found[0] ?? -1;
  };
  const ti = columnOf(TIME_COLUMN);
  const xi = columnOf(DISPLACEMENT_COLUMN);
  if (issues.length) return { ok: false, issues };

  const t_s: number[] = [];
  const x_mm: number[] = [];
  let previous: { value: number; line: number } | undefined;
  for (const { n, line } of body) {
    if (issues.length >= MAX_ISSUES) break;
    const fields = splitFields(line);
    if (fields.length !== header.length) {
      issues.push(located('floorCsvFields', { count: fields.length, expected: header.length }, at(n, 1)));
      continue;
    }
    const number = (k: number, name: string): number | undefined => {
      const raw = fields[k].text.trim();
      const v = raw === '' ? NaN : Number(raw);
      if (Number.isFinite(v)) return v;
      issues.push(located('floorCsvNumber', { column: name, value: raw }, at(n, fields[k].column)));
      return undefined;
    };
    const t = number(ti, TIME_COLUMN);
    const x = number(xi, DISPLACEMENT_COLUMN);
    if (t === undefined || x === undefined) continue;
    if (previous && !(t > previous.value)) {
      issues.push(located('floorCsvTime', { value: t, previous: previous.value, previousLine: previous.line }, at(n, fields[ti].column)));
      continue;
    }
    previous = { value: t, line: n };
    t_s.push(t);
    x_mm.push(x);
  }
  if (issues.length) return { ok: false, issues };
  if (t_s.length < MIN_SAMPLES) return fail('floorCsvShort', { path, count: t_s.length, min: MIN_SAMPLES });
  return { ok: true, record: { t_s, x_mm }, ignored: names.filter((_, i) => i !== ti && i !== xi) };
}

/** Fields with the 1-based column where each starts; "" inside quotes is one quote. */
function splitFields(line: string): { text: string; column: number }[] {
  const fields: { text: string; column: number }[] = [];
  let i = 0;
  for (;;) {
    const column = i + 1;
    let text = '';
    if (line[i] === '"') {
      i++;
      while (i < line.length) {
        if (line[i] === '"' && line[i + 1] === '"') {
          text += '"';
          i += 2;
        }
        else if (line[i] === '"') {
          i++;
          break;
        } else text += line[i++];
      }
      while (i < line.length && line[i] !== ',') text += line[i++];
    } else {
      while (i < line.length && line[i] !== ',') text += line[i++];
    }
    fields.push({ text, column });
    if (i >= line.length) return fields;
    i++; // the comma
  }
}

function located(key: MessageKey, params: Record<string, string | number>, at: Located): CsvIssue {
  return { ...issue([], key, params), at };
}

function fail(key: MessageKey, params: Record<string, string | number>): ReadDrop {
  return { ok: false, issues: [issue([], key, params)] };
}
