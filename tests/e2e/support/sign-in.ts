import type { Page } from 'playwright-core';
import type { StoredMessage } from '../../../fake-services/mail-store';
import { baseUrl, readInbox } from './browser';

/** Signs in through the landing page's Google button and the OpenID Connect stand-in's account picker. */
export async function signInWithPicker(page: Page, email: string): Promise<void> {
  await page.goto(`${baseUrl}/`, { waitUntil: 'load' });
  await page.getByRole('link', { name: 'Continue with Google' }).click();
  const account = page.locator(`[data-account-email="${email}"]`);
  await account.waitFor({ state: 'visible' });
  await account.click();
  await page.waitForURL((url) => url.origin === baseUrl && url.pathname !== '/', { timeout: 20_000 });
}

/** How many messages the inbox holds for an address now, to wait for the next one. */
export async function inboxCount(to: string): Promise<number> {
  return (await readInbox(to, { min: 0 })).length;
}

/** Waits for the message after `before` and returns the first app link in it. */
export async function nextLink(to: string, before: number): Promise<{ message: StoredMessage; link: string }> {
  const [message] = await readInbox(to, { min: before + 1 });
  const link = message?.text.match(/https?:\/\/\S+/)?.[0];
  if (!message || !link) throw new Error(`The newest message to ${to} has no link: ${message?.text ?? '(none)'}`);
  return { message, link };
}
