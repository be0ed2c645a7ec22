import { parseQuantity } from '../units/parse-quantity.ts';
import { unitOfKey, type UnitDef } from '../units/units.ts';
import { INPUT_LIMITS } from '../input/input-limits.ts';
import { escapeControls } from '../diagnostics/echo.ts';
import { issue, type InputIssue, type KeyPath } from './input-issue.ts';

const EXAMPLES: Readonly<Record<string, string>> = { mm: '65 in', cm: '70 in', m: '40 ft', kg: '180 lb', 'km/h': '12 mph', N: '30 lbf', '%': '12 percent', g: '2 m/s^2', '°': '0.5 rad' };

/**
 * Convert unit strings in place to numbers in the unit of their key, and
 * report non-finite numbers (YAML can write .nan and .inf) and text holding
 * control characters anywhere.
 */
export function convertUnitStrings(data: unknown): InputIssue[] {
  const issues: InputIssue[] = [];
  walk(data, [], undefined, issues);
  return issues;
}

// Characters that act on a terminal or turn a line around (an escape
// sequence, a direction override) have no place in a value: a name holding
// one would be printed on the terminal and in the reports as it is.
const CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;

function walk(node: unknown, path: KeyPath, unit: UnitDef | undefined, issues: InputIssue[]): unknown {
  if (typeof node === 'number' && !Number.isFinite(node)) {
    issues.push(issue(path, 'notFinite', { value: String(node) }));
    return node;
  }
  const control = typeof node === 'string' ? CONTROL.exec(node)?.[0] : undefined;
  if (control !== undefined) {
    issues.push(issue(path, 'controlCharacter', { value: `"${node as string}"`, which: escapeControls(control) }));
    return node;
  }
  if (typeof node === 'string' && unit) {
    // The units library reads a long string in quadratic time: a value with its unit is short.
    if (node.length > INPUT_LIMITS.unitStringChars) {
      issues.push(issue(path, 'unitStringLong', { value: `"${node}"`, max: INPUT_LIMITS.unitStringChars, unit: unit.symbol, example: exampleOf(unit) }));
      return node;
    }
    const parsed = parseQuantity(node, unit);
    if (parsed.ok) return parsed.value;
    issues.push(issue(path, 'unitString', { reason: parsed.reason, unit: unit.symbol, example: exampleOf(unit) }));
    return node;
  }
  if (Array.isArray(node)) {
    node.forEach((v, i) => (node[i] = walk(v, [...path, i], unit, issues)));
  } else if (typeof node === 'object' && node !== null) {
    const obj = node as Record<string, unknown>;
    for (const key of Object.keys(obj)) obj[key] = walk(obj[key], [...path, key], unitOfKey(key), issues);
  }
  return node;
}

const exampleOf = (unit: UnitDef): string => (Object.hasOwn(EXAMPLES, unit.symbol) ? EXAMPLES[unit.symbol] : '');
