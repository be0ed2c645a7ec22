import type { Block, FindingBlock, Run } from './document.ts';
import { badge, paragraph, plain, sourceRef, strong } from './runs.ts';

/**
 * A finding block as a heading and plain blocks, the same for every text
 * output: the message, the fix, the sources by id (their entries are in the
 * Sources section), and the working step by step.
 */
export function findingParts(b: FindingBlock): { title: Run[]; body: Block[] } {
  const sources = b.sources.length === 0 ? [plain('none cited')] : b.sources.flatMap((id, i) => (i === 0 ? [sourceRef(id)] : [plain(', '), sourceRef(id)]));
  return {
    title: [plain(`${b.ref}. `), badge(b.severity), plain(` ${b.rule}: ${b.subject_label}`)],
    body: [
      paragraph(b.message),
      paragraph(strong('Fix:'), ` ${b.fix}`),
      paragraph(strong('Sources:'), ' ', ...sources),
      ...(b.steps.length ? [{ kind: 'working', steps: b.steps } as const] : []),
    ],
  };
}
