import type { RulesData } from '../data/rules-data.ts';
import type { SpecEntry } from './spec-entry.ts';
import { stackHeight } from '../model/layout.ts';
import { unitOfKey } from '../units/units.ts';
import { convertUnitStrings } from './convert-units.ts';
import { crossChecks } from './cross-checks.ts';
import { formIssues } from './form-checks.ts';
import { issue, pathText, type InputIssue } from './input-issue.ts';
import type { CheckedSpecification } from './spec.types.ts';
import { validateSchema } from './validate-schema.ts';

export type Prepared = { ok: true; spec: CheckedSpecification; entries: SpecEntry[] } | { ok: false; issues: InputIssue[] };

/**
 * From parsed input to a checked specification: unit strings converted,
 * schema checked with defaults filled, computed defaults, cross-field checks.
 * The input object is not modified. `entries: false` leaves the entries
 * (the list of every leaf and whether the user gave it) empty.
 */
export function prepareSpec(raw: unknown, data: RulesData, options: { entries?: boolean } = {}): Prepared {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) return { ok: false, issues: [issue([], 'notAnObject')] };
  const work = structuredClone(raw) as Record<string, unknown>;
  const unitIssues = convertUnitStrings(work);
  const given = options.entries === false ? undefined : structuredClone(work);
  // A value the unit step rejected (NaN, Infinity, an unreadable string) is
  // reported once, by that step: the schema would add "null is of the wrong type".
  const rejected = new Set(unitIssues.map((i) => pathText(i.path)));
  const schemaIssues = validateSchema(work).filter((i) => !rejected.has(pathText(i.path)));
  if (unitIssues.length || schemaIssues.length) return { ok: false, issues: [...unitIssues, ...schemaIssues] };
  const spec = work as unknown as CheckedSpecification;
  const computed = new Set<string>();
  // The stack reads the frame's and the axle's sections: a section in neither form or both is left to the cross-field checks to report.
  if ((raw as { box: { floor: { height_mm?: unknown } } }).box.floor.height_mm === undefined && formIssues(spec).length === 0) {
    spec.box.floor.height_mm = stackHeight(spec);
    computed.add('box.floor.height_mm');
  }
  const cross = crossChecks(spec, data);
  if (cross.length) return { ok: false, issues: cross };
  // A sweep prepares thousands of variants and reads none of their entries.
  return { ok: true, spec, entries: given === undefined ? [] : specEntries(spec, given, computed) };
}

/** Every leaf of the checked spec, marking what the user did not give. */
function specEntries(spec: unknown, given: unknown, computed: Set<string>): SpecEntry[] {
  const out: SpecEntry[] = [];
  const walk = (node: unknown, user: unknown, path: (string | number)[], unit: string) => {
    const leaf = typeof node !== 'object' || node === null || (Array.isArray(node) && node.every((v) => typeof v !== 'object')) || (typeof node === 'object' && Object.keys(node).length === 0);
    if (leaf) {
      const p = pathText(path);
      const entry: SpecEntry = { path: p, value: node, unit, defaulted: user === undefined };
      if (computed.has(p)) entry.note = 'computed from the wheel, axle, pole and frame';
      out.push(entry);
      return;
    }
    for (const [k, v] of Object.entries(node)) {
      const key = Array.isArray(node) ? Number(k) : k;
      const u = typeof key === 'string' ? (unitOfKey(key)?.symbol ?? '') : unit;
      walk(v, (user as Record<string, unknown> | undefined)?.[k], [...path, key], u);
    }
  };
  walk(spec, given, [], '');
  return out;
}
