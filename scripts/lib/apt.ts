import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { log } from './output';

/** Debian packages `npm start` needs; `npm test` adds chromium. */
export const startPackages = ['postgresql', 'ffmpeg'] as const;
export const testPackages = [...startPackages, 'chromium'] as const;

let updated = false;

/** True when dpkg reports the package as installed (`install ok installed`). */
export function isInstalled(name: string): boolean {
  const result = spawnSync('dpkg-query', ['-W', '-f=${Status}', name], { encoding: 'utf8' });
  return result.status === 0 && result.stdout.trim() === 'install ok installed';
}

export function isRoot(): boolean {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

/**
 * Installs whichever of `names` is missing with apt-get, non-interactively. `apt-get update`
 * runs at most once per process and only when something is missing.
 */
export function ensurePackages(names: readonly string[]): void {
  if (!existsSync('/usr/bin/dpkg-query')) {
    throw new Error(
      `This script installs ${names.join(', ')} with apt and needs Debian (dpkg-query was not found). ` +
        'Install them with your system package manager and run it again.',
    );
  }
  const missing = names.filter((name) => !isInstalled(name));
  if (missing.length === 0) return;
  if (!isRoot()) {
    throw new Error(
      `Missing Debian packages: ${missing.join(', ')}. Run this command as root so it can install them, ` +
        `or install them first: sudo apt-get install -y ${missing.join(' ')}`,
    );
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!updated) {
    log('apt-get update (packages missing: ' + missing.join(', ') + ')');
    run(['update'], env);
    updated = true;
  }
  log(`apt-get install ${missing.join(' ')} (ffmpeg and chromium take a minute or two)`);
  run(['install', '-y', '-o', 'Dpkg::Options::=--force-confold', ...missing], env);
  const still = missing.filter((name) => !isInstalled(name));
  if (still.length > 0) throw new Error(`apt-get finished but these packages are still missing: ${still.join(', ')}`);
}

function run(args: string[], env: NodeJS.ProcessEnv): void {
  const result = spawnSync('apt-get', args, { stdio: 'inherit', env });
  if (result.error) throw new Error(`apt-get ${args[0]} could not run: ${result.error.message}`);
  if (result.status !== 0) throw new Error(`apt-get ${args.join(' ')} failed with exit code ${result.status}`);
}
