// Modules the web build makes (scripts/build-web.ts): the rules data, the
// demo build, the choice lists and the worker's own bundled text.
declare module 'axletree:rules-data' {
  const data: unknown;
  export default data;
}
declare module 'axletree:demo-spec' {
  /** specs/demo-two-crew.yaml as text. */
  const text: string;
  export default text;
}
declare module 'axletree:choices' {
  const choices: Record<'species' | 'leathers' | 'grounds', string[]>;
  export default choices;
}
declare module 'axletree:worker-source' {
  const source: string;
  export default source;
}
