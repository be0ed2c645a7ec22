/** A spec-as-checked value as text: strings as they are, everything else as JSON. */
export function specValueText(value: unknown): string {
  if (typeof value === 'string') return value;
  if (value === undefined) return '';
  if (typeof value === 'number' && !Number.isFinite(value)) return String(value);
  return JSON.stringify(value) ?? typeof value;
}
