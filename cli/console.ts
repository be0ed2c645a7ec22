/** Where a command writes text and reads its files from; tests pass their own. */
export interface Console {
  out(text: string): void;
  err(text: string): void;
  cwd: string;
  /** The rules data directory; the repository's rules/ when absent (tests point it at a changed copy). */
  rulesDir?: string;
  /** Aborted at the first Ctrl-C: a long run (a batch, a sweep, a sizing) stops after the item in hand and writes what it finished. */
  stop?: AbortSignal;
  /** Called by a command whose long part keeps what it finished, so the first Ctrl-C stops it gently rather than at once. */
  keepPartial?: () => void;
  /** True where standard error is a terminal: a progress bar is drawn there, and nowhere else. */
  errIsTerminal?: boolean;
}
