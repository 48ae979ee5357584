import { describe, expect, it } from 'vitest';
import { baseUrl, expectOnlyLoopback, openPage, requestsOf, screenshot, takeBlockedRequests } from './support/browser';

describe('landing page', () => {
  const sizes = [
    { name: 'desktop', width: 1280, height: 800, mobile: false },
    { name: 'phone', width: 390, height: 844, mobile: true },
  ] as const;

  for (const size of sizes) {
    it(`loads with a heading at ${size.name} width (${size.width}x${size.height}) using only this machine`, async () => {
      const page = await openPage(size);
      const response = await page.goto(`${baseUrl}/`, { waitUntil: 'load' });
      expect(response?.status()).toBe(200);
      const heading = page.getByRole('heading', { level: 1 }).first();
      await heading.waitFor({ state: 'visible' });
      expect((await heading.innerText()).trim()).not.toBe('');
      await page.waitForLoadState('networkidle');
      // The page really loaded its assets (so the loopback check below had something to check).
      expect(requestsOf(page).some((url) => url.startsWith(`${baseUrl}/assets/`))).toBe(true);
      expectOnlyLoopback(page);
      await screenshot(page, `landing-${size.name}`);
    });
  }
});

describe('off-machine guard', () => {
  it('blocks and reports a request to a host that is not loopback', async () => {
    const page = await openPage({ width: 800, height: 600 });
    // 198.51.100.0/24 is a documentation range: the request is aborted before it could leave.
    await page.setContent('<img src="http://198.51.100.7/pixel.png" alt="">', { waitUntil: 'load' });
    expect(() => expectOnlyLoopback(page)).toThrow(/198\.51\.100\.7/);
    expect(takeBlockedRequests(page)).toEqual(['http://198.51.100.7/pixel.png']);
    expectOnlyLoopback(page);
  });
});
