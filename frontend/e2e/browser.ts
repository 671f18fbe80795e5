import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';

/** Debian's Chromium, headless, with no background network traffic (playwright gives it a fresh temporary profile). */
export async function launchBrowser(): Promise<{ browser: Browser; close: () => Promise<void> }> {
  const browser = await chromium.launch({
    executablePath: process.env.MIXMARK_CHROMIUM ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return {
    browser,
    close: () => browser.close(),
  };
}

export const viewports = {
  phone: { width: 390, height: 844 },
  desk: { width: 1280, height: 800 },
} as const;

/** Saves a full-page screenshot under the test output folder, named by screen and width. */
export async function screenshot(page: Page, outputDir: string, name: string): Promise<string> {
  mkdirSync(outputDir, { recursive: true });
  const width = page.viewportSize()?.width ?? 0;
  const path = join(outputDir, `${name}-${width}.png`);
  // A full-page capture resizes the page, which re-lays out charts that follow their box; on a
  // busy 2-core machine Chromium once sat on such a capture past 30 s (fonts loaded, capture never
  // done). So: animations off, a shorter wait, one more try, then the visible part only (the
  // screenshot is for people to look at; the test's checks are elsewhere).
  for (const attempt of [1, 2]) {
    try {
      await page.screenshot({ path, fullPage: true, animations: 'disabled', timeout: 15_000 });
      return path;
    } catch (error) {
      console.warn(`full-page screenshot ${name}-${width} try ${attempt} failed: ${(error as Error).message.split('\n')[0]}`);
      await page.waitForTimeout(500);
    }
  }
  await page.screenshot({ path, animations: 'disabled', timeout: 15_000 });
  return path;
}

/** Records every request a page makes that leaves the app's own origin. */
export function watchForeignRequests(page: Page, origin: string): string[] {
  const foreign: string[] = [];
  page.on('request', (request) => {
    const url = request.url();
    if (!url.startsWith(origin) && !url.startsWith('data:') && !url.startsWith('blob:')) foreign.push(url);
  });
  return foreign;
}
