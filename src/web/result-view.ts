// The answer as DOM: the verdict (word and mark, never colour alone), what
// each severity means, which stage it is (statics, or with the ride), the
// findings with their working on demand, the figures with the change from a
// pinned baseline, the decisive inputs when asked for, the drawings and plots.
import { compareFigures } from '../core/compare/figure-diff.ts';
import { findingKey } from '../core/compare/finding-diff.ts';
import type { DecisiveInput } from '../core/decisive/decisive-input.ts';
import { SEVERITIES, type Severity } from '../core/findings/severity.ts';
import { formatNumber } from '../core/format/number-format.ts';
import { markedSeverity } from '../render/severity-palette.ts';
import { el, svgNode } from './dom.ts';
import type { Picture, ResultView } from './messages.ts';

export interface Shown {
  result: ResultView;
  stage: 'statics' | 'full';
  ms: number;
}

const badge = (s: Severity) => el('span', { class: `sev sev-${s}`, text: markedSeverity(s) });

export function verdictView(shown: Shown, stale: string | null): HTMLElement {
  const r = shown.result;
  const counts = SEVERITIES.map((s) => [s, r.findings.filter((f) => f.severity === s).length] as const).filter(([, n]) => n > 0);
  const stage = shown.stage === 'statics' ? 'statics only: the ride cases are running' : 'complete: statics and the ride cases';
  return el(
    'section',
    { id: 'verdict', 'aria-live': 'polite', 'data-verdict': r.verdict, 'data-stage': shown.stage },
    el('h2', {}, 'Verdict: ', badge(r.verdict)),
    el('p', { class: 'verdict-meaning', text: r.severity_meanings[r.verdict] }),
    el('p', { class: 'stage', text: `${r.spec_name}. Check ${stage} (${formatNumber(shown.ms, 'ms', 2)} ms).` }),
    r.provisional.length ? el('p', { class: 'provisional', text: `Provisional: ${r.provisional.join('; ')}` }) : null,
    stale ? el('p', { class: 'stale', role: 'status', text: stale }) : null,
    el('p', { class: 'counts', text: counts.map(([s, n]) => `${n} ${s}`).join(', ') }),
  );
}

export function legendView(r: ResultView): HTMLElement {
  return el('details', { id: 'legend' }, el('summary', { text: 'What each severity means' }), el('dl', {}, ...SEVERITIES.flatMap((s) => [el('dt', {}, badge(s)), el('dd', { text: r.severity_meanings[s] })])));
}

export function findingsView(r: ResultView, base: ResultView | null): HTMLElement {
  const before = new Map(base?.findings.map((f) => [findingKey(f), f.severity]) ?? []);
  const rows = r.findings
    .filter((f) => f.severity !== 'info' && f.severity !== 'pass')
    .concat(r.findings.filter((f) => f.severity === 'pass' || f.severity === 'info'))
    .map((f) => {
      const was = before.get(findingKey(f));
      const change = base ? (was === undefined ? 'new' : was === f.severity ? '' : `was ${was}`) : '';
      return el(
        'tr',
        { 'data-rule': f.rule, 'data-severity': f.severity },
        el('td', {}, badge(f.severity)),
        el('td', {}, el('code', { text: f.rule }), el('br'), el('span', { text: f.subject_label })),
        el('td', {}, el('span', { text: f.message }), f.working_text ? el('details', { class: 'working' }, el('summary', { text: 'Working' }), el('pre', { text: f.working_text })) : null, f.fix && f.severity !== 'pass' && f.severity !== 'info' ? el('p', { class: 'fix', text: `What to do: ${f.fix}` }) : null),
        base ? el('td', { class: 'change', text: change }) : null,
      );
    });
  return el(
    'section',
    { id: 'findings' },
    el('h2', { text: 'Findings' }),
    el('table', {}, el('thead', {}, el('tr', {}, el('th', { scope: 'col', text: 'Severity' }), el('th', { scope: 'col', text: 'Rule and subject' }), el('th', { scope: 'col', text: 'Finding' }), base ? el('th', { scope: 'col', text: 'Against the baseline' }) : null)), el('tbody', {}, ...rows)),
  );
}

export function figuresView(r: ResultView, base: ResultView | null): HTMLElement {
  const cmp = compareFigures(base ? [base, r] : [r]);
  const rows = cmp.map((c) => {
    const now = base ? c.values[1] : c.values[0];
    const na = base ? c.not_applicable[1] : c.not_applicable[0];
    return el(
      'tr',
      { 'data-figure': c.name },
      el('th', { scope: 'row', text: c.name.replace(/_/g, ' ') }),
      el('td', { class: 'num', text: now === null ? `not applicable: ${na ?? ''}` : `${formatNumber(now, c.unit)} ${c.unit}` }),
      base ? el('td', { class: 'num', text: c.values[0] === null ? '—' : formatNumber(c.values[0], c.unit) }) : null,
      base ? el('td', { class: 'num', text: c.difference[1] === null ? '—' : `${c.difference[1] > 0 ? '+' : ''}${formatNumber(c.difference[1], c.unit)}` }) : null,
    );
  });
  return el(
    'details',
    { id: 'figures', open: base !== null },
    el('summary', { text: base ? 'Figures, with the change from the pinned baseline' : 'Figures' }),
    el('table', {}, el('thead', {}, el('tr', {}, el('th', { scope: 'col', text: 'Figure' }), el('th', { scope: 'col', text: 'Now' }), base ? el('th', { scope: 'col', text: 'Baseline' }) : null, base ? el('th', { scope: 'col', text: 'Change' }) : null)), el('tbody', {}, ...rows)),
  );
}

export function decisiveView(inputs: readonly DecisiveInput[] | null, busy: boolean): HTMLElement {
  const body = busy
    ? el('p', { role: 'status', text: 'Searching: the check is re-run many times (a few seconds).' })
    : inputs === null
      ? el('p', { text: 'The inputs the verdict hangs on, and how far each may move before a finding changes severity: press "Find decisive inputs".' })
      : el(
          'table',
          {},
          el('thead', {}, el('tr', {}, ...['Finding', 'Input', 'Status', 'Value', 'Break-even', 'Change'].map((h) => el('th', { scope: 'col', text: h })))),
          el('tbody', {}, ...inputs.map((d) => el('tr', {}, el('td', {}, badge(d.severity), ` ${d.rule}`), el('td', {}, el('code', { text: d.input })), el('td', { text: d.status }), el('td', { class: 'num', text: `${formatNumber(d.value, d.unit)} ${d.unit}` }), el('td', { class: 'num', text: d.break_even === null ? (d.reason ?? '') : `${formatNumber(d.break_even, d.unit)} ${d.unit} (${d.to_severity})` }), el('td', { class: 'num', text: d.change === null ? '' : `${d.change > 0 ? '+' : ''}${formatNumber(d.change * 100, '%', 2)} %` })))),
        );
  return el('section', { id: 'decisive' }, el('h2', { text: 'Decisive inputs' }), body);
}

export function picturesView(drawings: readonly Picture[], plots: readonly Picture[]): HTMLElement {
  const figure = (p: Picture, kind: string) => el('figure', { class: kind, 'data-id': p.id }, svgNode(p.svg), el('figcaption', { text: p.title }));
  return el('section', { id: 'pictures' }, el('h2', { text: 'Drawings and plots' }), ...drawings.map((d) => figure(d, 'drawing')), ...plots.map((p) => figure(p, 'plot')));
}
