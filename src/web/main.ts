// The workbench page: the form on the left, the answer on the right. Every
// edit is kept in the YAML document the build came from (comments and layout
// survive a save), stored in the browser so a reload finds it, and checked by
// the worker; the last valid answer stays on screen while the form is wrong.
import { Document, parseDocument } from 'yaml';
import { parseSpecText, textFormatOf } from '../core/input/parse-spec-text.ts';
import type { DecisiveInput } from '../core/decisive/decisive-input.ts';
import { pathText, type InputIssue, type KeyPath } from '../core/spec/input-issue.ts';
import { CAUTIONS } from '../core/cautions.ts';
import choices from 'axletree:choices';
import demoText from 'axletree:demo-spec';
import workerSource from 'axletree:worker-source';
import { crewPlan } from './crew-plan.ts';
import { el } from './dom.ts';
import { formSections } from './form-model.ts';
import { renderForm, showIssues } from './form-view.ts';
import type { FromWorker, ResultView, ToWorker } from './messages.ts';
import { decisiveView, figuresView, findingsView, legendView, picturesView, verdictView, type Shown } from './result-view.ts';
import { putAt } from './spec-path.ts';

const STORE = 'axletree.workbench.build';
const sections = formSections();

// --- the build being edited --------------------------------------------------
// The build `axletree serve` was given, else the one kept from the last visit, else the demo.
const slot = document.getElementById('axletree-initial')?.textContent?.trim();
const initial = slot ? (JSON.parse(slot) as { name: string; text: string }) : undefined;
/** What is kept between visits: the build as edited, and the text it started from (a served build that changed on disk wins). */
interface Kept {
  name: string;
  from: string;
  text: string;
}
const kept = ((): Kept | undefined => {
  try {
    return JSON.parse(localStorage.getItem(STORE) ?? '') as Kept;
  } catch {
    return undefined;
  }
})();
const startedFrom = initial?.text ?? kept?.from ?? demoText;
let sourceText = kept && kept.from === startedFrom ? kept.text : startedFrom;
let doc: Document = parseDocument(sourceText);
let spec = (doc.toJS() ?? {}) as Record<string, unknown>;
let edited = false;
let fileName = (initial?.name ?? kept?.name ?? 'build.yaml').replace(/\.(json|xlsx)$/i, '.yaml');

let origin = startedFrom;
const currentText = () => (edited ? doc.toString() : sourceText);
const keep = () => localStorage.setItem(STORE, JSON.stringify({ name: fileName, from: origin, text: currentText() } satisfies Kept));

// --- the worker ------------------------------------------------------------------
const workerUrl = URL.createObjectURL(new Blob([workerSource], { type: 'text/javascript' }));
const worker = new Worker(workerUrl);
let nextId = 1;
let latestCheck = 0;
const ask = (m: ToWorker) => worker.postMessage(m);
/** The decisive-input search in a worker of its own, started when first asked: its seconds of re-runs never hold an edit's check. */
let searcher: Worker | undefined;
const askSearcher = (m: ToWorker) => {
  if (!searcher) {
    searcher = new Worker(workerUrl);
    searcher.onmessage = fromWorker;
  }
  searcher.postMessage(m);
};

let shown: Shown | null = null;
/** The check whose answer is shown. */
let shownId = 0;
let baseline: ResultView | null = null;
/** The drawings and plots, parsed once when they arrive and moved from draw to draw. */
let picturesNode: HTMLElement = picturesView([], []);
let issues: InputIssue[] = [];
let decisive: DecisiveInput[] | null = null;
let decisiveBusy = false;
/** When the last edit was made, for the time to the verdict shown on the page. */
let editedAt = 0;

// Sent at once, with no wait to gather a burst of keys: the worker takes the newest change each time it is free and
// drops those it overtook, so a burst costs at most the one check already running (and keys typed by hand come
// further apart than any short wait would gather).
function check(): void {
  latestCheck = nextId++;
  ask({ type: 'check', id: latestCheck, raw: structuredClone(spec) });
}

// --- the page ---------------------------------------------------------------------
const formHost = el('div', { id: 'form-host' });
const resultHost = el('div', { id: 'result-host', 'aria-busy': 'true' }, el('p', { text: 'Checking…' }));
const status = el('p', { id: 'status', role: 'status', 'aria-live': 'polite' });

