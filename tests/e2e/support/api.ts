import type { Page } from 'playwright-core';
import { baseUrl } from './browser';

export interface ApiAnswer<T> {
  status: number;
  body: T;
}

/**
 * Calls the API as the page's signed-in person (its cookies), with the CSRF token a page would send.
 * For setting up what a test is not about; what a test checks goes through the page.
 */
export async function apiAs<T = unknown>(page: Page, method: string, path: string, body?: unknown): Promise<ApiAnswer<T>> {
  const request = page.context().request;
  const csrf = (await (await request.get(`${baseUrl}/api/auth/csrf`)).json()) as { csrfToken: string };
  const response = await request.fetch(`${baseUrl}/api${path}`, {
    method,
    headers: { 'x-csrf-token': csrf.csrfToken, ...(body === undefined ? {} : { 'content-type': 'application/json' }) },
    ...(body === undefined ? {} : { data: JSON.stringify(body) }),
  });
  const text = await response.text();
  return { status: response.status(), body: (text ? JSON.parse(text) : null) as T };
}

/** The id of a demo recording by its title, once it is ready (the seed's clips are processed at start-up). */
export async function readyRecordingId(page: Page, title: string): Promise<string> {
  for (let tries = 0; tries < 120; tries += 1) {
    const { body } = await apiAs<{ recordings: { id: string; title: string; state: string }[] }>(page, 'GET', '/recordings');
    const found = body.recordings.find((recording) => recording.title === title);
    if (found?.state === 'ready') return found.id;
    await page.waitForTimeout(500);
  }
  throw new Error(`The demo recording “${title}” did not become ready.`);
}
