import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';

/** Inputs of the web bundle: a change in any of them means web/dist is stale. */
export const webInputs = ['web', 'core', 'fonts', 'package-lock.json', 'tsconfig.base.json'];

// Build output and test-only code do not end up in the bundle.
const skippedDirs = new Set(['node_modules', 'dist', '.vite', 'testing', '__tests__']);
const skippedFile = /\.test\.[cm]?[jt]sx?$/;

/** Newest modification time (ms) of the files under `target`, skipping build output. */
export function newestMtime(target: string): number {
  if (!existsSync(target)) return 0;
  const stats = statSync(target);
  if (!stats.isDirectory()) return stats.mtimeMs;
  let newest = 0;
  for (const entry of readdirSync(target, { withFileTypes: true })) {
    if (entry.isDirectory() ? skippedDirs.has(entry.name) : skippedFile.test(entry.name)) continue;
    newest = Math.max(newest, newestMtime(path.join(target, entry.name)));
  }
  return newest;
}

/** web/dist is fresh when its index.html is newer than every input file. */
export function isWebBuildFresh(root: string): boolean {
  const index = path.join(root, 'web', 'dist', 'index.html');
  if (!existsSync(index)) return false;
  const built = statSync(index).mtimeMs;
  return webInputs.every((input) => newestMtime(path.join(root, input)) < built);
}
