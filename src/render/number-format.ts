// The one number formatter lives in the core; the stock command imports it from here.
export { formatNumber } from '../core/format/number-format.ts';
