// Opens every signed-in page at phone width in Debian's Chromium (playwright-core, never a
// downloaded browser) against a running Mixmark with its demo data (`npm start` or `npm run dev`),
// and reports whether the page itself scrolls sideways, naming the elements that stick out past the
// window's right edge (an element inside a box that scrolls or clips on its own does not count: a
// table may scroll inside its own box). Saves a full-page screenshot of each page.
//
// A check to read, not a test: it asserts nothing and exits 0 whatever it finds.
//
//   node frontend/scripts/phone-check.mjs [--base http://127.0.0.1:5173] [--out test-output/phone/after]
//     [--width 375] [--height 740] [--only student,teacher]
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import { chromium } from 'playwright-core';

const { values } = parseArgs({
  options: {
    base: { type: 'string', default: 'http://127.0.0.1:5173' },
    out: {
      type: 'string',
      default: join(import.meta.dirname, '..', '..', 'test-output', 'phone', 'check'),
    },
    width: { type: 'string', default: '375' },
    height: { type: 'string', default: '740' },
    only: { type: 'string', default: '' },
  },
});
const base = values.base.replace(/\/$/, '');
const viewport = { width: Number(values.width), height: Number(values.height) };
const password = 'mixmark-demo';

async function api(path, token, init = {}) {
  const response = await fetch(`${base}/api${path}`, {
    ...init,
    headers: {
      'content-type': 'application/json',
      ...(token ? { authorization: `Bearer ${token}` } : {}),
    },
  });
  if (!response.ok)
    throw new Error(
      `${init.method ?? 'GET'} ${path}: HTTP ${response.status} ${await response.text()}`,
    );
  return response.json();
}

const signInApi = async (email) =>
  (
    await api('/auth/sign-in', undefined, {
      method: 'POST',
      body: JSON.stringify({ email, password }),
    })
  ).accessToken;

/** The pages of each demo account, with the ids the demo data gives them. */
async function plans() {
  const teacher = await signInApi('tamsin@saltmarsh-lane.test');
  const classes = await api('/classes', teacher);
  const roster = classes.length ? await api(`/classes/${classes[0].id}/students`, teacher) : [];
  const drills = await api('/drills', teacher);
  const assignments = await api('/assignments', teacher);
  const teacherAttempts = await api('/attempts', teacher);
  const student = await signInApi('bram@saltmarsh-lane.test');
  const studentAttempts = await api('/attempts', student);
  const studentAssignments = await api('/assignments', student);
  const list = (value) => (Array.isArray(value) ? value : (value.items ?? value.data ?? []));
  const firstId = (value) => list(value)[0]?.id;
  const pages = {
    student: {
      email: 'bram@saltmarsh-lane.test',
      pages: [
        ['assignments', '/student'],
        ['practice', '/student/practice'],
        ['join', '/student/join'],
        ['history', '/student/history'],
        ['progress', '/student/progress'],
        ['palette', '/palette'],
        ['account', '/account'],
      ],
    },
    'self-learner': {
      email: 'noor@selftaught.test',
      pages: [
        ['home', '/student'],
        ['practice', '/student/practice'],
        ['history', '/student/history'],
        ['progress', '/student/progress'],
      ],
    },
    teacher: {
      email: 'tamsin@saltmarsh-lane.test',
      pages: [
        ['dashboard', '/teacher'],
        ['drills', '/teacher/drills'],
        ['new-drill', '/teacher/drills/new'],
        ['assign', '/teacher/assign'],
        ['palette', '/palette'],
        ['account', '/account'],
      ],
    },
    admin: {
      email: 'admin@mixmark.test',
      pages: [
        ['users', '/admin/users'],
        ['palette', '/palette'],
      ],
    },
  };
  const drillFor = list(studentAssignments)[0]?.drill?.id;
  if (drillFor) pages.student.pages.push(['drill', `/student/drills/${drillFor}`]);
  if (firstId(studentAttempts))
    pages.student.pages.push(['result', `/attempts/${firstId(studentAttempts)}`]);
  if (classes[0]) {
    pages.teacher.pages.push(['class', `/teacher/classes/${classes[0].id}`]);
    pages.teacher.pages.push(['gradebook', `/teacher/classes/${classes[0].id}/gradebook`]);
  }
  if (roster[0])
    pages.teacher.pages.push(['student-progress', `/teacher/students/${roster[0].id}/progress`]);
  if (drills[0]) pages.teacher.pages.push(['edit-drill', `/teacher/drills/${drills[0].id}/edit`]);
  if (firstId(assignments))
    pages.teacher.pages.push(['assignment', `/teacher/assignments/${firstId(assignments)}`]);
  if (firstId(teacherAttempts))
    pages.teacher.pages.push(['review', `/attempts/${firstId(teacherAttempts)}`]);
  return pages;
}

