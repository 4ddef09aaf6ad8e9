/**
 * Debian's Chromium driven by playwright-core (never `npx playwright install`): headless, no
 * sandbox (root), no GPU, and no background traffic to hosts this machine cannot reach.
 * `chromium.launch()` gives every launch a fresh temporary user-data dir and removes it on close.
 */
import { existsSync } from 'node:fs';
import { chromium, type Browser, type Page } from 'playwright-core';

/** The browser the tests and bench:web drive; CHROMIUM overrides it. */
export const CHROMIUM = process.env.CHROMIUM ?? '/usr/bin/chromium';

export const CHROMIUM_ARGS = [
  '--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync',
];

/** Why the browser tests cannot run here, or undefined when they can. */
export function chromiumMissing(): string | undefined {
  return existsSync(CHROMIUM) ? undefined : `${CHROMIUM} is missing: scripts/ensure.sh installs Debian's chromium`;
}

export function launchChromium(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM, args: CHROMIUM_ARGS, timeout: 60_000 });
}

/** Sign in through the sign-in page (`filled` sees it before it is sent) and wait for the projects page it leads to. */
export async function signIn(page: Page, base: string, email: string, password: string, filled?: (page: Page) => Promise<void>): Promise<void> {
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password').fill(password);
  await filled?.(page);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/projects$/);
}

/** Uncaught page errors and console errors of `page`, as lines "<tag>: …". */
export function watchProblems(page: Page, tag: string, into: string[]): void {
  page.on('pageerror', (e) => into.push(`${tag}: page error: ${e.message}`));
  page.on('console', (m) => {
    if (m.type() === 'error') into.push(`${tag}: console error: ${m.text()}`);
  });
}

/** Let requests, fonts and Plotly's drawing settle, then take a full-page PNG. */
export async function screenshot(page: Page, path: string): Promise<void> {
  await page.waitForLoadState('networkidle');
  await page.evaluate('document.fonts.ready.then(() => undefined)');
  await page.waitForTimeout(300);
  await page.screenshot({ path, fullPage: true });
}
