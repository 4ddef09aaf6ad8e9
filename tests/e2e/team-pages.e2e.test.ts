/**
 * The web app end to end, in Debian's Chromium against the real server: the demo accounts, a
 * 3,000-variant sweep pushed by the CLI, and the pages an engineer walks through (project → study
 * → run, a box selection on the chart filtering the table, a variant, a comparison), then the
 * viewer, who may neither mark nor push. Screenshots of every step: tests/e2e/screenshots/e2e-*.png.
 */
import { mkdirSync, readdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { pushBody, roofStudy, sweep } from '../api/support/run-fixtures';
import { chromiumMissing, launchChromium, screenshot, signIn, watchProblems } from './support/chromium';
import { DEMO_PROJECT } from './support/cli-push';
import { startE2eApp, type E2eApp } from './support/e2e-app';
import { colouredPixels, plotArea, waitForDrawnChart } from './support/plot';

const SHOTS = join(import.meta.dirname, 'screenshots');
const missing = chromiumMissing();
if (missing) console.warn(`e2e: browser tests skipped: ${missing}`);

let e: E2eApp;
let browser: Browser;
const contexts: BrowserContext[] = [];
const problems: string[] = [];
const shot = (page: Page, name: string) => screenshot(page, join(SHOTS, `e2e-${name}.png`));

async function pageAs(role: 'engineer' | 'viewer'): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1440, height: 1000 }, reducedMotion: 'reduce' });
  contexts.push(context);
  const page = await context.newPage();
  watchProblems(page, role, problems);
  await signIn(page, e.base, e.accounts[role].email, e.accounts[role].password, (p) => shot(p, `00-sign-in-${role}`));
  return page;
}

