/** Where a command writes text and reads its files from; tests pass their own. */
export interface Console {
  out(text: string): void;
  err(text: string): void;
  cwd: string;
  /** The rules data directory; the repository's rules/ when absent (tests point it at a changed copy). */
  rulesDir?: string;
}
