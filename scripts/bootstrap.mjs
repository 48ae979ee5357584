#!/usr/bin/env node
// Entry of `npm start|test|dev`. Plain Node with no dependencies, because it runs before
// node_modules exists: install when missing or stale, then hand over to scripts/<cmd>.ts.
import { spawn, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const commands = ['start', 'test', 'dev'];
export const HASH_FILE = path.join('node_modules', '.pinfield-lock-hash');

export function lockHash(lockText) {
  return createHash('sha256').update(lockText).digest('hex');
}

/**
 * When our hash is missing or differs (a tree installed by hand, or `npm install x` that updated
 * node_modules and the lock together), npm's own record of the installed tree
 * (node_modules/.package-lock.json) decides: every package the lock requires for this platform
 * must be there at the locked version, and nothing else.
 */
export function installedTreeMatches(lock, installed) {
  const wanted = lock?.packages ?? {};
  const have = installed?.packages ?? {};
  for (const [key, entry] of Object.entries(wanted)) {
    if (key === '' || !key.includes('node_modules/') || entry.link) continue;
    const found = have[key];
    if (!found) {
      if (entry.optional) continue; // platform-specific builds of other systems are skipped
      return false;
    }
    if (found.version !== entry.version) return false;
  }
  return Object.keys(have).every((key) => key in wanted);
}

/** 'missing' | 'stale' | 'fresh' for the node_modules of `dir`. */
export function installState(dir) {
  const lockFile = path.join(dir, 'package-lock.json');
  if (!existsSync(lockFile)) throw new Error(`No package-lock.json in ${dir}: the lockfile is part of the repository.`);
  if (!existsSync(path.join(dir, 'node_modules'))) return 'missing';
  const lockText = readFileSync(lockFile, 'utf8');
  const hashFile = path.join(dir, HASH_FILE);
  if (existsSync(hashFile) && readFileSync(hashFile, 'utf8').trim() === lockHash(lockText)) return 'fresh';
  const hidden = path.join(dir, 'node_modules', '.package-lock.json');
  if (!existsSync(hidden)) return 'stale';
  try {
    if (!installedTreeMatches(JSON.parse(lockText), JSON.parse(readFileSync(hidden, 'utf8')))) return 'stale';
  } catch {
    return 'stale';
  }
  writeFileSync(hashFile, `${lockHash(lockText)}\n`);
  return 'fresh';
}

/** tsx, vite and vitest of this lock need Node 20.19+ (or 22.12+). */
export function nodeSupported(version) {
  const [major, minor] = version.replace(/^v/, '').split('.').map(Number);
  return (major === 20 && minor >= 19) || (major === 22 && minor >= 12) || major > 22;
}

function install() {
  const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.error) throw new Error(`npm ci could not run: ${result.error.message}`);
  if (result.status !== 0) throw new Error(`npm ci failed with exit code ${result.status ?? result.signal}`);
  const lockText = readFileSync(path.join(root, 'package-lock.json'), 'utf8');
  writeFileSync(path.join(root, HASH_FILE), `${lockHash(lockText)}\n`);
}

function run(command, args) {
  const child = spawn(process.execPath, ['--import', 'tsx', path.join('scripts', `${command}.ts`), ...args], {
    cwd: root,
    stdio: 'inherit',
  });
  // The child shares our terminal: a Ctrl-C reaches it directly. A signal sent only to us
  // (npm forwarding SIGTERM) is passed on; either way we wait for the child's own exit.
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP']) {
    process.on(signal, () => {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
    });
  }
  // `kill <npm pid>` ends npm and its `sh -c` without passing the signal on; we would be left
  // running with the whole stack. Noticing the new parent (pid 1) stops the script cleanly.
  const parent = process.ppid;
  const watchdog = setInterval(() => {
    if (process.ppid !== parent && child.exitCode === null) child.kill('SIGTERM');
  }, 500);
  watchdog.unref();
  child.on('error', (error) => {
    console.error(`[pinfield] could not run scripts/${command}.ts: ${error.message}`);
    process.exit(1);
  });
  child.on('exit', (code, signal) => {
    if (signal) {
      process.removeAllListeners(signal);
      process.kill(process.pid, signal);
    }
    process.exit(code ?? 1);
  });
}

function main() {
  const [command, ...args] = process.argv.slice(2);
  if (!commands.includes(command)) {
    console.error(`[pinfield] usage: node scripts/bootstrap.mjs <${commands.join('|')}> [args]`);
    process.exit(2);
  }
  if (!nodeSupported(process.version)) {
    console.error(`[pinfield] Node.js ${process.version} is too old: install Node.js 20.19 or newer (20.x or 22.12+).`);
    process.exit(1);
  }
  try {
    const state = installState(root);
    if (state !== 'fresh') {
      console.log(
        `[pinfield] dependencies ${state === 'missing' ? 'are not installed' : 'do not match package-lock.json'}: running npm ci`,
      );
      install();
    }
  } catch (error) {
    console.error(`[pinfield] ${error instanceof Error ? error.message : String(error)}`);
    process.exit(1);
  }
  run(command, args);
}

if (process.argv[1] && pathToFileURL(path.resolve(process.argv[1])).href === import.meta.url) main();
