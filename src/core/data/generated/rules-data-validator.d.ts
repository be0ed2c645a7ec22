/* Generated from src/core/data/rules-data.schema.json by `npm run gen` (scripts/validator-source.ts). Do not edit. */
import type { ValidateFunction } from 'ajv/dist/2020.js';

export declare const validate: ValidateFunction;
export default validate;