/** The variants panel and the number of variants its heading states: "Variants (412 of 3,000)" (named without the space). */
const variantsPanel = (page: Page) => page.getByRole('region', { name: /^Variants ?\(/ });
async function tableCount(page: Page): Promise<{ shown: number; of?: number }> {
  const text = (await variantsPanel(page).getByRole('heading').first().textContent()) ?? '';
  const m = /\((\d[\d\s,]*?)(?: of (\d[\d\s,]*))?\)/.exec(text);
  if (!m) throw new Error(`no count in "${text}"`);
  const n = (s: string) => Number(s.replace(/\D/g, ''));
  return { shown: n(m[1]), of: m[2] ? n(m[2]) : undefined };
}
/** A count as a pattern, whatever separates its thousands: 1234 → 1[,\s]?234. */
const grouped = (n: number) => String(n).replace(/\B(?=(\d{3})+$)/g, '[,\\s]?');
const rowIndices = (page: Page) => variantsPanel(page).locator('tbody tr[data-variant]')
  .evaluateAll((rows) => rows.map((r) => Number(r.getAttribute('data-variant'))));

beforeAll(async () => {
  if (missing) return;
  mkdirSync(SHOTS, { recursive: true });
  for (const f of readdirSync(SHOTS)) if (f.startsWith('e2e-failed-')) rmSync(join(SHOTS, f));
  e = await startE2eApp();
  browser = await launchChromium();
}, 240_000);

// A failed step leaves a picture of every open page.
afterEach(async ({ task }) => {
  if (task.result?.state !== 'fail') return;
  const pages = contexts.flatMap((c) => c.pages());
  for (const [i, p] of pages.entries()) await p.screenshot({ path: join(SHOTS, `e2e-failed-${task.name.replace(/\W+/g, '-').slice(0, 40)}-${i}.png`), fullPage: true }).catch(() => undefined);
});

afterAll(async () => {
  for (const c of contexts) await c.close().catch(() => undefined);
  await browser?.close();
  await e?.close();
  if (problems.length) console.warn(`e2e: browser console:\n  ${problems.join('\n  ')}`);
});

describe.skipIf(!!missing)(`the web app in Chromium against the team server${missing ? ` (skipped: ${missing})` : ''}`, () => {
  let page: Page;
  let viewer: Page;
  const runUrl = () => `${e.base}/projects/${DEMO_PROJECT}/runs/${encodeURIComponent(e.pushed.runId)}`;

  it('pushed the sweep through the CLI into the demo project', () => {
    expect(e.pushed).toMatchObject({ runId: e.run.manifest.runId, created: true, inserted: 3000, variantCount: 3000, status: 'complete' });
  });

  it('signs the engineer in and lists the demo projects', async () => {
    page = await pageAs('engineer');
    await expect.poll(() => page.getByRole('link', { name: 'Harrow Lane depot roof' }).count()).toBe(1);
    await shot(page, '01-projects-engineer');
  });

  it('opens the project, the study and the run: the design-space chart is drawn', async () => {
    await page.getByRole('link', { name: 'Harrow Lane depot roof' }).click();
    await page.waitForURL(new RegExp(`/projects/${DEMO_PROJECT}$`));
    const runLink = page.locator(`tr[data-run="${e.pushed.runId}"] a`);
    await runLink.waitFor();
    await shot(page, '02-project');

    await page.getByRole('link', { name: 'Study file' }).click();
    await page.waitForURL(/\/studies\/\d+$/);
    await page.getByRole('heading', { level: 1, name: e.run.manifest.study.name }).waitFor();
    await expect.poll(() => page.locator('pre').innerText()).toContain('"count": 250');
    await shot(page, '03-study');

    await page.locator(`tr[data-run="${e.pushed.runId}"] a`).click();
    await page.waitForURL(/\/runs\/[^/]+$/);
    expect(page.url()).toBe(runUrl());
    // The point chart and the heatmap over two parameters.
    await expect.poll(() => page.getByTestId('plot').count(), { timeout: 30_000 }).toBe(2);
    await waitForDrawnChart(page, { all: true });
    const area = await plotArea(page);
    expect(area.width * area.height).toBeGreaterThan(200 * 150);
    // The points are on the canvas: the house paper and grid are grey, status colours are not.
    expect(await colouredPixels(page, area)).toBeGreaterThan(500);
    await expect.poll(() => tableCount(page)).toEqual({ shown: 3000 });
    await shot(page, '04-run-design-space');
  });

  it('filters the table by a box dragged across the chart', async () => {
    const area = await plotArea(page);
    const first = await rowIndices(page);
    await page.mouse.move(area.x + area.width * 0.2, area.y + area.height * 0.04);
    await page.mouse.down();
    await page.mouse.move(area.x + area.width * 0.42, area.y + area.height * 0.96, { steps: 15 });
    await page.mouse.up();
    await page.waitForURL(/[?&]ids=/);
    const ids = new URL(page.url()).searchParams.get('ids')!.split(',').map(Number);
    await expect.poll(() => tableCount(page)).toEqual({ shown: ids.length, of: 3000 });
    expect(ids.length).toBeGreaterThan(0);
    expect(ids.length).toBeLessThan(3000);
    await variantsPanel(page).getByText(new RegExp(`^Chart selection: ${grouped(ids.length)} variants\\.`)).waitFor();
    await expect.poll(async () => (await rowIndices(page)).join()).not.toBe(first.join());
    const rows = await rowIndices(page);
    expect(rows.length).toBe(Math.min(ids.length, 50));
    expect(rows.every((i) => ids.includes(i))).toBe(true);
    await shot(page, '05-run-box-selection');
  });

  it('opens a variant of the selection: the drawing and the verdict', async () => {
    const [index] = await rowIndices(page);
    await variantsPanel(page).locator(`tr[data-variant="${index}"] th a`).click();
    await page.waitForURL(new RegExp(`/variants/${index}$`));
    const verdict = page.getByTestId('verdict-status');
    await verdict.waitFor({ timeout: 60_000 });
    const stored = e.run.records.find((r) => r.index === index)!;
    const headline = { determinate: /^Stable, statically determinate$/, indeterminate: /^Stable, indeterminate to degree \d+$/, unstable: /^Unstable: \d+ mechanisms?$/ };
    expect(await verdict.innerText()).toMatch(headline[stored.status as keyof typeof headline]);
    expect(await page.locator('figure svg [data-member-index]').count()).toBe(stored.members);
    await shot(page, '06-variant');
  });

  it('compares two variants: the table of differences', async () => {
    await page.goBack();
    await variantsPanel(page).locator('tbody tr[data-variant]').first().waitFor();
    const [a, b] = await rowIndices(page);
    await page.getByLabel(`Compare variant ${a}`, { exact: true }).check();
    await page.getByLabel(`Compare variant ${b}`, { exact: true }).check();
    await page.getByRole('link', { name: 'Compare 2 variants' }).click();
    await page.waitForURL(new RegExp(`/compare\\?v=${a}(,|%2C)${b}$`));
    const table = page.getByRole('table', { name: 'Differences between the compared variants' });
    await table.waitFor({ timeout: 60_000 });
    expect(await table.locator('thead th').allInnerTexts()).toEqual(['Parameter or figure', `variant ${a}`, `variant ${b}`]);
    expect(await table.locator('tbody tr[data-differs="true"]').count()).toBeGreaterThan(0);
    await shot(page, '07-compare');
  });

  it('keeps the viewer from marking: the mark buttons are inert', async () => {
    viewer = await pageAs('viewer');
    await shot(viewer, '08-projects-viewer');
    await viewer.goto(`${runUrl()}/variants`);
    const row = variantsPanel(viewer).locator('tbody tr[data-variant]').first();
    await row.waitFor();
    const candidate = row.getByRole('button', { name: 'Candidate' });
    const reject = row.getByRole('button', { name: 'Reject' });
    for (const b of [candidate, reject]) expect([await b.getAttribute('aria-disabled'), await b.isDisabled()]).toEqual(['true', true]);
    expect(await candidate.getAttribute('title')).toBe('Your role in this project cannot mark candidates.');
    const marks: string[] = [];
    viewer.on('request', (r) => r.url().includes('/marks/') && marks.push(r.url()));
    // Focusable but inert: a click (forced past Playwright's own check) sends nothing.
    await candidate.click({ force: true });
    await viewer.waitForTimeout(300);
    expect(marks).toEqual([]);
    expect(await candidate.getAttribute('aria-pressed')).toBe('false');
    await shot(viewer, '09-variants-viewer');
    // The engineer's buttons on the same rows are live.
    await page.goto(`${runUrl()}/variants`);
    await variantsPanel(page).locator('tbody tr[data-variant]').first().getByRole('button', { name: 'Candidate' }).waitFor();
    expect(await variantsPanel(page).locator('tbody tr[data-variant]').first().getByRole('button', { name: 'Candidate' }).getAttribute('aria-disabled')).toBeNull();
  });

  it("refuses a push with the viewer's session (403) and takes the same push from the engineer", async () => {
    const probe = sweep(roofStudy('e2e rights probe', { depth: { from: 1.5, to: 3, count: 5 }, panels: [6, 8] }));
    const body = pushBody(probe).toString('utf8');
    const post = (p: Page) => p.evaluate(`fetch('/api/projects/${DEMO_PROJECT}/runs', { method: 'POST', headers: { 'content-type': 'application/x-ndjson' }, body: ${JSON.stringify(body)} })
      .then(async (r) => ({ status: r.status, body: await r.json() }))`) as Promise<{ status: number; body: { error?: { code: string; message: string }; inserted?: number } }>;
    const refused = await post(viewer);
    expect(refused).toEqual({ status: 403, body: { error: expect.objectContaining({ code: 'forbidden', message: 'You need the right runs:push in this project.' }) } });
    const runs = await viewer.evaluate(`fetch('/api/projects/${DEMO_PROJECT}/runs').then((r) => r.json()).then((l) => l.map((r) => r.runId))`);
    expect(runs).toEqual([e.pushed.runId]);
    const accepted = await post(page);
    expect([accepted.status, accepted.body.inserted]).toEqual([201, 10]);
  });

  it('raised no uncaught error in the pages, and the server logged none', () => {
    expect(problems.filter((p) => p.includes('page error'))).toEqual([]);
    expect(e.logs.filter((l) => (JSON.parse(l) as { level: string }).level === 'error')).toEqual([]);
  });
});
