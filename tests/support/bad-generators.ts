// Inputs of the bad-input catalogue that are too big, repetitive or binary to
// keep as files: each builds its content when the case runs.
export const GENERATORS: Record<string, () => string | Uint8Array | Promise<string | Uint8Array>> = {
  /** A YAML document whose name is a string of 100,000 characters. */
  'long-name': () => `spec_version: 1\nname: ${'x'.repeat(100_000)}\n`,
};
