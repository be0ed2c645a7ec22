import type { RulesData } from '../data/rules-data.ts';
import { layout } from '../model/layout.ts';
import { frameBar } from '../model/spec-sections.ts';
import type { CheckedSpecification } from './spec.types.ts';
import { formIssues } from './form-checks.ts';
import { formIssue } from './form-messages.ts';
import { horseIssues } from './horse-checks.ts';
import { issue, type InputIssue, type KeyPath } from './input-issue.ts';

// Checks across fields that a JSON Schema cannot express. They run on a spec
// that passed the schema, with defaults filled.

export function crossChecks(spec: CheckedSpecification, data: RulesData): InputIssue[] {
  const out: InputIssue[] = [];
  knownNames(spec, data, out);
  out.push(...formIssues(spec));
  out.push(...horseIssues(spec, data));
  if (out.length) return out; // geometry below needs the materials to exist and the sections in one form
  geometry(spec, out);
  uniqueness(spec, out);
  return out;
}

function knownNames(spec: CheckedSpecification, data: RulesData, out: InputIssue[]): void {
  const species = Object.keys(data.species);
  const leathers = Object.keys(data.leathers);
  const wantSpecies: [KeyPath, string][] = [
    [['box', 'floor', 'frame', 'species'], spec.box.floor.frame.species],
    [['axle', 'species'], spec.axle.species],
    [['wheels', 'nave', 'species'], spec.wheels.nave.species],
    [['wheels', 'spoke', 'species'], spec.wheels.spoke.species],
    [['wheels', 'felloe', 'species'], spec.wheels.felloe.species],
    [['pole', 'species'], spec.pole.species],
    [['yoke', 'species'], spec.yoke.species],
    ...spec.stock.lumber.map((l, i): [KeyPath, string] => [['stock', 'lumber', i, 'species'], l.species]),
    ...spec.stock.extra_parts.map((x, i): [KeyPath, string] => [['stock', 'extra_parts', i, 'species'], x.species]),
  ];
  for (const [path, value] of wantSpecies) {
    if (!Object.hasOwn(data.species, value)) out.push(issue(path, 'unknownSpecies', { value, allowed: species.join(', ') }));
  }
  const wantLeather: [KeyPath, string][] = [
    [['floor_straps', 'material'], spec.floor_straps.material],
    ...spec.lashings.map((l, i): [KeyPath, string] => [['lashings', i, 'material'], l.material]),
    ...(spec.wheels.tyre?.material !== undefined ? [[['wheels', 'tyre', 'material'], spec.wheels.tyre.material] as [KeyPath, string]] : []),
  ];
  if (spec.wheels.tyre?.kind === 'rawhide' && spec.wheels.tyre.material === undefined) out.push(formIssue(['wheels', 'tyre', 'material'], 'tyreMaterialMissing', { allowed: leathers.join(', ') }));
  for (const [path, value] of wantLeather) {
    if (!Object.hasOwn(data.leathers, value)) out.push(issue(path, 'unknownLeather', { value, allowed: leathers.join(', ') }));
  }
  if (!Object.hasOwn(data.grounds, spec.operation.ground)) {
    out.push(issue(['operation', 'ground'], 'unknownGround', { value: spec.operation.ground, allowed: Object.keys(data.grounds).join(', ') }));
  }
}

