// The working's steps, where the rules have always imported them from.
export { num, step } from '../findings/working.ts';
