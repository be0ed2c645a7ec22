// The rules data parsed once at build time (`npm run build` writes
// dist/rules-data.json), used while every file under rules/ is byte for byte
// what it was made from: parsing the YAML costs a fresh process about a
// tenth of a second. Any edit to the files changes their fingerprint, and
// the data is then read from the YAML again, with its located messages.
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { RulesData } from '../core/data/rules-data.ts';
import { loadRulesData } from './load-rules-data.ts';

export const SNAPSHOT_FILE = fileURLToPath(new URL('../../dist/rules-data.json', import.meta.url));

function yamlFiles(dir: string): string[] {
  const out: string[] = [];
  const walk = (d: string) => {
    for (const name of readdirSync(d).sort()) {
      const p = join(d, name);
      if (statSync(p).isDirectory()) walk(p);
      else if (name.endsWith('.yaml')) out.push(p);
    }
  };
  if (existsSync(dir)) walk(dir);
  return out;
}

/** A hash of every YAML file under the rules folder, names and bytes. */
export function rulesFingerprint(dir: string): string {
  const h = createHash('sha256');
  for (const f of yamlFiles(dir)) h.update(relative(dir, f)).update('\0').update(readFileSync(f)).update('\0');
  return h.digest('hex');
}

export function writeRulesSnapshot(dir: string, file = SNAPSHOT_FILE): void {
  writeFileSync(file, JSON.stringify({ fingerprint: rulesFingerprint(dir), data: loadRulesData(dir) }));
}

// Only the built command trusts the snapshot: it was made by the same build, so the
// declarations it was checked against are the ones running. (`import.meta['url']`
// is this chunk's own place, which the bundler leaves as it is.)
const BUILT = import.meta['url'].endsWith('.mjs');

/** The rules data: from the snapshot where it matches the files, else read and checked from the YAML. */
export function loadRulesDataFast(dir: string, file = SNAPSHOT_FILE, trusted = BUILT): RulesData {
  if (trusted && existsSync(file)) {
    try {
      const snap = JSON.parse(readFileSync(file, 'utf8')) as { fingerprint?: string; data?: RulesData };
      if (snap.data && snap.fingerprint === rulesFingerprint(dir)) return snap.data;
    } catch {
      // A damaged snapshot is ignored: the YAML is the source.
    }
  }
  return loadRulesData(dir);
}
