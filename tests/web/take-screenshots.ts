// Screenshots of the web pages in Debian's Chromium, to look at them by eye.
// launch() gives Chromium a fresh temporary profile each run.
// Usage: BASE=http://127.0.0.1:PORT npx tsx tests/web/take-screenshots.ts   (after `npx vite build && npx vite preview --port PORT`)
// With TEAM=1 it also shoots the team-server pages: against `VITE_FAKE_API=1 npx vite --port PORT` (the invented demo),
// or a real server with the demo accounts (PASSWORD=...). ONLY=team skips the example pages.
import { chromium } from 'playwright-core';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { teamPages } from './screenshot-team-pages';

const base = process.env.BASE ?? 'http://127.0.0.1:4173';
const out = join(import.meta.dirname, '..', 'e2e', 'screenshots');
mkdirSync(out, { recursive: true });

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM ?? '/usr/bin/chromium',
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
    '--disable-component-update', '--disable-sync'],
});
const problems: string[] = [];
try {
  if (process.env.TEAM === '1') await teamPages(browser, base, out, problems);
  if (process.env.ONLY !== 'team') for (const [name, reduced] of [['depot-roof-r3', false], ['depot-roof-r3-missing-diagonal', false], ['depot-roof-r3-missing-diagonal', true]] as const) {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 }, reducedMotion: reduced ? 'reduce' : 'no-preference' });
    page.on('console', (m) => { if (m.type() === 'error' || m.type() === 'warning') problems.push(`${name}: ${m.type()}: ${m.text()}`); });
    page.on('pageerror', (e) => problems.push(`${name}: page error: ${e.message}`));
    await page.goto(`${base}/examples/${name}`, { waitUntil: 'networkidle' });
    await page.getByTestId('verdict-status').waitFor();
    await page.evaluate('document.fonts.ready');
    const tag = `${name}${reduced ? '-reduced-motion' : ''}`;
    await page.screenshot({ path: join(out, `${tag}.png`), fullPage: true });
    // Hover a diagonal for the tooltip, and pick a three-member cut.
    await page.locator('[data-member-index]').nth(20).hover({ force: true });
    await page.screenshot({ path: join(out, `${tag}-hover.png`), clip: (await page.locator('figure').first().boundingBox())! });
    if (!reduced && name === 'depot-roof-r3') {
      for (const id of ['TC3', 'D3', 'BC3']) await page.getByLabel(`Cut ${id}`).check();
      await page.keyboard.press('Tab');
      await page.locator('[data-member-index="0"]').focus();
      await page.keyboard.press('ArrowRight');
      await page.screenshot({ path: join(out, `${tag}-cut.png`), fullPage: true });
    }
    await page.close();
  }
} finally {
  await browser.close();
}
console.log(problems.length ? problems.join('\n') : 'no console errors');
console.log(`screenshots in ${out}`);
