// Measurement noise of a finely sampled record. A smooth signal's second
// differences are tiny, white noise's have variance 6 sigma^2; the median
// absolute deviation ignores the few large ones at the impact.

/** Standard deviation of the noise, from the median absolute deviation of the second differences. */
export function noiseLevel(x: readonly number[]): number {
  if (x.length < 5) return 0;
  const d2: number[] = [];
  for (let i = 1; i < x.length - 1; i++) d2.push(x[i + 1] - 2 * x[i] + x[i - 1]);
  const mid = median(d2);
  const mad = median(d2.map((d) => Math.abs(d - mid)));
  // 1.4826: MAD to standard deviation for a normal distribution.
  return (1.4826 * mad) / Math.sqrt(6);
}

export function median(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const n = s.length;
  return n % 2 ? s[(n - 1) / 2] : (s[n / 2 - 1] + s[n / 2]) / 2;
}
