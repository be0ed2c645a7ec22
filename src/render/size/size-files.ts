import type { SizeResult } from '../../core/size/size-run.ts';
import { renderHtml } from '../html/render-html.ts';
import { renderMarkdown } from '../markdown/render-markdown.ts';
import { proposedYaml } from './proposed-yaml.ts';
import { sizeDocument } from './size-document.ts';

// Every file of a sizing's output set, rendered before any is written.

export const SIZE_FILES = { md: 'size.md', html: 'size.html', json: 'size.json', proposed: 'size-proposed.yaml' } as const;

export function sizeFiles(r: SizeResult, input: { text: string | null; raw: unknown }): [string, string][] {
  const changes = r.members.filter((m) => m.found).flatMap((m) => m.sections);
  const proposed = changes.length ? SIZE_FILES.proposed : null;
  const doc = sizeDocument(r, { proposed });
  return [
    [SIZE_FILES.md, renderMarkdown(doc)],
    [SIZE_FILES.html, renderHtml(doc, new Map())],
    [SIZE_FILES.json, `${JSON.stringify(r, null, 2)}\n`],
    ...(proposed ? [[SIZE_FILES.proposed, proposedYaml(input.text, input.raw, changes)] as [string, string]] : []),
  ];
}
