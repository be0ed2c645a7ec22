import pkg from '../package.json' with { type: 'json' };

/** The version in package.json. */
export const VERSION: string = pkg.version;
