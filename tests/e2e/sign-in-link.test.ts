import { describe, expect, it } from 'vitest';
import { baseUrl, openPage, screenshot } from './support/browser';
import { inboxCount, nextLink } from './support/sign-in';

const TEACHER = 'bram.ostrowe@fernhollow.example';

describe('sign-in by e-mail link', () => {
  it('works from the mail; a scanner fetching the link first does not use it up; a second use is refused', async () => {
    const before = await inboxCount(TEACHER);
    const page = await openPage();
    await page.goto(`${baseUrl}/`);
    await page.getByLabel('School e-mail address').fill(TEACHER);
    await page.getByRole('button', { name: 'E-mail me a sign-in link' }).click();
    await page.getByText('Check your inbox').waitFor();

    const { message, link } = await nextLink(TEACHER, before);
    expect(message.subject).toBe('Your Pinfield sign-in link');
    expect(new URL(link).origin).toBe(baseUrl);

    // What a school mail filter does: open the link before the person does.
    const scanned = await fetch(link);
    expect(scanned.status).toBe(200);

    await page.goto(link);
    await screenshot(page, 'sign-in-link-page');
    await page.getByRole('button', { name: 'Sign in to Pinfield' }).click();
    await page.waitForURL(`${baseUrl}/teacher`);
    await page.getByRole('heading', { level: 1 }).waitFor();

    const again = await openPage();
    await again.goto(link);
    await again.getByRole('button', { name: 'Sign in to Pinfield' }).click();
    await again.getByText('This sign-in link has expired or was already used').waitFor();
    expect(new URL(again.url()).pathname).toBe('/signin/link');
    await screenshot(again, 'sign-in-link-used');
  });

  it('answers an unknown address with the same notice and sends nothing', async () => {
    const stranger = 'no.such.person@fernhollow.example';
    const page = await openPage();
    await page.goto(`${baseUrl}/`);
    await page.getByLabel('School e-mail address').fill(stranger);
    await page.getByRole('button', { name: 'E-mail me a sign-in link' }).click();
    await page.getByText('If that address belongs to a Pinfield account').waitFor();
    expect(await inboxCount(stranger)).toBe(0);
  });
});
