// Loaded with `node --import` ahead of a command: on exit it writes the
// process's peak resident memory (every thread's) as the last line of stderr.
// Linux's VmHWM is this program's own high-water mark; getrusage's maxRSS can
// carry the parent's size from before the exec, so it is only the fallback.
import { readFileSync } from 'node:fs';

function peakKb() {
  try {
    const m = /^VmHWM:\s*(\d+) kB/m.exec(readFileSync('/proc/self/status', 'utf8'));
    if (m) return Number(m[1]);
  } catch {
    // not Linux
  }
  return process.resourceUsage().maxRSS;
}

process.on('exit', () => process.stderr.write(`\npeak-rss-kb ${peakKb()}\n`));
