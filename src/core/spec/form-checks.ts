import type { CheckedSpecification } from './spec.types.ts';
import { formIssue } from './form-messages.ts';
import type { InputIssue, KeyPath } from './input-issue.ts';

// The forms a JSON Schema leaves open: the floor frame bars and the axle are
// rectangular (two sizes) or round (a diameter), exactly one of the two; a
// tyre of kind rawhide names its leather, an iron one does not, and both give
// their sizes; kind none gives nothing else. Run before anything reads the
// sections (the default floor height among them).

export function formIssues(spec: CheckedSpecification): InputIssue[] {
  const out: InputIssue[] = [];
  const f = spec.box.floor.frame;
  section(['box', 'floor', 'frame'], f.diameter_mm, ['width_mm', f.width_mm], ['thickness_mm', f.thickness_mm], out);
  const a = spec.axle;
  section(['axle'], a.diameter_mm, ['width_mm', a.width_mm], ['height_mm', a.height_mm], out);
  tyre(spec, out);
  return out;
}

function section(path: KeyPath, d: number | undefined, [wKey, w]: [string, number | undefined], [hKey, h]: [string, number | undefined], out: InputIssue[]): void {
  const round = 'diameter_mm';
  const rect = `${wKey} and ${hKey}`;
  const given = [w === undefined ? null : wKey, h === undefined ? null : hKey].filter((k): k is string => k !== null);
  if (d !== undefined && given.length > 0) out.push(formIssue([...path, round], 'sectionBothForms', { round, rect }));
  else if (d === undefined && given.length === 0) out.push(formIssue(path, 'sectionNoForm', { round, rect }));
  else if (d === undefined && given.length === 1) {
    const missing = given[0] === wKey ? hKey : wKey;
    out.push(formIssue([...path, missing], 'sectionHalfForm', { given: given[0], missing, round }));
  }
}

function tyre(spec: CheckedSpecification, out: InputIssue[]): void {
  const t = spec.wheels.tyre;
  if (t === undefined) return;
  const path: KeyPath = ['wheels', 'tyre'];
  if (t.kind === 'none') {
    const extra = (['material', 'width_mm', 'thickness_mm', 'pre_compression_N'] as const).filter((k) => t[k] !== undefined);
    if (extra.length) out.push(formIssue([...path, extra[0]], 'tyreNoneWithKeys', { keys: extra.join(', ') }));
    return;
  }
  for (const key of ['width_mm', 'thickness_mm'] as const) {
    if (t[key] === undefined) out.push(formIssue([...path, key], 'tyreSizeMissing', { kind: t.kind, key }));
  }
  if (t.kind === 'iron' && t.material !== undefined) out.push(formIssue([...path, 'material'], 'tyreMaterialOnIron'));
}