function drawForm(): void {
  const form = renderForm(sections, {
    spec: () => spec,
    onEdit: (path, value) => edit(path, value),
    onRows: (path, rows) => {
      putAt(spec, path, rows);
      doc.setIn(path, doc.createNode(rows));
      changed();
      drawForm();
    },
    choices: (t) => choices[t],
  });
  formHost.replaceChildren(form);
  showIssues(form, issues);
}

function edit(path: KeyPath, value: unknown): void {
  putAt(spec, path, value);
  if (value === undefined) doc.deleteIn(path);
  else doc.setIn(path, value);
  changed();
}

function changed(): void {
  edited = true;
  editedAt = performance.now();
  keep();
  decisive = null;
  check();
}

const staleText = () => (issues.length ? `The form has ${issues.length} problem${issues.length === 1 ? '' : 's'} (marked at the fields); the answer below is for the last valid build.` : null);

/**
 * A new answer's verdict in place of the one shown, at once; the findings, figures and the rest follow in the
 * next task (drawResult), marked busy meanwhile: building them takes a page some tens of milliseconds.
 */
function drawVerdict(): void {
  const old = resultHost.querySelector('#verdict');
  if (!shown || !old) return drawResult();
  old.replaceWith(verdictView(shown, staleText()));
  resultHost.setAttribute('aria-busy', 'true');
  const drawn = shown;
  setTimeout(() => {
    if (shown === drawn) drawResult();
  }, 0);
}

function drawResult(): void {
  if (!shown) return;
  const stale = staleText();
  const plan = crewPlan(spec, (path, v) => {
    edit(path, v);
    const input = document.getElementById(`f-${path.join('.')}`) as HTMLInputElement | null;
    if (input) input.value = String(v);
  });
  resultHost.replaceChildren(
    verdictView(shown, stale),
    legendView(shown.result),
    ...(plan ? [plan] : []),
    picturesNode,
    findingsView(shown.result, baseline),
    figuresView(shown.result, baseline),
    decisiveView(decisive, decisiveBusy),
    el('section', { id: 'cautions' }, el('h2', { text: 'Cautions' }), el('ul', {}, ...CAUTIONS.map((c) => el('li', { text: c })))),
  );
  resultHost.setAttribute('aria-busy', String(shown.stage === 'statics'));
  // The whole answer drawn, the findings included (the bench times it beside the verdict).
  document.body.dataset.drawn = `${shownId}-${shown.stage}`;
}

function fromWorker(e: MessageEvent<FromWorker>): void {
  const m = e.data;
  if (m.type === 'result') {
    if (m.id < latestCheck) return;
    issues = [];
    const form = formHost.querySelector('form');
    if (form) showIssues(form, issues);
    shown = { result: m.result, stage: m.stage, ms: m.ms };
    shownId = m.id;
    drawVerdict();
    if (editedAt) status.textContent = `Verdict ${m.stage === 'statics' ? '(statics)' : '(with the ride)'} ${Math.round(performance.now() - editedAt)} ms after the last edit.`;
    document.body.dataset.stage = m.stage;
    document.body.dataset.checked = String(m.id);
  } else if (m.type === 'pictures') {
    if (m.id < latestCheck) return;
    const fresh = picturesView(m.drawings, m.plots);
    picturesNode.replaceWith(fresh);
    picturesNode = fresh;
    document.body.dataset.pictures = `${m.id}-${m.stage}`;
  } else if (m.type === 'invalid') {
    if (m.id < latestCheck) return;
    issues = m.issues;
    const form = formHost.querySelector('form');
    if (form) showIssues(form, issues);
    drawResult();
    status.textContent = `The build has ${issues.length} problem${issues.length === 1 ? '' : 's'}: ${issues.slice(0, 3).map((i) => `${pathText(i.path)}: ${i.message}`).join('; ')}`;
    document.body.dataset.checked = String(m.id);
  } else if (m.type === 'decisive') {
    decisive = m.inputs;
    decisiveBusy = false;
    drawResult();
  } else if (m.type === 'file') {
    download(m.name, m.mime, m.data);
  } else if (m.type === 'opened') {
    load(new Document(m.raw).toString(), m.name);
  } else if (m.type === 'not-opened') {
    status.textContent = `${m.name} could not be opened: ${m.problems.slice(0, 3).join('; ')}`;
  } else {
    decisiveBusy = false;
    status.textContent = `The worker could not do that: ${m.message}`;
  }
}
worker.onmessage = fromWorker;

