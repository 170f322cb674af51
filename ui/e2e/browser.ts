import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';

/** Debian's Chromium, never a downloaded browser. */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
  });
}

/** Git-ignored folder for screenshots (look at them after a run). */
export const screenshotDir = fileURLToPath(new URL('../../.screenshots', import.meta.url));

/** The whole page by default; `fullPage: false` for the viewport only (an open dialog, which locks the page's scroll). */
export async function screenshot(page: Page, name: string, { fullPage = true }: { fullPage?: boolean } = {}): Promise<string> {
  mkdirSync(screenshotDir, { recursive: true });
  const path = join(screenshotDir, `${name}.png`);
  await page.screenshot({ path, fullPage });
  return path;
}

export const fixture = (name: string) => fileURLToPath(new URL(`./fixtures/${name}`, import.meta.url));

export async function signIn(page: Page, baseUrl: string, email: string, password: string): Promise<void> {
  await page.goto(baseUrl + '/');
  await page.waitForURL(/\/sign-in/);
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/assets/);
}
