import { MAX_POINTS, type Parsed } from './sweep-axis.ts';

// The sweep's other options, read from their text: each refusal names the
// option and what it takes.

const whole = (text: string) => (/^\d+$/.test(text.trim()) ? Number(text.trim()) : NaN);

export function parseSamples(text: string): Parsed<number> {
  const n = whole(text);
  return Number.isSafeInteger(n) && n >= 1 && n <= MAX_POINTS ? { ok: true, value: n } : { ok: false, message: `option --samples "${text}" must be a whole number of points from 1 to ${MAX_POINTS}` };
}

export function parseSeed(text: string): Parsed<number> {
  const n = whole(text);
  return Number.isSafeInteger(n) && n <= 0xffffffff ? { ok: true, value: n } : { ok: false, message: `option --seed "${text}" must be a whole number from 0 to ${0xffffffff}` };
}

export function parseJobs(text: string, most: number): Parsed<number> {
  const n = whole(text);
  return Number.isSafeInteger(n) && n >= 1 && n <= most ? { ok: true, value: n } : { ok: false, message: `option --jobs "${text}" must be a whole number of threads from 1 to ${most}` };
}

export function parseShard(text: string): Parsed<{ index: number; of: number }> {
  const m = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  const [index, of] = m ? [Number(m[1]), Number(m[2])] : [NaN, NaN];
  if (!m || !(of >= 1 && of <= 10_000 && index >= 1 && index <= of)) return { ok: false, message: `option --shard "${text}" must be I/N, the I-th of N slices, 1 <= I <= N <= 10000 (e.g. --shard 2/3)` };
  return { ok: true, value: { index, of } };
}
