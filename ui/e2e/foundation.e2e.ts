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
    await page.getByRole('button', { name: 'Sign in' }).waitFor({ state: 'visible' }); // fails the test when it does not show
    await page.close();
  });

  it('the demo petrophysicist signs in, creates a well, uploads a LAS file and opens the depth view', async () => {
    const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    await signIn(page, baseUrl, 'petro@poreline.demo', 'petro-demo-2026');
    await page.getByRole('link', { name: 'Wrenmoor Field' }).click();
    await page.getByRole('table').first().waitFor();

    const wellName = `E2E-${Date.now().toString(36)}`;
    await page.getByLabel('Well name').fill(wellName);
    await page.getByRole('button', { name: 'Create well' }).click();
    await page.getByRole('link', { name: wellName }).waitFor();

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
