import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, afterEach } from 'vitest';
import type { StoredMessage } from '../../../fake-services/mail-store';
import { cdpPort, e2eEnv } from './env';
import { isLoopbackUrl } from './loopback';

export { isLoopbackUrl } from './loopback';

const root = path.resolve(import.meta.dirname, '..', '..', '..');
export const screenshotDir = path.join(root, 'test-results', 'screenshots');

/** The app under test, e.g. http://127.0.0.1:4320 (no trailing slash). */
export const baseUrl = e2eEnv.baseUrl;

interface Traffic {
  context: BrowserContext;
  /** Every request the page made (after our filter let it through or not). */
  requests: string[];
  /** Requests to a host off this machine: aborted before they left, kept here for the check. */
  blocked: string[];
}

const traffic = new Map<Page, Traffic>();
let browser: Browser | null = null;

/** Connects to the chromium that global-setup.ts started (one per run, shared by all files). */
export async function connect(): Promise<Browser> {
  browser ??= await chromium.connectOverCDP(`http://127.0.0.1:${cdpPort()}`);
  return browser;
}

export interface PageOptions {
  width: number;
  height: number;
  /** Touch and mobile viewport behaviour, for phone widths. */
  mobile?: boolean;
}

/**
 * A fresh context (no cookies) and page. Every request is recorded; one whose host is not
 * loopback is aborted and recorded as blocked, and fails the test in afterEach.
 */
export async function openPage(options: PageOptions = { width: 1280, height: 800 }): Promise<Page> {
  const connected = await connect();
  const context = await connected.newContext({
    viewport: { width: options.width, height: options.height },
    ...(options.mobile ? { isMobile: true, hasTouch: true, deviceScaleFactor: 2 } : {}),
  });
  const record: Traffic = { context, requests: [], blocked: [] };
  await context.route('**/*', async (route) => {
    const url = route.request().url();
    if (isLoopbackUrl(url)) return route.continue();
    record.blocked.push(url);
    return route.abort('blockedbyclient');
  });
  await context.routeWebSocket(/.*/, (socket) => {
    if (isLoopbackUrl(socket.url())) return socket.connectToServer();
    record.blocked.push(socket.url());
    return socket.close();
  });
  context.on('request', (request) => record.requests.push(request.url()));
  const page = await context.newPage();
  traffic.set(page, record);
  return page;
}

function recordOf(page: Page): Traffic {
  const record = traffic.get(page);
  if (!record) throw new Error('This page was not opened with openPage(), so its requests were not recorded.');
  return record;
}

/** Every URL the page requested so far. */
export function requestsOf(page: Page): string[] {
  return [...recordOf(page).requests];
}

/** Returns the off-machine requests seen so far and forgets them (for tests of the guard itself). */
export function takeBlockedRequests(page: Page): string[] {
  const record = recordOf(page);
  return record.blocked.splice(0, record.blocked.length);
}

/** Throws, listing them, if the page requested any host other than loopback. */
export function expectOnlyLoopback(page: Page): void {
  const blocked = recordOf(page).blocked;
  if (blocked.length > 0) {
    throw new Error(`The page requested hosts off this machine (blocked):\n  ${[...new Set(blocked)].join('\n  ')}`);
  }
}

/** Saves a full-page PNG as test-results/screenshots/<name>.png and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  if (!/^[a-z0-9][a-z0-9-]*$/.test(name)) throw new Error(`Screenshot name "${name}" must be kebab-case (a-z, 0-9, -).`);
  mkdirSync(screenshotDir, { recursive: true });
  const file = path.join(screenshotDir, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/**
 * Polls the SMTP fake's JSON inbox until at least `min` messages to `to` arrived (newest first).
 * A wait, not an assertion on time: the error says what never arrived.
 */
export async function readInbox(to: string, options: { min?: number; timeoutMs?: number } = {}): Promise<StoredMessage[]> {
  const min = options.min ?? 1;
  const deadline = Date.now() + (options.timeoutMs ?? 15_000);
  const url = `${e2eEnv.inboxUrl}/api/messages?to=${encodeURIComponent(to)}`;
  for (;;) {
    const response = await fetch(url);
    if (!response.ok) throw new Error(`The inbox answered ${response.status} for ${url}: ${await response.text()}`);
    const { messages } = (await response.json()) as { messages: StoredMessage[] };
    if (messages.length >= min) return messages;
    if (Date.now() > deadline)
      throw new Error(`No ${min > 1 ? `${min} messages` : 'message'} to ${to} arrived (found ${messages.length}).`);
    await sleep(200);
  }
}

// Registered in every file that imports these helpers: no test can forget the loopback check.
afterEach(async () => {
  const problems: string[] = [];
  for (const [page, record] of traffic) {
    if (record.blocked.length > 0) problems.push(...record.blocked);
    traffic.delete(page);
    await record.context.close().catch(() => undefined);
  }
  if (problems.length > 0) {
    throw new Error(`A page requested hosts off this machine (blocked):\n  ${[...new Set(problems)].join('\n  ')}`);
  }
});

afterAll(async () => {
  await browser?.close();
  browser = null;
});
