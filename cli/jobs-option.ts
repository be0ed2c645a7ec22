/** --jobs N: a whole number of 1 or more; undefined where not given; else what is wrong, in one line. */
export function jobsOf(value: string | undefined): number | undefined | string {
  if (value === undefined) return undefined;
  if (!/^[0-9]+$/.test(value) || Number(value) < 1) return `option --jobs takes a whole number of 1 or more (got "${value}")`;
  return Number(value);
}