function geometry(spec: CheckedSpecification, out: InputIssue[]): void {
  const { floor } = spec.box;
  const { depth_mm: depth, width_mm: width } = floor;
  const fw = frameBar(spec).width;
  if (spec.axle.x_mm < 0 || spec.axle.x_mm > depth) out.push(issue(['axle', 'x_mm'], 'axleOutsideFloor', { value: spec.axle.x_mm, max: depth }));
  spec.crew.forEach((c, i) => {
    const who = `crew member "${c.role}"`;
    if (c.x_mm < 0 || c.x_mm > depth) out.push(issue(['crew', i, 'x_mm'], 'crewOffFloor', { who, axis: 'x', value: c.x_mm, min: 0, max: depth }));
    if (Math.abs(c.y_mm) > width / 2) out.push(issue(['crew', i, 'y_mm'], 'crewOffFloor', { who, axis: 'y', value: c.y_mm, min: -width / 2, max: width / 2 }));
  });
  const p = spec.pole;
  if (p.yoke_x_mm <= depth + fw) out.push(issue(['pole', 'yoke_x_mm'], 'yokeBehindBox', { value: p.yoke_x_mm, min: depth + fw }));
  if (!(p.rear_x_mm <= p.root_x_mm && p.root_x_mm < p.yoke_x_mm)) out.push(issue(['pole', 'root_x_mm'], 'poleOrder', { rear: p.rear_x_mm, root: p.root_x_mm, yoke: p.yoke_x_mm }));
  for (const key of ['rear_x_mm', 'root_x_mm'] as const) {
    if (p[key] < -fw || p[key] > depth + fw) out.push(issue(['pole', key], 'poleRootOutsideBox', { key, value: p[key], min: -fw, max: depth + fw }));
  }
  const w = spec.wheels;
  if (w.track_mm - w.nave.length_mm <= spec.axle.bearing_span_mm) out.push(issue(['wheels', 'track_mm'], 'trackNarrow', { value: w.track_mm, min: spec.axle.bearing_span_mm, nave: w.nave.length_mm }));
  if (w.nave.bore_mm >= w.nave.diameter_mm) out.push(issue(['wheels', 'nave', 'bore_mm'], 'boreTooBig', { value: w.nave.bore_mm, max: w.nave.diameter_mm }));
  if (spec.axle.length_mm < w.track_mm + w.nave.length_mm) out.push(issue(['axle', 'length_mm'], 'axleShort', { value: spec.axle.length_mm, min: w.track_mm + w.nave.length_mm }));
  const maxCorner = Math.min(depth + fw, (width + fw) / 2); // two front corners: each fits the depth, both the width
  if ((floor.frame.bend_radius_mm ?? 0) > maxCorner) out.push(issue(['box', 'floor', 'frame', 'bend_radius_mm'], 'frameCornerTight', { value: floor.frame.bend_radius_mm!, max: maxCorner }));
  if (spec.floor_straps.pitch_mm < spec.floor_straps.width_mm) out.push(issue(['floor_straps', 'pitch_mm'], 'strapPitch', { value: spec.floor_straps.pitch_mm, min: spec.floor_straps.width_mm }));
  // A strap each way at least, or the weave has no crossing to stand on (the floor model would have no node).
  const [span, across] = depth <= width ? [depth, 'deep'] : [width, 'wide'];
  if (spec.floor_straps.pitch_mm >= span) out.push(issue(['floor_straps', 'pitch_mm'], 'strapPitchWide', { value: spec.floor_straps.pitch_mm, span, across, max: span }));
  const margin = floor.usable_margin_mm;
  if (margin * 2 >= Math.min(depth, width)) out.push(issue(['box', 'floor', 'usable_margin_mm'], 'marginTooWide', { value: margin, max: Math.min(depth, width) / 2 }));
  spec.loads.forEach((l, i) => {
    if (l.x_mm < -fw || l.x_mm > p.yoke_x_mm) out.push(issue(['loads', i, 'x_mm'], 'loadOffVehicle', { value: l.name, x: l.x_mm, min: -fw, max: p.yoke_x_mm }));
  });
  const lay = layout(spec);
  if (floor.height_mm < lay.stackHeight - 1e-9) out.push(issue(['box', 'floor', 'height_mm'], 'floorTooLow', { value: floor.height_mm, min: lay.stackHeight }));
  if (lay.spokeLength <= 0) out.push(issue(['wheels', 'diameter_mm'], 'wheelTooSmall', { radius: lay.wheelRadius, felloe: w.felloe.depth_mm, nave: w.nave.diameter_mm / 2 }));
  if (!lay.pole.ok) out.push(issue(['pole', 'bend_radius_mm'], 'poleBendTight', { value: p.bend_radius_mm!, max: Math.floor(lay.pole.largestRadius) }));
}

function uniqueness(spec: CheckedSpecification, out: InputIssue[]): void {
  const dup = <T>(list: T[], key: (t: T) => string, path: (i: number) => KeyPath, msg: 'duplicateRole' | 'duplicateJoint') => {
    const seen = new Set<string>();
    list.forEach((t, i) => {
      const k = key(t);
      if (seen.has(k)) out.push(issue(path(i), msg, { value: k }));
      seen.add(k);
    });
  };
  dup(spec.crew, (c) => c.role.trim().toLowerCase(), (i) => ['crew', i, 'role'], 'duplicateRole');
  dup(spec.lashings, (l) => l.joint, (i) => ['lashings', i, 'joint'], 'duplicateJoint');
}
