import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { fixture, launchChromium, screenshot, signIn } from './browser.js';

describe('foundation in Chromium: sign in, upload a LAS file, see its depth track', () => {
  let browser: Browser;
  const baseUrl = inject('baseUrl');
  beforeAll(async () => {
    browser = await launchChromium();
  });
  afterAll(async () => browser?.close());

  it('a signed-out visitor is sent to the sign-in page', async () => {
    const page = await browser.newPage();
    await page.goto(baseUrl + '/assets');
    await page.waitForURL(/\/sign-in/);
    expect(await page.getByRole('button', { name: 'Sign in' }).isVisible()).toBe(true);
    await page.close();
  });

  it('the demo petrophysicist signs in, creates a well, uploads a LAS file and opens the depth view', async () => {
    const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    await signIn(page, baseUrl, 'petro@poreline.demo', 'petro-demo-2026');
    await page.getByRole('link', { name: 'Wrenmoor Field' }).click();
    await page.getByRole('table').waitFor();

    const wellName = `E2E-${Date.now().toString(36)}`;
    const created = await fetchJson(page, baseUrl, 'POST', `/api/assets/${assetIdFrom(page.url())}/wells`, { name: wellName });
    expect(created.name).toBe(wellName);
    await page.reload();
    await page.getByRole('table').waitFor();

    await page.getByLabel(`LAS files for ${wellName}`).setInputFiles(fixture('wm-e2e-1.las'));
    await page.getByText('stored', { exact: false }).first().waitFor({ timeout: 30_000 });
    await screenshot(page, 'foundation-asset-after-upload');

    await page.getByRole('link', { name: wellName }).click();
    await page.locator('svg path[data-curve]').first().waitFor({ timeout: 30_000 });
    const curves = await page.locator('svg path[data-curve]').evaluateAll((els) => els.map((e) => e.getAttribute('data-curve')));
    expect(curves).toEqual(expect.arrayContaining(['GR', 'RHOB', 'NPHI', 'RT']));
    const d = await page.locator('svg path[data-curve="GR"]').getAttribute('d');
    expect(d?.length ?? 0).toBeGreaterThan(50);
    await screenshot(page, 'foundation-well-depth-view');
    await page.close();
  });
});

function assetIdFrom(url: string): string {
  const m = /\/assets\/([0-9a-f-]{36})/.exec(url);
  if (!m) throw new Error(`no asset id in ${url}`);
  return m[1];
}

/** Calls the API from inside the page with the token the UI stored at sign-in. */
async function fetchJson(page: import('playwright-core').Page, baseUrl: string, method: string, path: string, body?: unknown) {
  return page.evaluate(
    async ({ baseUrl, method, path, body }) => {
      const token = Object.values(localStorage).find((v) => typeof v === 'string' && v.split('.').length === 3) ?? '';
      const res = await fetch(baseUrl + path, {
        method,
        headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      return res.json();
    },
    { baseUrl, method, path, body },
  );
}
