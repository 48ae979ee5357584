import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
// @ts-expect-error -- plain .mjs without type declarations (it must run before node_modules exists)
import { HASH_FILE, installedTreeMatches, installState, lockHash, nodeSupported } from './bootstrap.mjs';

type Tree = { packages: Record<string, { version?: string; optional?: boolean; link?: boolean }> };
const typed = { installedTreeMatches, installState, lockHash, nodeSupported } as {
  installedTreeMatches: (lock: Tree, installed: Tree) => boolean;
  installState: (dir: string) => 'missing' | 'stale' | 'fresh';
  lockHash: (text: string) => string;
  nodeSupported: (version: string) => boolean;
};

const lock: Tree = {
  packages: {
    '': { version: '0.1.0' },
    'node_modules/zod': { version: '4.6.7' },
    'node_modules/@esbuild/darwin-arm64': { version: '0.25.0', optional: true },
  },
};

function project(lockText: string): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'pinfield-boot-'));
  writeFileSync(path.join(dir, 'package-lock.json'), lockText);
  return dir;
}

describe('installState', () => {
  it('is missing without node_modules', () => {
    expect(typed.installState(project('{}'))).toBe('missing');
  });

  it('is fresh when the stored hash matches the lockfile, stale when the lockfile changed', () => {
    const dir = project('{"v":1}');
    mkdirSync(path.join(dir, 'node_modules'));
    writeFileSync(path.join(dir, HASH_FILE as string), `${typed.lockHash('{"v":1}')}\n`);
    expect(typed.installState(dir)).toBe('fresh');
    writeFileSync(path.join(dir, 'package-lock.json'), '{"v":2}');
    expect(typed.installState(dir)).toBe('stale');
  });

  it('without a hash, trusts npm’s record of a matching tree and stores the hash', () => {
    const text = JSON.stringify(lock);
    const dir = project(text);
    mkdirSync(path.join(dir, 'node_modules'));
    writeFileSync(path.join(dir, 'node_modules', '.package-lock.json'), JSON.stringify({ packages: { 'node_modules/zod': { version: '4.6.7' } } }));
    expect(typed.installState(dir)).toBe('fresh');
    expect(readFileSync(path.join(dir, HASH_FILE as string), 'utf8').trim()).toBe(typed.lockHash(text));
  });

  it('without a hash or npm’s record, is stale', () => {
    const dir = project(JSON.stringify(lock));
    mkdirSync(path.join(dir, 'node_modules'));
    expect(typed.installState(dir)).toBe('stale');
  });
});

describe('installedTreeMatches', () => {
  it('skips optional packages of other platforms', () => {
    expect(typed.installedTreeMatches(lock, { packages: { 'node_modules/zod': { version: '4.6.7' } } })).toBe(true);
  });

  it('notices a wrong version, a missing package and an extra one', () => {
    expect(typed.installedTreeMatches(lock, { packages: { 'node_modules/zod': { version: '4.6.6' } } })).toBe(false);
    expect(typed.installedTreeMatches(lock, { packages: {} })).toBe(false);
    const extra = { packages: { 'node_modules/zod': { version: '4.6.7' }, 'node_modules/left-pad': { version: '1.3.0' } } };
    expect(typed.installedTreeMatches(lock, extra)).toBe(false);
  });
});

describe('nodeSupported', () => {
  it.each([
    ['v20.19.0', true],
    ['v20.20.2', true],
    ['v20.18.1', false],
    ['v18.20.0', false],
    ['v21.7.0', false],
    ['v22.12.0', true],
    ['v22.11.0', false],
    ['v24.1.0', true],
  ])('%s -> %s', (version, expected) => {
    expect(typed.nodeSupported(version)).toBe(expected);
  });
});
