/**
 * Developer tool: sign in as a demo user and take a screenshot of a page of a running server.
 *   node --import tsx apps/web/e2e/tools/shoot.ts --base http://127.0.0.1:PORT --role engineer \
 *     --path /missions --out /tmp/shot.png [--wait "text or css"] [--width 1360] [--height 900] [--full]
 *     [--element 'figure:has-text("Wheel momentum")']   (only that element, a Playwright selector)
 * Prints the browser console errors it saw. Uses Debian's Chromium (software WebGL).
 */
import { parseArgs } from 'node:util';
import { readFileSync } from 'node:fs';
import { openBrowser } from '../browser';

const { values } = parseArgs({
  options: {
    base: { type: 'string' },
    role: { type: 'string', default: 'engineer' },
    path: { type: 'string', default: '/missions' },
    out: { type: 'string', default: '/tmp/shot.png' },
    wait: { type: 'string' },
    width: { type: 'string', default: '1360' },
    height: { type: 'string', default: '900' },
    full: { type: 'boolean', default: false },
    element: { type: 'string' },
  },
});
if (!values.base) throw new Error('--base http://127.0.0.1:PORT is required');
const demo = JSON.parse(readFileSync(new URL('../../../../fixtures/demo/organisation.json', import.meta.url), 'utf8')) as {
  users: { email: string; password: string; role: string }[];
};
const user = demo.users.find((u) => u.role === values.role);
if (!user) throw new Error(`no demo user with role ${values.role}`);

const { context, close } = await openBrowser();
try {
  const page = await context.newPage();
  await page.setViewportSize({ width: Number(values.width), height: Number(values.height) });
  const errors: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') errors.push(m.text());
  });
  page.on('pageerror', (e) => errors.push(String(e)));
  const login = await page.request.post(`${values.base}/api/auth/login`, { data: { email: user.email, password: user.password } });
  if (!login.ok()) throw new Error(`sign-in failed: ${login.status()}`);
  await page.goto(`${values.base}${values.path}`);
  if (values.wait) {
    const w = values.wait;
    await (/^[.#[]/.test(w) ? page.waitForSelector(w, { timeout: 30_000 }) : page.getByText(w).first().waitFor({ timeout: 30_000 }));
  } else {
    await page.waitForLoadState('networkidle');
  }
  await page.waitForTimeout(500);
  if (values.element) await page.locator(values.element).first().screenshot({ path: values.out });
  else await page.screenshot({ path: values.out, fullPage: values.full });
  console.log(`saved ${values.out}${errors.length ? `\nconsole errors:\n${errors.join('\n')}` : ''}`);
} finally {
  await close();
}
