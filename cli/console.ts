/** Where a command writes text; tests pass their own. */
export interface Console {
  out(text: string): void;
  err(text: string): void;
  cwd: string;
}

export const EXIT = { ok: 0, failed: 1, badInput: 2 } as const;
