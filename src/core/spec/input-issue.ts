import { say, type MessageKey } from '../diagnostics/messages.ts';

export type KeyPath = (string | number)[];

/** One thing wrong with the specification, at a key path. */
export interface InputIssue {
  path: KeyPath;
  code: number;
  message: string;
}

export function issue(path: KeyPath, key: MessageKey, params: Record<string, string | number> = {}): InputIssue {
  const { code, text } = say(key, params);
  return { path, code, message: text };
}

/** `crew[1].x_mm`: the path as a reader would type it. */
export function pathText(path: KeyPath): string {
  if (path.length === 0) return '(top level)';
  return path.map((p, i) => (typeof p === 'number' ? `[${p}]` : i === 0 ? p : `.${p}`)).join('');
}
