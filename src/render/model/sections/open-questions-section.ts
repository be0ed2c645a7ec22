import type { DecisiveInput } from '../../../core/decisive/decisive-input.ts';
import type { CheckResult } from '../../../core/result/check-result.ts';
import { formatNumber, formatQuantity } from '../../../core/format/number-format.ts';
import { formatPercent } from '../../../core/format/number-format.ts';
import type { Run, Section } from '../document.ts';
import { code, plain, strong } from '../runs.ts';
import { section } from '../section-titles.ts';
import { nearness, STATUS_WORDS } from './decisive-section.ts';

/** How many decisive inputs the summary names, nearest first; how many other defaults it names in each group. */
const NAMED_DECISIVE = 4;
const NAMED_PER_GROUP = 3;

const count = (n: number) => formatNumber(n, 'count');

/** Each default or remembered input that moves a decisive finding, once, at its nearest break-even. */
function unsureDecisive(list: readonly DecisiveInput[]): DecisiveInput[] {
  const unsure = list.filter((d) => d.status !== 'given' && d.break_even !== null).sort((a, b) => nearness(a) - nearness(b));
  return unsure.filter((d, i) => unsure.findIndex((e) => e.input === d.input) === i);
}

function decisiveItem(d: DecisiveInput): Run[] {
  const to = d.to_severity === null ? '' : ` to ${d.to_severity.toUpperCase()}`;
  return [
    code(d.input),
    plain(` (${STATUS_WORDS[d.status]}, ${formatQuantity(d.value, d.unit)}): ${d.rule} on ${d.subject} changes${to} at ${formatQuantity(d.break_even, d.unit)} (${formatPercent(d.change)}).`),
  ];
}

/** The group a specification path belongs to: its first part ("crew[1].cg_height_mm" is in "crew"). */
const groupOf = (path: string) => path.split(/[.[]/)[0];

/** The other defaults, by group: a few named, the rest counted. */
function defaultItems(result: CheckResult, named: ReadonlySet<string>): Run[][] {
  const defaults = result.spec_as_checked.filter((e) => e.defaulted && !named.has(e.path.replace(/\[(\d+)\]/g, '.$1')));
  const groups = [...new Set(defaults.map((e) => groupOf(e.path)))];
  return groups.map((g) => {
    // The group's name is said once, before its paths.
    const paths = defaults.filter((e) => groupOf(e.path) === g).map((e) => e.path.slice(g.length).replace(/^\./, '') || e.path);
    const more = paths.length > NAMED_PER_GROUP ? ` and ${count(paths.length - NAMED_PER_GROUP)} more` : '';
    return [strong(`${g}:`), plain(` ${paths.slice(0, NAMED_PER_GROUP).join(', ')}${more}.`)];
  });
}

/** How many graded findings rest in part on a value recalled, not read in a printed source. */
function rememberedItem(result: CheckResult): Run[][] {
  const graded = result.findings.filter((f) => f.severity !== 'info');
  const remembered = graded.filter((f) => f.sources.includes('from-memory')).length;
  if (remembered === 0) return [];
  return [[plain(`${count(remembered)} of ${count(graded.length)} graded findings rest in part on data values recalled from memory (source "from-memory"); the working in the appendix names each value and its file under rules/.`)]];
}

/**
 * What the builder has to answer before the verdict can be relied on: the
 * defaults and remembered values the decisive findings hang on (nearest to
 * changing one first), then the other defaults the check assumed, by group.
 */
export function openQuestionsSection(result: CheckResult): Section {
  const decisive = unsureDecisive(result.decisive_inputs ?? []).slice(0, NAMED_DECISIVE);
  const defaults = defaultItems(result, new Set(decisive.map((d) => d.input)));
  const blocks = [
    ...(decisive.length === 0 ? [] : [{ kind: 'paragraph' as const, runs: [strong('Confirm first'), plain(': defaults and remembered values a decisive finding hangs on, nearest to changing it first.')] }, { kind: 'list' as const, items: decisive.map(decisiveItem) }]),
    ...(defaults.length === 0 ? [] : [{ kind: 'paragraph' as const, runs: [strong('Also assumed'), plain(': values the specification left out, which the check took by default (listed in full in the appendix, "Spec as checked").')] }, { kind: 'list' as const, items: defaults }]),
    ...rememberedItem(result).map((runs) => ({ kind: 'paragraph' as const, runs })),
  ];
  return section('openQuestions', blocks.length ? blocks : [{ kind: 'paragraph', runs: [plain('The specification gives every value the check used, and no decisive finding hangs on a remembered value.')] }]);
}
