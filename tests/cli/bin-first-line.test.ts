// The bin is run through its first line (npx and an installed `axletree` do
// so): env must start node with the options written there, and the benches
// read the same options (bench/bin-command.ts) to run it as a user does.
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { binArgs, shebangNodeOptions } from '../../bench/bin-command.ts';
import { REPO } from '../support/run-cli.ts';

describe("the bin's first line", () => {
  it('reads the node options of both forms, and refuses another program', () => {
    expect(shebangNodeOptions('#!/usr/bin/env node')).toEqual([]);
    expect(shebangNodeOptions('#!/usr/bin/env -S node --max-semi-space-size=8 --foo')).toEqual(['--max-semi-space-size=8', '--foo']);
    expect(() => shebangNodeOptions('#!/bin/sh')).toThrow(/not a line that starts node/);
  });

  it('keeps the young generation small, and the benches run the bin with it', () => {
    const first = readFileSync(join(REPO, 'bin', 'axletree.mjs'), 'utf8').split('\n', 1)[0];
    expect(shebangNodeOptions(first)).toContain('--max-semi-space-size=8');
    expect(binArgs()).toEqual(['--max-semi-space-size=8', join(REPO, 'bin', 'axletree.mjs')]);
  });

  it('npm start runs the demo with the same node options', () => {
    const first = readFileSync(join(REPO, 'bin', 'axletree.mjs'), 'utf8').split('\n', 1)[0];
    const start = (JSON.parse(readFileSync(join(REPO, 'package.json'), 'utf8')) as { scripts: { start: string } }).scripts.start;
    expect(start).toBe(['node', ...shebangNodeOptions(first), 'bin/axletree.mjs check specs/demo-two-crew.yaml'].join(' '));
  });

  it('runs as an executable through env (as npx runs it)', () => {
    const r = spawnSync(join(REPO, 'bin', 'axletree.mjs'), ['--version'], { encoding: 'utf8', timeout: 60_000 });
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/^axletree \d+\.\d+\.\d+/);
  }, 60_000);
});
