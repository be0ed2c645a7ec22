// The form as DOM: a fieldset per section, a labelled control per field with
// its unit, range, default and help tied to it (aria-describedby), tables for
// the lists with rows to add and remove. Every control reports its edits
// through onEdit; issues from the check are shown at their fields.
import type { Field } from '../core/spec/spec-fields.ts';
import type { InputIssue, KeyPath } from '../core/spec/input-issue.ts';
import { el } from './dom.ts';
import { textOfValue, valueOfText } from './field-input.ts';
import { rangeText, type FormSection, type FormTable } from './form-model.ts';
import { controlId, getAt } from './spec-path.ts';

export interface FormHooks {
  /** The spec as plain data, read for the values shown. */
  spec: () => Record<string, unknown>;
  onEdit: (path: KeyPath, value: unknown) => void;
  /** A row added to or removed from a list: the form is drawn again. */
  onRows: (path: KeyPath, rows: unknown[]) => void;
  choices: (table: NonNullable<Field['choices']>) => string[];
}

function control(path: KeyPath, f: Field, hooks: FormHooks, labelled: string): HTMLElement {
  const id = controlId(path);
  const value = getAt(hooks.spec(), path);
  const described = `${id}-help ${id}-msg`;
  const common = { id, name: path.join('.'), 'aria-describedby': described, 'aria-labelledby': labelled };
  const edit = (text: string) => hooks.onEdit(path, valueOfText(text, f));
  if (f.type === 'boolean') {
    const box = el('input', { ...common, type: 'checkbox', checked: value === true });
    box.addEventListener('change', () => hooks.onEdit(path, box.checked));
    return box;
  }
  const options = f.enum?.map(String) ?? (f.choices ? hooks.choices(f.choices) : undefined);
  if (options) {
    const select = el('select', common, el('option', { value: '', text: f.default !== undefined ? `(default: ${textOfValue(f.default)})` : '(not given)' }), ...options.map((o) => el('option', { value: o, text: o, selected: String(value) === o })));
    select.addEventListener('change', () => edit(select.value));
    return select;
  }
  const numeric = f.type === 'number' || f.type === 'integer';
  const placeholder = f.computedDefault ? 'computed when left empty' : f.default !== undefined ? `default ${textOfValue(f.default)}` : '';
  const input = el('input', { ...common, type: 'text', inputmode: numeric && !f.unitStrings ? 'decimal' : undefined, value: textOfValue(value), placeholder, autocomplete: 'off', spellcheck: 'false' });
  input.addEventListener('input', () => edit(input.value));
  return input;
}

function fieldRow(path: KeyPath, f: Field, hooks: FormHooks): HTMLElement {
  const id = controlId(path);
  const range = rangeText(f);
  const notes = [f.unit && `unit ${f.unit}${f.unitStrings ? (f.unit === 'mm' ? ' (or a length with its unit, such as "2 ft 6 in")' : ' (or a value with its unit)') : ''}`, range && `allowed ${range}`, f.default !== undefined && `default ${textOfValue(f.default)}`, f.computedDefault && 'computed from other values when left empty', f.required && 'required'].filter(Boolean).join('; ');
  return el(
    'div',
    { class: 'field', 'data-key': path.join('.') },
    el('label', { id: `${id}-label`, for: id, text: `${f.label}${f.unit ? ` (${f.unit})` : ''}${f.required ? ' *' : ''}` }),
    control(path, f, hooks, `${id}-label`),
    el('small', { id: `${id}-help`, class: 'help', text: [notes, f.help].filter(Boolean).join('. ') }),
    el('span', { id: `${id}-msg`, class: 'msg', role: 'alert' }),
  );
}

function tableView(t: FormTable, hooks: FormHooks): HTMLElement {
  const rows = (getAt(hooks.spec(), t.path) as unknown[] | undefined) ?? [];
  const key = t.path.join('.');
  const add = el('button', { type: 'button', class: 'add', text: `Add a row to ${t.table.label.toLowerCase()}`, disabled: t.table.maxItems !== undefined && rows.length >= t.table.maxItems });
  add.addEventListener('click', () => hooks.onRows(t.path, [...rows, {}]));
  const entries = rows.map((_, i) => {
    const remove = el('button', { type: 'button', class: 'remove', text: `Remove row ${i + 1}`, disabled: t.table.minItems !== undefined && rows.length <= t.table.minItems });
    remove.addEventListener('click', () => hooks.onRows(t.path, rows.filter((__, j) => j !== i)));
    return el('fieldset', { class: 'entry', 'data-key': `${key}.${i}` }, el('legend', { text: `${t.table.label} ${i + 1}` }), ...t.table.fields.map((f) => fieldRow([...t.path, i, ...f.path], f, hooks)), remove);
  });
  return el('div', { class: 'table', 'data-key': key }, el('h3', { text: t.table.label }), t.table.help ? el('p', { class: 'help', text: t.table.help }) : null, ...entries, el('span', { id: `${controlId(t.path)}-msg`, class: 'msg', role: 'alert' }), add);
}

export function renderForm(sections: readonly FormSection[], hooks: FormHooks): HTMLElement {
  return el(
    'form',
    { id: 'spec-form', 'aria-label': 'The build', novalidate: true },
    ...sections.map((s) =>
      el(
        'details',
        { class: 'section', id: `s-${s.id}`, open: s.id === 'general' || s.id === 'axle' },
        el('summary', {}, el('span', { text: s.title }), el('span', { class: 'count', id: `s-${s.id}-count` })),
        s.help ? el('p', { class: 'help', text: s.help }) : null,
        el('span', { id: `s-${s.id}-msg`, class: 'msg', role: 'alert' }),
        ...s.fields.map((f) => fieldRow(f.path, f.field, hooks)),
        ...s.tables.map((t) => tableView(t, hooks)),
      ),
    ),
  );
}

/** Shows each issue at its field (or the nearest section or list above it); clears the rest. Returns the issues placed nowhere nearer than the top. */
export function showIssues(form: HTMLElement, issues: readonly InputIssue[]): void {
  for (const m of form.querySelectorAll<HTMLElement>('.msg')) m.textContent = '';
  for (const c of form.querySelectorAll('[aria-invalid]')) c.removeAttribute('aria-invalid');
  for (const c of form.querySelectorAll<HTMLElement>('.count')) c.textContent = '';
  const perSection = new Map<string, number>();
  for (const i of issues) {
    // The deepest path with a place on the form: the field, its list, its section.
    let target: HTMLElement | null = null;
    for (let n = i.path.length; n > 0 && !target; n--) target = form.querySelector<HTMLElement>(`[id="${controlId(i.path.slice(0, n))}-msg"]`) ?? form.querySelector<HTMLElement>(`[id="s-${i.path.slice(0, n).join('.')}-msg"]`);
    target ??= form.querySelector<HTMLElement>('[id="s-general-msg"]');
    if (!target) continue;
    target.textContent = target.textContent ? `${target.textContent} ${i.message}` : i.message;
    const input = form.querySelector(`[id="${target.id.replace(/-msg$/, '')}"]`);
    input?.setAttribute('aria-invalid', 'true');
    const section = target.closest('details');
    if (section) {
      section.open = true;
      perSection.set(section.id, (perSection.get(section.id) ?? 0) + 1);
    }
  }
  for (const [id, n] of perSection) {
    const c = form.querySelector<HTMLElement>(`[id="${id}-count"]`);
    if (c) c.textContent = ` (${n} to correct)`;
  }
}
