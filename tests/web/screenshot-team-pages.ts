// The team-server pages in Chromium: against the fake demo (VITE_FAKE_API=1 npx vite), or against
// `npx vite` proxying to a real server seeded with the demo accounts: PASSWORDS_FILE= the server's
// demo-users.txt (lines "role email password"), and REAL=1 to find the runs through /api.
import type { Browser, Page } from 'playwright-core';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

const PROJECT = '/projects/harrow-lane-depot';
/** Screenshot files are named <PREFIX>-<page>.png: 'team' for the fake demo, e.g. PREFIX=server for a real one. */
const file = (out: string, tag: string) => join(out, `${tag.replace(/^team/, process.env.PREFIX ?? 'team')}.png`);
const FAKE_RUNS = { sized: 'b7e3c1d2-4f5a-4e6b-9c8d-1a2b3c4d5e6f', wide: '9a8b7c6d5e4f30211203f4e5d6c7b8a9/4' };

function passwordOf(role: string): string {
  if (!process.env.PASSWORDS_FILE) return process.env.PASSWORD ?? 'demo-password';
  const line = readFileSync(process.env.PASSWORDS_FILE, 'utf8').split('\n').find((l) => l.trim().startsWith(`${role} `));
  return line?.trim().split(/\s+/)[2] ?? '';
}

/** The depot runs to show: the fake's, or the server's largest below and above 100,000 variants. */
async function depotRuns(page: Page, base: string): Promise<{ sized: string; wide: string }> {
  if (process.env.REAL !== '1') return FAKE_RUNS;
  const runs = (await (await page.request.get(`${base}/api${PROJECT}/runs`)).json()) as { runId: string; variantCount: number }[];
  const list = Array.isArray(runs) ? runs : [];
  const small = list.filter((r) => r.variantCount <= 100_000).sort((a, b) => b.variantCount - a.variantCount)[0];
  const big = list.find((r) => r.variantCount > 100_000);
  return { sized: small?.runId ?? FAKE_RUNS.sized, wide: big?.runId ?? FAKE_RUNS.wide };
}

async function signIn(page: Page, base: string, who: string, password: string) {
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('Email').fill(`${who}@panelpoint.example`);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/projects/);
}

async function settle(page: Page) {
  await page.waitForLoadState('networkidle');
  await page.evaluate('document.fonts.ready');
  await page.waitForTimeout(600);
}

