import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { HASH_FILE, installedTreeMatches, installState, lockHash, nodeSupported, type LockTree } from './bootstrap.mjs';

const lock: LockTree = {
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
    expect(installState(project('{}'))).toBe('missing');
  });

  it('is fresh when the stored hash matches the lockfile, stale when the lockfile changed', () => {
    const dir = project('{"v":1}');
    mkdirSync(path.join(dir, 'node_modules'));
    writeFileSync(path.join(dir, HASH_FILE), `${lockHash('{"v":1}')}\n`);
    expect(installState(dir)).toBe('fresh');
    writeFileSync(path.join(dir, 'package-lock.json'), '{"v":2}');
    expect(installState(dir)).toBe('stale');
  });

  it('with an outdated hash, trusts npm’s record when the installed tree matches the new lock', () => {
    const text = JSON.stringify(lock);
    const dir = project(text);
    mkdirSync(path.join(dir, 'node_modules'));
    writeFileSync(path.join(dir, HASH_FILE), 'hash-of-an-older-lock\n');
    writeFileSync(
      path.join(dir, 'node_modules', '.package-lock.json'),
      JSON.stringify({ packages: { 'node_modules/zod': { version: '4.6.7' } } }),
    );
    expect(installState(dir)).toBe('fresh');
    writeFileSync(
      path.join(dir, 'node_modules', '.package-lock.json'),
      JSON.stringify({ packages: { 'node_modules/zod': { version: '4.6.1' } } }),
    );
    writeFileSync(path.join(dir, HASH_FILE), 'hash-of-an-older-lock\n');
    expect(installState(dir)).toBe('stale');
  });

  it('without a hash, trusts npm’s record of a matching tree and stores the hash', () => {
    const text = JSON.stringify(lock);
    const dir = project(text);
    mkdirSync(path.join(dir, 'node_modules'));
    writeFileSync(
      path.join(dir, 'node_modules', '.package-lock.json'),
      JSON.stringify({ packages: { 'node_modules/zod': { version: '4.6.7' } } }),
    );
    expect(installState(dir)).toBe('fresh');
    expect(readFileSync(path.join(dir, HASH_FILE), 'utf8').trim()).toBe(lockHash(text));
  });

  it('without a hash or npm’s record, is stale', () => {
    const dir = project(JSON.stringify(lock));
    mkdirSync(path.join(dir, 'node_modules'));
    expect(installState(dir)).toBe('stale');
  });
});

describe('installedTreeMatches', () => {
  it('skips optional packages of other platforms', () => {
    expect(installedTreeMatches(lock, { packages: { 'node_modules/zod': { version: '4.6.7' } } })).toBe(true);
  });

  it('notices a wrong version, a missing package and an extra one', () => {
    expect(installedTreeMatches(lock, { packages: { 'node_modules/zod': { version: '4.6.6' } } })).toBe(false);
    expect(installedTreeMatches(lock, { packages: {} })).toBe(false);
    const extra = { packages: { 'node_modules/zod': { version: '4.6.7' }, 'node_modules/left-pad': { version: '1.3.0' } } };
    expect(installedTreeMatches(lock, extra)).toBe(false);
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
    expect(nodeSupported(version)).toBe(expected);
  });
});
