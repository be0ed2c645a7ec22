import type { CompareResult } from '../core/compare/compare-result.ts';
import type { CheckResult } from '../core/result/check-result.ts';
import { comparedDrawingFile, comparedDrawings } from '../render/compare/compare-drawings.ts';
import { compareDocument } from '../render/compare/compare-document.ts';
import { renderCompareWorkbook } from '../render/compare/compare-workbook.ts';
import { nativeDeflateRaw } from './native-deflate.ts';
import { renderHtml } from '../render/html/render-html.ts';
import { renderMarkdown } from '../render/markdown/render-markdown.ts';
import { join } from 'node:path';
import { ensureNotSame } from './atomic-write.ts';
import { writeFileSet } from './write-file-set.ts';

export const COMPARE_FILES = { markdown: 'compare.md', html: 'compare.html', workbook: 'compare.xlsx', json: 'compare.json' } as const;

export function compareJson(c: CompareResult): string {
  return JSON.stringify(c, null, 2) + '\n';
}

/**
 * The comparison's outputs rendered first, then written as one set: the
 * report (compare.md, with each build's drawings beside it; compare.html
 * with them inline), the workbook and compare.json. No input is written to.
 */
export async function writeCompare(c: CompareResult, results: readonly CheckResult[], dir: string, inputs: readonly string[]): Promise<string[]> {
  const drawn = comparedDrawings(results);
  const doc = compareDocument(c, results, drawn);
  const files: [string, string | Uint8Array][] = [
    [COMPARE_FILES.markdown, renderMarkdown(doc)],
    [COMPARE_FILES.html, renderHtml(doc, new Map())],
    [COMPARE_FILES.workbook, await renderCompareWorkbook(doc, `${c.tool.name} ${c.tool.version}`, nativeDeflateRaw)],
    [COMPARE_FILES.json, compareJson(c)],
    ...drawn.builds.flatMap((list, i) => list.map((d): [string, string] => [comparedDrawingFile(c.builds[i].label, d.id), `${d.svg.trim()}\n`])),
  ];
  // writeFileSet guards the first input; the others are guarded here, before anything is written.
  for (const input of inputs.slice(1)) for (const [name] of files) ensureNotSame(input, join(dir, name));
  return writeFileSet(dir, files, inputs[0]);
}
