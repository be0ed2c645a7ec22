import type { InputIssue, KeyPath } from './input-issue.ts';

// Messages of the checks on the form of a section (rectangular or round) and
// of a tyre, with stable codes of the 115x block; kept apart from the shared
// message table, whose codes they do not reuse.

export const FORM_MESSAGES = {
  sectionBothForms: { code: 1150, text: 'both forms of the section are given ({round} and {rect}); give one: {round} alone for a round bar, or {rect} for a rectangular one.' },
  sectionNoForm: { code: 1151, text: 'the section is not given; give {rect} for a rectangular bar, or {round} alone for a round one.' },
  sectionHalfForm: { code: 1152, text: '{given} is given without {missing}: a rectangular section needs both (or give {round} alone for a round bar).' },
  tyreMaterialMissing: { code: 1153, text: 'a rawhide tyre names its leather: give material (known materials: {allowed}).' },
  tyreMaterialOnIron: { code: 1154, text: 'an iron tyre takes no material (its mass comes from the density of iron); remove material, or set kind to rawhide for a hide tyre.' },
  tyreSizeMissing: { code: 1155, text: 'a {kind} tyre needs its {key}.' },
  tyreNoneWithKeys: { code: 1156, text: 'a tyre of kind none takes no other key; remove {keys}, or set kind to rawhide or iron.' },
} as const;

export type FormMessageKey = keyof typeof FORM_MESSAGES;

export function formIssue(path: KeyPath, key: FormMessageKey, params: Record<string, string> = {}): InputIssue {
  const m = FORM_MESSAGES[key];
  const message = m.text.replace(/\{(\w+)\}/g, (_, name: string) => {
    if (!Object.hasOwn(params, name)) throw new Error(`form message ${key} needs the param "${name}"`);
    return params[name];
  });
  return { path, code: m.code, message };
}
