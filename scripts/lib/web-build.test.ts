import { mkdirSync, mkdtempSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { isWebBuildFresh, newestMtime } from './web-build';

function touch(file: string, secondsAgo: number): void {
  mkdirSync(path.dirname(file), { recursive: true });
  writeFileSync(file, 'x');
  const when = new Date(Date.now() - secondsAgo * 1000);
  utimesSync(file, when, when);
}

function project(): string {
  const root = mkdtempSync(path.join(tmpdir(), 'pinfield-web-'));
  touch(path.join(root, 'web', 'src', 'main.tsx'), 300);
  touch(path.join(root, 'core', 'roles.ts'), 300);
  touch(path.join(root, 'package-lock.json'), 300);
  touch(path.join(root, 'web', 'dist', 'index.html'), 100);
  return root;
}

describe('isWebBuildFresh', () => {
  it('is fresh when web/dist/index.html is newer than every input', () => {
    expect(isWebBuildFresh(project())).toBe(true);
  });

  it('is stale when a web source changed after the build', () => {
    const root = project();
    touch(path.join(root, 'web', 'src', 'app', 'router.tsx'), 10);
    expect(isWebBuildFresh(root)).toBe(false);
  });

  it('is stale when core/ changed after the build', () => {
    const root = project();
    touch(path.join(root, 'core', 'contracts', 'people.ts'), 10);
    expect(isWebBuildFresh(root)).toBe(false);
  });

  it('ignores test files and test helpers, which are not in the bundle', () => {
    const root = project();
    touch(path.join(root, 'web', 'src', 'lib', 'format.test.ts'), 10);
    touch(path.join(root, 'web', 'src', 'testing', 'setup-tests.ts'), 10);
    expect(isWebBuildFresh(root)).toBe(true);
  });

  it('is stale when there is no build', () => {
    const root = mkdtempSync(path.join(tmpdir(), 'pinfield-web-'));
    touch(path.join(root, 'web', 'src', 'main.tsx'), 300);
    expect(isWebBuildFresh(root)).toBe(false);
  });

  it('does not count the build output itself as an input', () => {
    const root = project();
    touch(path.join(root, 'web', 'dist', 'assets', 'late.js'), 5);
    expect(newestMtime(path.join(root, 'web'))).toBeLessThan(Date.now() - 200_000);
    expect(isWebBuildFresh(root)).toBe(true);
  });
});