/** In the page: how far it scrolls sideways, and what sticks out (outside any box that scrolls or clips). */
function measure() {
  const width = document.documentElement.clientWidth;
  const clipped = (element) => {
    for (
      let node = element.parentElement;
      node && node !== document.body;
      node = node.parentElement
    ) {
      const overflowX = getComputedStyle(node).overflowX;
      if (overflowX !== 'visible') return true;
    }
    return false;
  };
  const describe = (element) => {
    const label =
      element.getAttribute('aria-label') ??
      element.textContent?.trim().replace(/\s+/g, ' ').slice(0, 50);
    const classes = [...element.classList]
      .filter((name) => name.startsWith('Mui'))
      .slice(0, 2)
      .join('.');
    return `${element.tagName.toLowerCase()}${classes ? `.${classes}` : ''} "${label}"`;
  };
  const out = [];
  for (const element of document.querySelectorAll('body *')) {
    const box = element.getBoundingClientRect();
    if (box.width === 0 || box.right <= width + 0.5 || clipped(element)) continue;
    // Only the outermost offender of a subtree: a child sticking out with its parent says nothing new.
    const parent = element.parentElement;
    if (parent && parent.getBoundingClientRect().right > width + 0.5 && !clipped(parent)) continue;
    out.push(`${describe(element)} right=${Math.round(box.right)}`);
  }
  // Boxes that scroll sideways on their own (a table's): fine, but a button or link past their right
  // edge is an action the person cannot see without scrolling there.
  const boxes = [];
  for (const element of document.querySelectorAll('body *')) {
    const overflowX = getComputedStyle(element).overflowX;
    if (
      (overflowX !== 'auto' && overflowX !== 'scroll') ||
      element.scrollWidth <= element.clientWidth + 1
    )
      continue;
    const edge = element.getBoundingClientRect().right;
    const hidden = [...element.querySelectorAll('button, a, [role="button"]')].filter(
      (control) => control.getBoundingClientRect().left >= edge - 4,
    );
    boxes.push(
      `${describe(element).slice(0, 60)} scrolls ${element.scrollWidth - element.clientWidth}px` +
        (hidden.length
          ? `; ${hidden.length} control(s) out of sight: ${hidden.slice(0, 3).map(describe).join(', ')}`
          : ''),
    );
  }
  return {
    scrollWidth: document.documentElement.scrollWidth,
    width,
    offenders: out.slice(0, 10),
    boxes,
  };
}

const only = values.only ? values.only.split(',') : undefined;
const browser = await chromium.launch({
  executablePath: process.env.MIXMARK_CHROMIUM ?? '/usr/bin/chromium',
  args: [
    '--headless',
    '--no-sandbox',
    '--disable-gpu',
    '--no-first-run',
    '--disable-background-networking',
  ],
});
mkdirSync(values.out, { recursive: true });
let sideways = 0;
try {
  for (const [who, plan] of Object.entries(await plans())) {
    if (only && !only.includes(who)) continue;
    const context = await browser.newContext({
      viewport,
      deviceScaleFactor: 1,
      reducedMotion: 'reduce',
    });
    const page = await context.newPage();
    await page.goto(`${base}/sign-in`);
    await page.getByLabel('E-mail').fill(plan.email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), { timeout: 20_000 });
    await page.waitForTimeout(1000);
    console.log(`${who} (${plan.email}) lands on ${new URL(page.url()).pathname}`);
    // The phone menu: opened, its links and the page marked, screenshot, then closed with Escape.
    // By CSS: while the drawer is open, the rest of the page is hidden from the accessibility tree.
    const menu = page.locator('header button[aria-label="Menu"]');
    if (await menu.isVisible()) {
      await menu.click();
      const drawer = page.getByRole('dialog', { name: 'Menu' });
      await drawer.waitFor();
      await page.waitForTimeout(400);
      const links = await drawer
        .getByRole('link')
        .evaluateAll((all) =>
          all.map(
            (link) =>
              `${link.textContent}${link.getAttribute('aria-current') === 'page' ? ' (current)' : ''}`,
          ),
        );
      console.log(
        `  menu drawer: ${links.join(', ')}; aria-expanded=${await menu.getAttribute('aria-expanded')}`,
      );
      await page.screenshot({
        path: join(values.out, `${who}-menu-open-${viewport.width}.png`),
        animations: 'disabled',
      });
      await page.keyboard.press('Escape');
      await drawer.waitFor({ state: 'detached' });
      const focused = await page.evaluate(() => document.activeElement?.getAttribute('aria-label'));
      console.log(
        `  after Escape: aria-expanded=${await menu.getAttribute('aria-expanded')}, focus on "${focused}"`,
      );
    } else {
      console.log('  no menu button at this width');
    }
    for (const [name, path] of plan.pages) {
      // A client-side navigation (React Router follows popstate), as a person's tap on a link: a
      // reload per page would ask for a fresh session every time.
      await page.evaluate((to) => {
        window.history.pushState({}, '', to);
        window.dispatchEvent(new PopStateEvent('popstate'));
      }, path);
      // Wait for the new page: a moment for the router to start (its progress bar), then no spinner
      // or progress bar left, then a moment for the last request's rows to draw.
      await page.waitForTimeout(300);
      await page
        .waitForFunction(
          () => !document.querySelector('[role="progressbar"], .MuiSkeleton-root'),
          undefined,
          { timeout: 15_000, polling: 100 },
        )
        .catch(() => console.log(`  (${name}: still loading after 15 s)`));
      await page.waitForLoadState('networkidle').catch(() => undefined);
      await page.waitForTimeout(800);
      const result = await page.evaluate(measure);
      const extra = result.scrollWidth - result.width;
      if (extra > 0) sideways += 1;
      const landed = new URL(page.url()).pathname;
      console.log(
        `  ${name.padEnd(17)} ${path}${landed !== path ? ` -> ${landed}` : ''}: ` +
          (extra > 0 ? `SCROLLS SIDEWAYS by ${extra}px` : 'no sideways scroll') +
          (result.offenders.length ? `\n      ${result.offenders.join('\n      ')}` : '') +
          (result.boxes.length
            ? `\n      inner scroll: ${result.boxes.join('\n      inner scroll: ')}`
            : ''),
      );
      await page.screenshot({
        path: join(values.out, `${who}-${name}-${viewport.width}.png`),
        fullPage: true,
        animations: 'disabled',
      });
    }
    await context.close();
  }
} finally {
  await browser.close();
}
console.log(
  `${sideways} page(s) scroll sideways at ${viewport.width}x${viewport.height}; screenshots in ${values.out}`,
);
