import { performance } from 'node:perf_hooks';

// Progress of a long run (a batch review, a sweep, a sizing): a bar with the
// time left, drawn on a terminal's standard error once the run has taken
// about a second (a quick run shows nothing), or, for scripts, one JSON line
// per step on standard error (`--json`), so standard output keeps the result.

export interface ProgressOptions {
  label: string;
  total: number;
  err(text: string): void;
  /** Standard error is a terminal: draw the bar. */
  terminal: boolean;
  /** Write JSON lines instead of a bar. */
  json: boolean;
  /** Milliseconds; the clock is handed in so tests can drive it. */
  now?: () => number;
}

export interface Progress {
  /** `done` items of the total are finished. */
  step(done: number): void;
  /** The run ended (finished or stopped): clears the bar, writes the last JSON line. */
  finish(done: number, stopped?: boolean): void;
}

/** Nothing is drawn before this much time has passed. */
export const QUIET_MS = 1000;
/** At most this often is the bar redrawn or a JSON line written (the last one always is). */
const EVERY_MS = 200;
const BAR = 24;

/** Seconds left at the rate so far; null before anything is done. */
export function secondsLeft(elapsedMs: number, done: number, total: number): number | null {
  if (done <= 0) return null;
  return ((elapsedMs / done) * Math.max(0, total - done)) / 1000;
}

/** "12 s", "3 min 05 s", "1 h 02 min". */
export function durationText(s: number): string {
  const whole = Math.round(s);
  if (whole < 60) return `${whole} s`;
  if (whole < 3600) return `${Math.floor(whole / 60)} min ${String(whole % 60).padStart(2, '0')} s`;
  return `${Math.floor(whole / 3600)} h ${String(Math.floor((whole % 3600) / 60)).padStart(2, '0')} min`;
}

/** The bar's text: label, bar, count and time left. */
export function barText(label: string, done: number, total: number, left: number | null): string {
  const filled = total > 0 ? Math.round((BAR * Math.min(done, total)) / total) : BAR;
  return `${label} [${'#'.repeat(filled)}${'.'.repeat(BAR - filled)}] ${done}/${total}${left === null ? '' : `, about ${durationText(left)} left`}`;
}

export function startProgress(o: ProgressOptions): Progress {
  const now = o.now ?? (() => performance.now());
  const started = now();
  let last = -Infinity;
  let drawn = false;
  const line = (done: number, extra: Record<string, unknown> = {}) => {
    const elapsed = now() - started;
    const left = secondsLeft(elapsed, done, o.total);
    return { elapsed, left, json: `${JSON.stringify({ progress: { label: o.label, done, total: o.total, elapsed_s: Math.round(elapsed) / 1000, left_s: left === null ? null : Math.round(left * 10) / 10, ...extra } })}\n` };
  };
  return {
    step(done) {
      const t = now();
      if (t - started < (o.json ? 0 : QUIET_MS) || t - last < EVERY_MS) return;
      last = t;
      const l = line(done);
      if (o.json) o.err(l.json);
      else if (o.terminal) {
        o.err(`\r${barText(o.label, done, o.total, l.left)}\u001b[K`);
        drawn = true;
      }
    },
    finish(done, stopped = false) {
      if (o.json) o.err(line(done, { finished: !stopped, stopped }).json);
      else if (drawn) o.err('\r\u001b[K');
    },
  };
}
