import type { AccountLine, AccountParam } from './account-line.ts';
import { line } from './account-text.ts';
import { DIRECTION_WORDS } from './account-templates.ts';
import type { SpecDifference } from './compare-result.ts';
import { pathSteps } from './set-value.ts';

// One difference of the specifications in plain words: what it is ("the
// axle", "the crew driver"), which way and how far it moved, and the path
// with both values, so the reader can find it in the files.

type Direction = keyof typeof DIRECTION_WORDS;

/** What a key measures, and the noun left when that part is taken off (`yoke_x_mm`: a position, `yoke`). */
function measureOf(key: string): { direction: Direction; noun: string } {
  for (const d of ['x_mm', 'y_mm', 'z_mm', 'mass_kg'] as const) if (key === d || key.endsWith(`_${d}`)) return { direction: d, noun: key.slice(0, -d.length).replace(/_$/, '') };
  if (key.includes('height') && key.endsWith('_mm')) return { direction: 'height_mm', noun: key.slice(0, -'_mm'.length) };
  return { direction: 'other', noun: key.replace(/_(mm|kg|kmh|pct|g|m|N|deg)$/, '') };
}

/** A list item by its role, name or joint where it has one (`driver`), else by its place in the list. */
function itemWord(item: unknown, index: number): string {
  const o = (typeof item === 'object' && item !== null ? item : {}) as Record<string, unknown>;
  const word = [o.role, o.name, o.joint, o.species].find((v) => typeof v === 'string');
  return typeof word === 'string' ? word : `item ${index + 1}`;
}

/** The words naming the part a path leads to, items named from the specification. */
function thingWords(path: string, spec: unknown, nounOfKey: boolean): string {
  const steps = pathSteps(path);
  const words: string[] = [];
  let node: unknown = spec;
  steps.forEach((s, i) => {
    const last = i === steps.length - 1;
    const child = typeof node === 'object' && node !== null ? (node as Record<string | number, unknown>)[s] : undefined;
    if (typeof s === 'number') words.push(itemWord(child, s));
    else if (!last) words.push(s.replace(/_/g, ' '));
    else if (nounOfKey) {
      const noun = measureOf(s).noun.replace(/_/g, ' ');
      if (noun) words.push(noun);
    }
    node = child;
  });
  return `the ${words.join(' ')}`;
}

/** A value as the account writes it: a number with the path's unit, a list joined, anything else as short text. */
export function valueParam(v: unknown, unit: string): AccountParam {
  if (typeof v === 'number') return { value: v, unit };
  if (typeof v === 'string') return v;
  if (Array.isArray(v) && v.every((x) => typeof x !== 'object')) return v.join(', ');
  return JSON.stringify(v);
}

/** The difference in words, as the other build has it against the baseline (values[0] against values[i]). */
export function changeLine(d: SpecDifference, i: number, base: unknown, other: unknown): AccountLine {
  const [from, to] = [d.values[0], d.values[i]];
  if (from === null) return line('changeAdded', { thing: thingWords(d.path, other, true), path: d.path });
  if (to === null) return line('changeRemoved', { thing: thingWords(d.path, base, true), path: d.path });
  const key = String(pathSteps(d.path).at(-1));
  const both = { path: d.path, from: valueParam(from, d.unit), to: valueParam(to, d.unit) };
  if (typeof from !== 'number' || typeof to !== 'number') return line('changeOther', { thing: thingWords(d.path, base, true), ...both });
  const { direction } = measureOf(key);
  const [more, less] = DIRECTION_WORDS[direction];
  return line('changeMore', { thing: thingWords(d.path, base, true), amount: { value: Math.abs(to - from), unit: d.unit }, direction: to > from ? more : less, ...both });
}
