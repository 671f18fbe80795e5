import { expect } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshot, viewports } from './browser';

/** A full-page screenshot at phone width and at desk width, back at the width it was at. */
export async function shootBoth(page: Page, outputDir: string, name: string) {
  const before = page.viewportSize();
  for (const viewport of Object.values(viewports)) {
    await page.setViewportSize(viewport);
    await page.waitForTimeout(150);
    // Nothing may push the page wider than the screen (wide tables scroll inside their box).
    const scrollWidth = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(scrollWidth, `${name} at ${viewport.width} px`).toBeLessThanOrEqual(viewport.width);
    await screenshot(page, outputDir, name);
  }
  if (before) await page.setViewportSize(before);
}

/** Registers through the app's own form. */
export async function register(
  page: Page,
  baseUrl: string,
  account: { role: 'teacher' | 'student'; name: string; email: string; password: string },
) {
  await page.goto(`${baseUrl}/register${account.role === 'teacher' ? '?role=teacher' : ''}`);
  await page.getByRole('heading', { name: 'Create your account' }).waitFor();
  await page.getByLabel('Your name').fill(account.name);
  await page.getByLabel('E-mail').fill(account.email);
  await page.getByLabel('Password').fill(account.password);
  await page.getByRole('button', { name: 'Create account' }).click();
}
