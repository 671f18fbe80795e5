import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, screenshot, viewports, watchForeignRequests } from './browser';

const baseUrl = inject('baseUrl');
const outputDir = inject('outputDir');

describe('the app shell in Chromium', () => {
  let browser: Browser;
  let close: () => Promise<void>;

  beforeAll(async () => {
    ({ browser, close } = await launchBrowser());
  });
  afterAll(async () => {
    await close?.();
  });

  for (const [label, viewport] of Object.entries(viewports)) {
    it(`should show the start page with the server and database up at ${label} width`, async () => {
      const page = await browser.newPage({ viewport });
      const foreign = watchForeignRequests(page, baseUrl);
      await page.goto(baseUrl);
      await page.getByRole('heading', { name: 'Mix the colour you meant to mix' }).waitFor();
      await page.getByText(/database connected/).waitFor();
      // Nunito is shipped with the app and must be what the heading is drawn in.
      const fontFamily = await page.getByRole('heading', { level: 1 }).evaluate((el) => getComputedStyle(el).fontFamily);
      expect(fontFamily).toMatch(/^"?Nunito/);
      await page.evaluate(() => document.fonts.ready);
      expect(await page.evaluate(() => document.fonts.check('800 16px Nunito'))).toBe(true);
      await screenshot(page, outputDir, 'start');
      expect(foreign).toEqual([]);
      await page.close();
    });
  }

  it('should show its own 404 page for an unknown address, at both widths', async () => {
    for (const viewport of Object.values(viewports)) {
      const page = await browser.newPage({ viewport });
      const response = await page.goto(`${baseUrl}/no/such/page`);
      expect(response?.status()).toBe(200); // the app's router answers, not the server
      await page.getByRole('heading', { name: 'Page not found' }).waitFor();
      await screenshot(page, outputDir, 'not-found');
      await page.getByRole('link', { name: 'Go to the start page' }).click();
      await page.getByRole('heading', { name: 'Mix the colour you meant to mix' }).waitFor();
      await page.close();
    }
  });

  it('should answer API errors as JSON even under the app origin', async () => {
    const page = await browser.newPage();
    const response = await page.goto(`${baseUrl}/api/no-such-route`);
    expect(response?.status()).toBe(404);
    expect(await response?.json()).toMatchObject({ statusCode: 404, code: 'not_found' });
    await page.close();
  });
});