// --- files -------------------------------------------------------------------------
function download(name: string, mime: string, data: string | Uint8Array): void {
  const a = el('a', { href: URL.createObjectURL(new Blob([data as BlobPart], { type: mime })), download: name });
  document.body.append(a);
  a.click();
  a.remove();
}

function load(text: string, name: string): void {
  const format = textFormatOf(name) ?? 'YAML';
  const read = parseSpecText(text, format, name);
  if (!read.ok) {
    status.textContent = `${name} could not be read: ${read.issues.slice(0, 3).map((i) => `${i.at ? `line ${i.at.line}, column ${i.at.column}: ` : ''}${i.message}`).join('; ')}`;
    return;
  }
  sourceText = text;
  origin = text;
  doc = format === 'JSON' ? new Document(read.raw) : parseDocument(text);
  spec = (read.raw ?? {}) as Record<string, unknown>;
  edited = format === 'JSON';
  fileName = name.replace(/\.(json|xlsx)$/i, '.yaml');
  keep();
  issues = [];
  baseline = null;
  decisive = null;
  drawForm();
  status.textContent = `Opened ${name}.`;
  check();
}

async function open(file: File): Promise<void> {
  if (/\.xlsx$/i.test(file.name)) return ask({ type: 'open-workbook', id: nextId++, name: file.name, bytes: new Uint8Array(await file.arrayBuffer()) });
  load(await file.text(), file.name);
}

// --- the toolbar ---------------------------------------------------------------------
function button(label: string, id: string, act: () => void): HTMLButtonElement {
  const b = el('button', { type: 'button', id, text: label });
  b.addEventListener('click', act);
  return b;
}
const picker = el('input', { type: 'file', id: 'open-file', accept: '.yaml,.yml,.json,.xlsx', class: 'visually-hidden', 'aria-label': 'Open a build (YAML, JSON or fill-in workbook)' });
picker.addEventListener('change', () => {
  const f = picker.files?.[0];
  if (f) void open(f);
  picker.value = '';
});
const toolbar = el(
  'nav',
  { 'aria-label': 'Workbench' },
  el('label', { for: 'open-file', class: 'button', text: 'Open a build…' }),
  picker,
  button('Save as YAML', 'save-yaml', () => download(fileName, 'application/yaml', currentText())),
  button('Download the report', 'get-report', () => ask({ type: 'file', id: nextId++, kind: 'report' })),
  button('Download the result workbook', 'get-workbook', () => ask({ type: 'file', id: nextId++, kind: 'workbook' })),
  button('Pin as baseline', 'pin', () => {
    baseline = shown?.result ?? null;
    status.textContent = baseline ? 'Pinned: every figure and finding now shows its change from this build.' : '';
    drawResult();
  }),
  button('Clear the baseline', 'unpin', () => {
    baseline = null;
    drawResult();
  }),
  button('Find decisive inputs', 'find-decisive', () => {
    decisiveBusy = true;
    drawResult();
    askSearcher({ type: 'decisive', id: nextId++, raw: spec });
  }),
  button('Print the summary', 'print', () => window.print()),
  button('Start again from the demo', 'reset', () => load(demoText, 'demo-two-crew.yaml')),
);

document.addEventListener('dragover', (e) => e.preventDefault());
document.addEventListener('drop', (e) => {
  e.preventDefault();
  const f = e.dataTransfer?.files[0];
  if (f) void open(f);
});

document.body.append(
  el('header', {}, el('h1', { text: 'axletree workbench' }), el('p', { class: 'caution', text: CAUTIONS[0] }), toolbar, status),
  el('main', {}, el('section', { id: 'build', 'aria-label': 'The build' }, el('h2', { text: 'The build' }), formHost), el('section', { id: 'answer', 'aria-label': 'The answer' }, resultHost)),
);
drawForm();
check();
