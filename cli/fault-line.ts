/** The one line printed for an uncaught fault: what it is, where it was thrown, and whose fault it is. */
export function faultLine(e: unknown): string {
  const what = e instanceof Error ? `${e.name}: ${e.message.split('\n')[0]}` : String(e);
  const at = e instanceof Error ? /\n\s+at (?:.*\()?([^()\s]+:\d+:\d+)\)?/.exec(e.stack ?? '')?.[1] : undefined;
  return `axletree: internal fault (a fault of the tool, not of your input): ${what}${at ? ` (at ${at})` : ''}; please report it.\n`;
}
