import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, screenshot, viewports, watchForeignRequests } from './browser';
import { register, shootBoth } from './flows';

const baseUrl = inject('baseUrl');
const outputDir = inject('outputDir');
const stamp = Date.now().toString(36);
// The demo seed (backend/src/database/seeds): every demo account has this password; Tamsin
// overrode Kofi's latest graded attempt to Pass 78/100 with a comment.
const demoPassword = 'mixmark-demo';

async function signIn(page: Page, email: string, home: string) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(demoPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: home }).waitFor();
}

/** The top of an element on the page, to check what comes first. */
const topOf = async (page: Page, name: string) =>
  (await page.getByRole('region', { name }).boundingBox())!.y;

describe("a teacher's mark and a role change in Chromium", () => {
  let browser: Browser;
  let close: () => Promise<void>;
  let attemptUrl = '';
  const foreign: string[] = [];

  beforeAll(async () => {
    ({ browser, close } = await launchBrowser());
  });
  afterAll(async () => {
    await close?.();
  });

  it("should show an overridden attempt with the teacher's mark first, to the student and to the teacher", async () => {
    const student = await (await browser.newContext({ viewport: viewports.phone })).newPage();
    foreign.push(...watchForeignRequests(student, baseUrl));
    await signIn(student, 'kofi@saltmarsh-lane.test', 'Your assignments');
    await student.getByRole('link', { name: 'History' }).click();
    await student.getByRole('heading', { name: 'Your attempts' }).waitFor();
    const row = student.getByRole('row').filter({ hasText: "(teacher's mark)" });
    await expect.poll(() => row.count()).toBe(1);
    await expect.poll(() => row.textContent()).toContain('Pass · 78/100');
    await shootBoth(student, outputDir, 'student-history-overridden');
    await row.getByRole('link', { name: 'Open' }).click();
    await student.waitForURL(/\/attempts\//);
    attemptUrl = student.url();

    const teacherMark = student.getByRole('region', { name: "The teacher's mark" });
    await teacherMark.waitFor();
    expect(await teacherMark.textContent()).toContain('Pass · 78/100');
    expect(await teacherMark.textContent()).toContain('This is the mark that stands.');
    await teacherMark.getByText(/the ladder reads evenly from across the room/).waitFor();
    await teacherMark.getByText(/^Marked by Tamsin Arvello on /).waitFor();
    const machine = student.getByRole('region', { name: 'What the machine measured' });
    await machine
      .getByText(/^The machine measured ΔE00 .+ and marked it (Pass|Not yet) · \d+\/100\./)
      .waitFor();
    await machine.getByRole('heading', { name: "The machine's advice" }).waitFor();
    expect(await topOf(student, "The teacher's mark")).toBeLessThan(
      await topOf(student, 'What the machine measured'),
    );
    await shootBoth(student, outputDir, 'student-result-teacher-first');

    const teacher = await (await browser.newContext({ viewport: viewports.desk })).newPage();
    foreign.push(...watchForeignRequests(teacher, baseUrl));
    await signIn(teacher, 'tamsin@saltmarsh-lane.test', 'Your studio');
    await teacher.goto(attemptUrl);
    const own = teacher.getByRole('region', { name: "The teacher's mark" });
    await own.getByText(/^Marked by you on /).waitFor();
    expect(await topOf(teacher, "The teacher's mark")).toBeLessThan(
      await topOf(teacher, 'What the machine measured'),
    );
    expect(await teacher.getByLabel('Score (0–100)').inputValue()).toBe('78');
    await shootBoth(teacher, outputDir, 'teacher-review-overridden');
  });

  it('should ask before changing a role, keep the old one on cancel and change it on confirm', async () => {
    const newcomer = await (await browser.newContext({ viewport: viewports.phone })).newPage();
    const name = `Wren Halloway ${stamp}`;
    await register(newcomer, baseUrl, {
      role: 'student',
      name,
      email: `wren.${stamp}@example.test`,
      password: 'a long enough password',
    });
    await newcomer.getByRole('heading', { name: 'Your assignments' }).waitFor();

    const admin = await (await browser.newContext({ viewport: viewports.desk })).newPage();
    foreign.push(...watchForeignRequests(admin, baseUrl));
    await signIn(admin, 'admin@mixmark.test', 'Accounts and roles');
    await admin.getByLabel('Find by name or e-mail').fill(stamp);
    const select = admin.getByRole('combobox', { name: `Role of ${name}` });
    await select.click();
    await admin.getByRole('option', { name: 'teacher' }).click();
    const dialog = admin.getByRole('dialog', { name: `Make ${name} a teacher?` });
    await dialog.waitFor();
    expect(await dialog.textContent()).toContain(`is a student now and would become a teacher.`);
    await shootBoth(admin, outputDir, 'admin-role-confirm');
    await dialog.getByRole('button', { name: 'Keep them a student' }).click();
    await dialog.waitFor({ state: 'hidden' });
    expect(await select.textContent()).toBe('student');

    await select.click();
    await admin.getByRole('option', { name: 'teacher' }).click();
    await dialog.getByRole('button', { name: 'Make them a teacher' }).click();
    await admin
      .getByRole('status')
      .filter({ hasText: `${name} is now a teacher.` })
      .waitFor();
    await expect.poll(() => select.textContent()).toBe('teacher');
    await screenshot(admin, outputDir, 'admin-role-changed');
    expect(foreign).toEqual([]);
  });
});
