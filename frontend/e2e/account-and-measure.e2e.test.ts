import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, viewports, watchForeignRequests } from './browser';
import { register, shootBoth } from './flows';
import { renderSyntheticPhoto } from './synthetic-photo';

const baseUrl = inject('baseUrl');
const outputDir = inject('outputDir');
const stamp = Date.now().toString(36);
const password = 'a long enough password';

describe('the account page and the teacher’s own swatch in Chromium', () => {
  let browser: Browser;
  let close: () => Promise<void>;

  beforeAll(async () => {
    ({ browser, close } = await launchBrowser());
  });
  afterAll(async () => {
    await close?.();
  });

  it('should turn the weekly progress e-mail off from the user menu, and keep it off', async () => {
    const context = await browser.newContext({ viewport: viewports.phone });
    const page = await context.newPage();
    const foreign = watchForeignRequests(page, baseUrl);
    await register(page, baseUrl, {
      role: 'student',
      name: 'Wren Achterberg',
      email: `wren.${stamp}@example.test`,
      password,
    });
    await page.getByRole('heading', { name: 'Your assignments' }).waitFor();

    await page.getByRole('button', { name: 'Wren Achterberg' }).click();
    await page.getByRole('menu', { name: 'Your account' }).waitFor();
    await shootBoth(page, outputDir, 'user-menu');
    await page.getByRole('menuitem', { name: 'Account settings' }).click();
    await page.getByRole('heading', { name: 'Your account' }).waitFor();
    const digest = page.getByRole('switch', { name: 'Weekly progress e-mail' });
    expect(await digest.isChecked()).toBe(true);
    await digest.click();
    await page.getByLabel('Display name').fill('Wren A.');
    await page.getByRole('button', { name: 'Save' }).click();
    await page.getByText('Saved.').waitFor();
    await page.getByRole('button', { name: 'Wren A.' }).waitFor();
    await shootBoth(page, outputDir, 'account');

    // A fresh load asks the server again: the choice was stored.
    await page.reload();
    await page.getByRole('heading', { name: 'Your account' }).waitFor();
    expect(await page.getByRole('switch', { name: 'Weekly progress e-mail' }).isChecked()).toBe(
      false,
    );
    expect(await page.getByLabel('Display name').inputValue()).toBe('Wren A.');
    expect(foreign).toEqual([]);
    await context.close();
  });

  it('should fill a new drill’s target from a photo of the teacher’s own painted swatch', async () => {
    const context = await browser.newContext({ viewport: viewports.desk });
    const page = await context.newPage();
    await register(page, baseUrl, {
      role: 'teacher',
      name: 'Ines Morrow',
      email: `ines.${stamp}@example.test`,
      password,
    });
    await page.getByRole('heading', { name: 'Your studio' }).waitFor();
    await page.goto(`${baseUrl}/teacher/drills/new`);
    await page.getByRole('heading', { name: 'New drill' }).waitFor();
    await page.getByRole('button', { name: 'Measure my painted swatch' }).click();

    const painted = { L: 62, a: -18, b: 24 };
    const jpeg = renderSyntheticPhoto({
      kind: 'match',
      swatches: [painted],
      width: 1600,
      height: 1200,
      cardFraction: 0.5,
      rotation: 10,
      tiltX: 3,
      tiltY: -3,
      ev: 0,
      cast: 'neutral',
      crossTalk: 0.01,
      flare: 0.01,
      vignetting: 0.1,
      noise: 1.5,
      jpegQuality: 90,
      seed: 11,
    });
    await page
      .getByLabel('Take or choose the photo')
      .setInputFiles({ name: 'my-swatch.jpg', mimeType: 'image/jpeg', buffer: jpeg });
    await page
      .getByText(/Measured 1 window: the targets above now hold your swatch/)
      .waitFor({ timeout: 60_000 });
    const target = page.getByRole('group', { name: 'Target 1' });
    const L = Number(await target.getByLabel('L*').inputValue());
    const b = Number(await target.getByLabel('b*').inputValue());
    expect(Math.abs(L - painted.L)).toBeLessThan(3);
    expect(Math.abs(b - painted.b)).toBeLessThan(4);
    await shootBoth(page, outputDir, 'drill-measure');

    // A photo without a card says so in words.
    await page
      .getByLabel('Measure another photo')
      .setInputFiles({
        name: 'not-a-photo.jpg',
        mimeType: 'image/jpeg',
        buffer: Buffer.from('not a jpeg'),
      });
    await page.getByText(/The swatch could not be measured\./).waitFor({ timeout: 30_000 });
    await context.close();
  });

  it('should fill a paint’s swatch in the palette from a photo of it under a card', async () => {
    const context = await browser.newContext({ viewport: viewports.phone });
    const page = await context.newPage();
    const foreign = watchForeignRequests(page, baseUrl);
    await register(page, baseUrl, {
      role: 'student',
      name: 'Odile Farrant',
      email: `odile.${stamp}@example.test`,
      password,
    });
    await page.getByRole('heading', { name: 'Your assignments' }).waitFor();
    await page.goto(`${baseUrl}/palette`);
    await page.getByRole('heading', { name: 'My palette' }).waitFor();
    await page.getByLabel('Name', { exact: true }).fill('Muted sea green');
    await page.getByRole('button', { name: 'Measure from a photo' }).click();

    const painted = { L: 58, a: -24, b: 6 };
    const jpeg = renderSyntheticPhoto({
      kind: 'match',
      swatches: [painted],
      width: 1600,
      height: 1200,
      cardFraction: 0.5,
      rotation: -8,
      tiltX: 2,
      tiltY: 3,
      ev: 0,
      cast: 'neutral',
      crossTalk: 0.01,
      flare: 0.01,
      vignetting: 0.1,
      noise: 1.5,
      jpegQuality: 90,
      seed: 23,
    });
    await page
      .getByLabel('Take or choose the photo')
      .setInputFiles({ name: 'sea-green.jpg', mimeType: 'image/jpeg', buffer: jpeg });
    await page
      .getByText('Measured: the reading is in the form. Save the paint to keep it.')
      .waitFor({ timeout: 60_000 });
    const L = Number(await page.getByLabel('L*', { exact: true }).inputValue());
    const a = Number(await page.getByLabel('a*', { exact: true }).inputValue());
    expect(Math.abs(L - painted.L)).toBeLessThan(3);
    expect(Math.abs(a - painted.a)).toBeLessThan(4);
    await page.getByRole('img', { name: /This paint's swatch/ }).waitFor();
    await shootBoth(page, outputDir, 'palette-measure');

    await page.getByRole('button', { name: 'Add paint' }).click();
    await page.getByRole('img', { name: /Muted sea green, measured/ }).waitFor();
    expect(foreign).toEqual([]);
    await context.close();
  });
});
