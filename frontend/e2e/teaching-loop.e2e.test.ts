import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchBrowser, screenshot, viewports, watchForeignRequests } from './browser';
import { register, shootBoth } from './flows';
import { renderSyntheticPhoto } from './synthetic-photo';

const baseUrl = inject('baseUrl');
const outputDir = inject('outputDir');
const stamp = Date.now().toString(36);
const password = 'a long enough password';
const drillTitle = `Burnt orange match ${stamp}`;

/** Picks an option of an MUI select by its visible label. */
async function choose(page: Page, label: string, option: string) {
  await page.getByRole('combobox', { name: label }).click();
  await page.getByRole('option', { name: option }).click();
}

describe('the teaching loop in Chromium', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  let teacherContext: BrowserContext;
  let studentContext: BrowserContext;
  let teacher: Page;
  let student: Page;
  let classCode = '';
  let attemptUrl = '';
  let teacherForeign: string[] = [];
  let studentForeign: string[] = [];

  beforeAll(async () => {
    ({ browser, close } = await launchBrowser());
    teacherContext = await browser.newContext({ viewport: viewports.desk });
    studentContext = await browser.newContext({ viewport: viewports.phone });
    teacher = await teacherContext.newPage();
    student = await studentContext.newPage();
    teacherForeign = watchForeignRequests(teacher, baseUrl);
    studentForeign = watchForeignRequests(student, baseUrl);
  });
  afterAll(async () => {
    await close?.();
  });

  it('should let a teacher sign up, create a class and a drill, and assign it', async () => {
    await shootBothAfter(teacher, `${baseUrl}/sign-in`, 'sign-in', () => teacher.getByRole('heading', { name: 'Sign in' }).waitFor());
    await register(teacher, baseUrl, { role: 'teacher', name: 'Marta Ocheltree', email: `marta.${stamp}@example.test`, password });
    await teacher.getByRole('heading', { name: 'Your studio' }).waitFor();

    await teacher.getByLabel('New class name').fill('Thursday watercolour');
    await teacher.getByRole('button', { name: 'Create class' }).click();
    await teacher.getByRole('link', { name: /Thursday watercolour/ }).click();
    await teacher.getByRole('heading', { name: 'Thursday watercolour' }).waitFor();
    const codeLabel = await teacher.getByLabel(/^Class code /).getAttribute('aria-label');
    classCode = (codeLabel ?? '').replace('Class code ', '').replace(/\s/g, '');
    expect(classCode).toMatch(/^[23456789A-Z]{6}$/);
    await shootBoth(teacher, outputDir, 'teacher-class');

    await teacher.goto(`${baseUrl}/teacher/drills/new`);
    await teacher.getByRole('heading', { name: 'New drill' }).waitFor();
    await teacher.getByLabel('Title').fill(drillTitle);
    await teacher.getByLabel('Instructions for the student').fill('Mix a burnt orange from the warm red and the warm yellow, greyed with a touch of blue.');
    await teacher.getByRole('button', { name: 'Lab', exact: true }).click();
    await teacher.getByLabel('L*').fill('52');
    await teacher.getByLabel('a*').fill('28');
    await teacher.getByLabel('b*').fill('40');
    await teacher.getByRole('button', { name: 'Add a paint' }).click();
    await teacher.getByLabel('Paint 1 name').fill('Deep yellow');
    await teacher.getByLabel('Paint 1 pigments').fill('PY35');
    await teacher.getByText('Handle with care').waitFor();
    await choose(teacher, 'Who can see it', 'Everyone, in the public practice library');
    await shootBoth(teacher, outputDir, 'drill-editor');
    await teacher.getByRole('button', { name: 'Create the drill' }).click();
    await teacher.getByRole('heading', { name: 'Your drills' }).waitFor();
    await teacher.getByRole('heading', { name: drillTitle }).waitFor();
    await shootBoth(teacher, outputDir, 'teacher-drills');

    await teacher.getByRole('link', { name: `Assign ${drillTitle}` }).click();
    await teacher.getByRole('heading', { name: 'Assign a drill' }).waitFor();
    await choose(teacher, 'Class', 'Thursday watercolour');
    await teacher.getByLabel('Note for the students (optional)').fill('Let each layer dry before you judge it.');
    await shootBoth(teacher, outputDir, 'assign');
    await teacher.getByRole('button', { name: 'Assign' }).click();
    await teacher.getByRole('heading', { name: 'Thursday watercolour' }).waitFor();
    await teacher.getByRole('cell', { name: drillTitle, exact: true }).waitFor();
  });

  it('should let a student join by code, upload a photo and see the mark', async () => {
    await register(student, baseUrl, { role: 'student', name: 'Pip Lindqvist', email: `pip.${stamp}@example.test`, password });
    await student.getByRole('heading', { name: 'Your assignments' }).waitFor();
    await student.getByText('No assignments yet').waitFor();
    await student.getByRole('link', { name: 'Join a class', exact: true }).click();
    await student.getByLabel('Class code').fill(classCode.toLowerCase());
    await student.getByRole('button', { name: 'Join the class' }).click();
    await student.getByText(/You joined Thursday watercolour/).waitFor();
    await student.getByRole('heading', { name: 'Your assignments' }).waitFor();
    await student.getByRole('heading', { name: drillTitle }).waitFor();
    await shootBoth(student, outputDir, 'student-assignments');

    await student.getByRole('link', { name: `Open ${drillTitle}` }).click();
    await student.getByRole('heading', { name: drillTitle }).waitFor();
    await student.getByText('How to photograph your swatch').waitFor();
    await student.getByRole('img', { name: /Preview of the reference card/ }).waitFor();
    await student.getByText(/Print at 100 %, no scaling, on matte paper/).waitFor();
    await shootBoth(student, outputDir, 'student-drill');

    const jpeg = renderSyntheticPhoto({
      kind: 'match', swatches: [{ L: 52, a: 28, b: 40 }], width: 1600, height: 1200, cardFraction: 0.45,
      rotation: 8, tiltX: 6, tiltY: -4, ev: -0.3, cast: 'shade', crossTalk: 0.01, flare: 0.01,
      vignetting: 0.1, noise: 1.5, jpegQuality: 90, seed: 7,
    });
    await student.locator('input[type=file]').setInputFiles({ name: 'swatch.jpg', mimeType: 'image/jpeg', buffer: jpeg });
    await student.getByText('Ready to send: swatch.jpg').waitFor();
    await student.getByRole('button', { name: 'Send for marking' }).click();
    await student.waitForURL(/\/attempts\//);
    attemptUrl = student.url();
    await student.getByText(/^(Pass|Not yet) · \d+\/100$/).waitFor({ timeout: 60_000 });
    await student.getByRole('heading', { name: 'What to change' }).waitFor();
    await student.getByRole('img', { name: /measured window marked/ }).waitFor();
    await shootBoth(student, outputDir, 'student-result');
    await student.getByLabel('Value only (greyscale)').check();
    await screenshot(student, outputDir, 'student-result-greyscale');

    await student.getByRole('link', { name: 'History' }).click();
    await student.getByRole('heading', { name: 'Your attempts' }).waitFor();
    await student.getByRole('cell', { name: drillTitle, exact: true }).waitFor();
    await shootBoth(student, outputDir, 'student-history');

    await student.getByRole('link', { name: 'Progress', exact: true }).click();
    await student.getByRole('heading', { name: 'Your progress' }).waitFor();
    await student.getByRole('figure', { name: 'Overall difference (ΔE00)' }).locator('svg').first().waitFor();
    await student.getByRole('table', { name: /The same numbers, week by week/ }).waitFor();
    await student.getByText('Practice streak').waitFor();
    await shootBoth(student, outputDir, 'student-progress');

    await student.getByRole('link', { name: 'My palette', exact: true }).click();
    await student.getByRole('heading', { name: 'My palette' }).waitFor();
    await student.getByLabel('Name').fill('Deep yellow');
    await student.getByLabel('Pigments').fill('PY35, PY154');
    await student.getByRole('button', { name: 'Add paint' }).click();
    await student.getByRole('heading', { name: 'Deep yellow' }).waitFor();
    await student.getByText('Handle with care').waitFor();
    await shootBoth(student, outputDir, 'student-palette');
  });

  it('should word the error when the upload is not a photo', async () => {
    await student.getByRole('link', { name: 'Assignments' }).click();
    await student.getByRole('link', { name: `Open ${drillTitle}` }).click();
    await student.locator('input[type=file]').setInputFiles({
      name: 'notes.txt', mimeType: 'text/plain', buffer: Buffer.from('not a photo of a swatch\n'),
    });
    await student.getByRole('button', { name: 'Send for marking' }).click();
    const alert = student.getByRole('alert');
    await alert.waitFor();
    expect((await alert.textContent())?.length).toBeGreaterThan(10);
    await shootBoth(student, outputDir, 'student-upload-error');
  });

  it('should let the teacher review the attempt and override the mark', async () => {
    await teacher.getByRole('link', { name: 'Dashboard' }).click();
    await teacher.getByRole('heading', { name: 'Your studio' }).waitFor();
    await shootBoth(teacher, outputDir, 'teacher-dashboard');
    await teacher.getByRole('link', { name: `Attempts for ${drillTitle}` }).click();
    await teacher.getByRole('cell', { name: 'Pip Lindqvist' }).waitFor();
    await teacher.getByRole('link', { name: 'Review' }).click();
    await teacher.getByRole('heading', { name: `Pip Lindqvist: ${drillTitle}` }).waitFor();
    await teacher.getByRole('img', { name: 'Photo sent by Pip Lindqvist' }).waitFor();
    await teacher.getByLabel('Score (0–100)').fill('74');
    await teacher.getByLabel('Not yet').check();
    await teacher.getByLabel('Comment for the student').fill('The value is right; the mix is a little too grey. Less blue next time.');
    await teacher.getByRole('button', { name: 'Save the mark' }).click();
    await teacher.getByText('Mark saved; the student has been told.').waitFor();
    await shootBoth(teacher, outputDir, 'teacher-review');

    await student.goto(attemptUrl);
    await student.getByText('Not yet · 74/100').waitFor();
    await student.getByText(/Less blue next time/).waitFor();
    await screenshot(student, outputDir, 'student-result-overridden');
  });

  it('should let the teacher open the gradebook, download it as CSV and see progress', async () => {
    await teacher.getByRole('link', { name: 'Dashboard' }).click();
    await teacher.getByRole('link', { name: /Thursday watercolour/ }).first().click();
    await teacher.getByRole('heading', { name: 'Thursday watercolour' }).waitFor();
    await teacher.getByRole('figure', { name: 'Pass rate' }).locator('svg').first().waitFor();
    await shootBoth(teacher, outputDir, 'teacher-class-progress');

    await teacher.getByRole('link', { name: 'Gradebook' }).click();
    await teacher.getByRole('heading', { name: 'Gradebook: Thursday watercolour' }).waitFor();
    const cell = teacher.getByRole('link', { name: new RegExp(`^Pip Lindqvist, ${drillTitle}: best \\d+`) });
    await cell.waitFor();
    await teacher.getByLabel('Filter by name or e-mail').fill('pip');
    await cell.waitFor();
    const [download] = await Promise.all([teacher.waitForEvent('download'), teacher.getByRole('button', { name: 'Download CSV' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^gradebook-.+\.csv$/);
    await shootBoth(teacher, outputDir, 'teacher-gradebook');
    await cell.click();
    await teacher.getByRole('heading', { name: `Pip Lindqvist: ${drillTitle}` }).waitFor();

    await teacher.goBack();
    await teacher.getByRole('link', { name: 'Back to the class' }).click();
    await teacher.getByRole('link', { name: 'Pip Lindqvist: progress' }).click();
    await teacher.getByRole('heading', { name: 'Progress of Pip Lindqvist' }).waitFor();
    await teacher.getByRole('figure', { name: 'Value error (|ΔL*|)' }).locator('svg').first().waitFor();
    await shootBoth(teacher, outputDir, 'teacher-student-progress');
    expect([...teacherForeign, ...studentForeign]).toEqual([]);
  });
});

async function shootBothAfter(page: Page, url: string, name: string, ready: () => Promise<unknown>) {
  await page.goto(url);
  await ready();
  await shootBoth(page, outputDir, name);
}
