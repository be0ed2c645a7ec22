import { fill, MESSAGES, type MessageKey } from '../diagnostics/messages.ts';
import type { InputIssue, KeyPath } from './input-issue.ts';

/** An input issue from the message table; a missing param is a bug and throws, so no message goes out half-filled. */
export function formIssue(path: KeyPath, key: MessageKey, params: Record<string, string> = {}): InputIssue {
  const m = MESSAGES[key];
  const message = fill(m.text, params, (name) => {
    throw new Error(`message ${key} needs the param "${name}"`);
  });
  return { path, code: m.code, message };
}