export async function teamPages(browser: Browser, base: string, out: string, problems: string[]) {
  const open = async (tag: string, who = 'engineer') => {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 }, reducedMotion: 'reduce' });
    page.on('console', (m) => { if (m.type() === 'error') problems.push(`${tag}: ${m.text()}`); });
    page.on('pageerror', (e) => problems.push(`${tag}: page error: ${e.message}`));
    await signIn(page, base, who, passwordOf(who));
    return page;
  };
  const shot = async (page: Page, tag: string, path: string, waitFor?: (p: Page) => Promise<unknown>) => {
    await page.goto(`${base}${path}`);
    if (waitFor) await waitFor(page);
    await settle(page);
    await page.screenshot({ path: file(out, tag), fullPage: true });
  };
  const plot = (p: Page) => p.locator('.main-svg').first().waitFor({ timeout: 60_000 });

  const page = await open('engineer');
  const runs = await depotRuns(page, base);
  const SIZED = `${PROJECT}/runs/${encodeURIComponent(runs.sized)}`;
  await shot(page, 'team-projects', '/projects');
  await shot(page, 'team-project', PROJECT, (p) => p.getByText('Runs of').first().waitFor().catch(() => p.locator('[data-run]').first().waitFor()));
  await shot(page, 'team-run-design-space', SIZED, plot);
  await shot(page, 'team-run-split-facets', `${SIZED}?split=supports&colour=maxUtilisation&y=weight&x=span`, plot);
  await shot(page, 'team-run-split-traces', `${SIZED}?split=panels&splitAs=traces&x=depth&y=peakCompression`, plot);
  // A box drawn on the point chart filters the table below it.
  await page.goto(`${base}${SIZED}?x=depth&y=weight`);
  await plot(page);
  await settle(page);
  const drag = await page.locator('.nsewdrag').first().boundingBox();
  if (drag) {
    await page.mouse.move(drag.x + drag.width * 0.15, drag.y + drag.height * 0.55);
    await page.mouse.down();
    await page.mouse.move(drag.x + drag.width * 0.45, drag.y + drag.height * 0.95, { steps: 12 });
    await page.mouse.up();
    await settle(page);
  }
  await page.screenshot({ path: file(out, 'team-run-selection'), fullPage: true });
  await shot(page, 'team-run-heatmap', `${PROJECT}/runs/${encodeURIComponent(runs.wide)}`, plot);
  await shot(page, 'team-variants-filtered', `${SIZED}/variants?status=determinate,indeterminate&sort=weight&f.depth.gte=2&size=25`, (p) => p.locator('[data-variant]').first().waitFor());
  await shot(page, 'team-variant', `${SIZED}/variants/7`, (p) => p.getByTestId('verdict-status').waitFor({ timeout: 60_000 }));
  await shot(page, 'team-compare', `${SIZED}/compare?v=12,400,2210`, (p) => p.locator('[data-shared-scale]').first().waitFor({ timeout: 60_000 }));
  await shot(page, 'team-reference-cases', '/projects/harrow-lane-depot/reference-cases', async (p) => {
    await p.locator('[data-case] button').first().click();
    await p.getByText('Checks of this case').waitFor();
  });
  await page.goto(`${base}${PROJECT}/uploads`);
  await page.getByLabel('File', { exact: true }).setInputFiles(join(import.meta.dirname, '..', '..', 'examples', 'studies', 'depot-roof-pratt.json'));
  await page.getByRole('button', { name: 'Upload' }).click();
  await page.getByText(/^Uploaded /).waitFor();
  await settle(page);
  await page.screenshot({ path: file(out, 'team-uploads'), fullPage: true });
  await page.goto(`${base}/projects/harrow-lane-depot/tokens`);
  await page.getByLabel('Name').fill('laptop CLI');
  await page.getByRole('button', { name: 'Create token' }).click();
  await page.getByTestId('new-token').waitFor();
  await settle(page);
  await page.screenshot({ path: file(out, 'team-tokens-created'), fullPage: true });
  await page.close();

  const viewer = await open('viewer', 'viewer');
  await shot(viewer, 'team-variants-viewer', `${SIZED}/variants`, (p) => p.locator('[data-variant]').first().waitFor());
  await viewer.locator('[data-variant]').first().getByRole('button', { name: 'Comments' }).click();
  await settle(viewer);
  await viewer.screenshot({ path: file(out, 'team-comments-viewer') });
  await viewer.close();

  const admin = await open('admin', 'admin');
  await shot(admin, 'team-admin', '/admin', async (p) => {
    await p.getByRole('heading', { name: 'Administration' }).waitFor();
    await p.waitForTimeout(1500);
    const first = p.getByRole('list', { name: 'Messages' }).getByRole('button').first();
    if (await first.count()) {
      await first.click();
      await p.getByRole('article').waitFor();
    }
  });
  await admin.close();

  const anon = await browser.newPage({ viewport: { width: 1280, height: 720 } });
  await anon.goto(`${base}/sign-in`);
  await anon.getByLabel('Email').fill('engineer@panelpoint.example');
  await anon.getByLabel('Password').fill('not the password');
  await anon.getByRole('button', { name: 'Sign in' }).click();
  await anon.getByRole('alert').waitFor();
  await anon.screenshot({ path: file(out, 'team-sign-in-error') });
  await anon.goto(`${base}/reset-password?token=demo-reset-token-not-real`);
  await settle(anon);
  await anon.screenshot({ path: file(out, 'team-reset-confirm') });
  await anon.goto(`${base}/invitations/accept?token=demo-invitation-token-not-real`);
  await settle(anon);
  await anon.screenshot({ path: file(out, 'team-invitation') });
  await anon.close();
}
