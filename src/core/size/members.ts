import { formatNumber, formatQuantity } from '../format/number-format.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';

// The members the member rules check, and the specification fields that make
// each one's section. A section is rectangular (a width and a depth, the depth
// being the field the specification names height, depth or thickness) or round
// (a diameter). The axle has two: its section at the box's bearings, and its
// arm turned to the nave's bore, which the rule checks in the nave.

export type Path = readonly string[];

export interface Slot {
  /** Stable id: `axle`, `axle.spindle`, `pole`. */
  id: string;
  /** Words: "axle at the bearings". */
  label: string;
  /** The object holding the fields. */
  at: Path;
  /** Rectangular: [width field, depth field]; round: [diameter field]. */
  fields: readonly [string, string] | readonly [string];
  /** The species the part is cut from (kept: only the section changes). */
  species: string;
  /** True where the part is cut from listed stock; false for a bore, which is turned, not bought. */
  fromStock: boolean;
  /** The cut list's part names that begin so are this slot's parts. */
  parts: string;
}

export interface Member {
  rule: string;
  label: string;
  slots: Slot[];
  /** A tie between the slots' sections, in words, and the test of it (sections in slot order). */
  tie?: { text: string; holds(sections: readonly Dims[]): boolean };
}

type Spec = CheckedSpecification;

const rectOrRound = (o: { diameter_mm?: number }, w: string, d: string): Slot['fields'] => (o.diameter_mm !== undefined ? ['diameter_mm'] : [w, d]);

/** The member each member rule checks, with its section's slots as this specification gives them. */
export function membersOf(spec: Spec): Member[] {
  const slot = (id: string, label: string, at: Path, fields: Slot['fields'], species: string, parts: string, fromStock = true): Slot => ({ id, label, at, fields, species, fromStock, parts });
  return [
    {
      rule: 'member.axle',
      label: 'axle',
      slots: [
        slot('axle', 'axle at the bearings', ['axle'], rectOrRound(spec.axle, 'width_mm', 'height_mm'), spec.axle.species, 'axle'),
        slot('axle.spindle', 'axle arm in the nave (the nave bore)', ['wheels', 'nave'], ['bore_mm'], spec.axle.species, 'axle', false),
      ],
      // The arm is turned down from the axle: it cannot be thicker than the axle's lesser side.
      tie: { text: "the arm in the nave is turned from the axle, so the bore is at most the axle's lesser side (or its diameter)", holds: ([bearing, spindle]) => spindle[0] <= Math.min(...bearing) },
    },
    { rule: 'member.pole', label: 'pole', slots: [slot('pole', 'pole', ['pole'], ['width_mm', 'height_mm'], spec.pole.species, 'pole')] },
    { rule: 'member.felloe', label: 'felloe', slots: [slot('felloe', 'felloe', ['wheels', 'felloe'], ['width_mm', 'depth_mm'], spec.wheels.felloe.species, 'felloe')] },
    { rule: 'member.spoke', label: 'spoke', slots: [slot('spoke', 'spoke', ['wheels', 'spoke'], ['width_mm', 'thickness_mm'], spec.wheels.spoke.species, 'spoke')] },
    { rule: 'member.yoke', label: 'yoke', slots: [slot('yoke', 'yoke', ['yoke'], ['width_mm', 'height_mm'], spec.yoke.species, 'yoke')] },
    {
      rule: 'member.frame-rail',
      label: 'floor frame rails',
      slots: [slot('frame', 'floor frame rails', ['box', 'floor', 'frame'], rectOrRound(spec.box.floor.frame, 'width_mm', 'thickness_mm'), spec.box.floor.frame.species, 'floor frame')],
    },
  ];
}

/** A section: its dimensions in the slot's field order, in mm. */
export type Dims = readonly number[];

export function areaOf(dims: Dims): number {
  return dims.length === 1 ? (Math.PI * dims[0] ** 2) / 4 : dims[0] * dims[1];
}

/** The depth that breaks a tie of areas: the depth field, or a round bar's diameter. */
export function depthOf(dims: Dims): number {
  return dims[dims.length - 1];
}

/** Smallest first: least area, then lesser depth. */
export function bySize(a: Dims, b: Dims): number {
  return areaOf(a) - areaOf(b) || depthOf(a) - depthOf(b);
}

function objectAt(root: unknown, at: Path): Record<string, unknown> | undefined {
  let node = root;
  for (const s of at) node = typeof node === 'object' && node !== null ? (node as Record<string, unknown>)[s] : undefined;
  return typeof node === 'object' && node !== null ? (node as Record<string, unknown>) : undefined;
}

/** The slot's section as the prepared specification holds it. */
export function dimsOf(spec: Spec, s: Slot): number[] {
  const o = objectAt(spec, s.at)!;
  return s.fields.map((f) => o[f] as number);
}

/** A copy of the parsed input with sections written in (only the objects on the way are copied). */
export function withSections(raw: unknown, sections: readonly { slot: { at: Path; fields: readonly string[] }; dims: Dims }[]): unknown {
  let out = raw;
  for (const { slot, dims } of sections) {
    const fields = Object.fromEntries(slot.fields.map((f, i) => [f, dims[i]]));
    out = setObject(out, slot.at, fields);
  }
  return out;
}

function setObject(root: unknown, at: Path, fields: Record<string, number>): unknown {
  const node = (typeof root === 'object' && root !== null ? root : {}) as Record<string, unknown>;
  if (at.length === 0) return { ...node, ...fields };
  const [head, ...rest] = at;
  return { ...node, [head]: setObject(node[head], rest, fields) };
}

/** The section in words: "75 × 60 mm" (width × depth) or "72 mm diameter". */
export function dimsText(dims: Dims): string {
  return dims.length === 1 ? `${formatQuantity(dims[0], 'mm')} diameter` : `${formatNumber(dims[0], 'mm')} × ${formatQuantity(dims[1], 'mm')}`;
}

/** Sections named by their dotted field paths (`axle.width_mm`), as `withSections` takes them. */
export function sectionsAt(changes: readonly { fields: readonly string[]; to: Dims }[]): { slot: { at: Path; fields: string[] }; dims: Dims }[] {
  return changes.map((c) => ({ slot: { at: c.fields[0].split('.').slice(0, -1), fields: c.fields.map((f) => f.split('.').at(-1)!) }, dims: c.to }));
}
