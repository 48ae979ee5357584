import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { cdpPort } from './env';

const root = path.resolve(import.meta.dirname, '..', '..', '..');

/** Flags from STACK.md plus the CDP endpoint; nothing here may reach off the machine. */
export function chromiumArgs(userDataDir: string, port: number): string[] {
  return [
    '--headless',
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--no-default-browser-check',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
    '--disable-default-apps',
    '--disable-domain-reliability',
    '--disable-client-side-phishing-detection',
    '--disable-features=Translate,OptimizationHints,MediaRouter',
    '--disable-dev-shm-usage',
    '--mute-audio',
    '--autoplay-policy=no-user-gesture-required',
    `--user-data-dir=${userDataDir}`,
    '--remote-debugging-address=127.0.0.1',
    `--remote-debugging-port=${port}`,
    'about:blank',
  ];
}

function assertPortFree(port: number): Promise<void> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', () =>
      reject(new Error(`Port ${port} (chromium's debugging port) is taken: a browser from an earlier run may still be open.`)),
    );
    server.listen(port, '127.0.0.1', () => server.close(() => resolve()));
  });
}

async function waitForCdp(browser: ChildProcess, port: number, output: () => string): Promise<void> {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (browser.exitCode !== null || browser.signalCode !== null) {
      throw new Error(`chromium exited (${browser.exitCode ?? browser.signalCode}) before it was ready:\n${output()}`);
    }
    try {
      const response = await fetch(`http://127.0.0.1:${port}/json/version`);
      if (response.ok) return;
    } catch {
      // Not listening yet.
    }
    await sleep(100);
  }
  throw new Error(`chromium did not open its debugging port ${port} within 30 s:\n${output()}`);
}

/**
 * Starts one headless Debian chromium for every e2e file (they connect over CDP) and closes it
 * afterwards. It stays in vitest's process group, so stopping `npm test` stops it too.
 */
export default async function setup(): Promise<() => Promise<void>> {
  const port = cdpPort();
  await assertPortFree(port);
  const base = path.join(root, '.data', 'test');
  mkdirSync(base, { recursive: true });
  const userDataDir = mkdtempSync(path.join(base, 'chromium-'));
  const browser = spawn('/usr/bin/chromium', chromiumArgs(userDataDir, port), { stdio: ['ignore', 'ignore', 'pipe'] });
  let stderr = '';
  browser.stderr?.on('data', (chunk: Buffer) => {
    stderr = (stderr + chunk.toString()).slice(-4000);
  });
  const exited = new Promise<void>((resolve) => browser.once('exit', () => resolve()));
  try {
    await waitForCdp(browser, port, () => stderr);
  } catch (error) {
    browser.kill('SIGKILL');
    throw error;
  }

  return async () => {
    browser.kill('SIGTERM');
    const closed = await Promise.race([exited.then(() => true), sleep(10_000).then(() => false)]);
    if (!closed) {
      browser.kill('SIGKILL');
      await exited;
    }
    rmSync(userDataDir, { recursive: true, force: true });
  };
}
