export interface SpecEntry {
  path: string;
  value: unknown;
  unit: string;
  /** True where the value came from a default, not from the user. */
  defaulted: boolean;
  note?: string;
}
