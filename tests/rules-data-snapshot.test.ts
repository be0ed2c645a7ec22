import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { defaultRulesDir, loadRulesData } from '../src/node/load-rules-data.ts';
import { loadRulesDataFast, rulesFingerprint, writeRulesSnapshot } from '../src/node/rules-data-snapshot.ts';

// The snapshot is used only while the YAML files are what it was made from.
describe('rules data snapshot', () => {
  const dir = mkdtempSync(join(tmpdir(), 'axletree-snap-'));
  cpSync(defaultRulesDir(), join(dir, 'rules'), { recursive: true });
  const rules = join(dir, 'rules');
  const snap = join(dir, 'rules-data.json');

  it('holds exactly what the YAML gives, and is used while the files are unchanged', () => {
    writeRulesSnapshot(rules, snap);
    expect(loadRulesDataFast(rules, snap, true)).toEqual(loadRulesData(rules));
    // Prove it is the snapshot that is read: a marked copy comes back.
    const marked = JSON.parse(readFileSync(snap, 'utf8'));
    marked.data.grounds.turf.name = 'from the snapshot';
    writeFileSync(snap, JSON.stringify(marked));
    expect(loadRulesDataFast(rules, snap, true).grounds.turf.name).toBe('from the snapshot');
  });

  it('is passed over once a file changes, and when not trusted', () => {
    const before = rulesFingerprint(rules);
    const file = join(rules, 'grounds.yaml');
    writeFileSync(file, readFileSync(file, 'utf8').replace('name: Turf (short grass on firm soil)', 'name: Turf, edited'));
    expect(rulesFingerprint(rules)).not.toBe(before);
    expect(loadRulesDataFast(rules, snap, true).grounds.turf.name).toBe('Turf, edited');
    expect(loadRulesDataFast(rules, join(dir, 'no-such.json'), true).grounds.turf.name).toBe('Turf, edited');
  });
});
