import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { launchChromium, screenshot, signIn } from './browser.js';

describe('mail notices in Chromium: an admin reads what the demo review steps sent', () => {
  let browser: Browser;
  const baseUrl = inject('baseUrl');
  beforeAll(async () => {
    browser = await launchChromium();
  });
  afterAll(async () => browser?.close());

  it('lists the notices the built-in catcher received and shows the returned one with its comment and raw message', async () => {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    await signIn(page, baseUrl, 'admin@poreline.demo', 'admin-demo-2026');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Mail' }).click();
    await page.getByRole('heading', { name: 'Mail notices', level: 1 }).waitFor();
    expect(await page.getByRole('status').filter({ hasText: 'SMTP_URL' }).textContent()).toMatch(/caught here and not delivered/);
    const table = page.getByRole('table', { name: 'E-mail notices' });
    // The seed submitted every demo interpretation: one notice per submission to the reviewer.
    const waiting = table.getByRole('rowheader').filter({ hasText: /^Waiting for your review: interpretation v\d+ of well WM-/ });
    await waiting.first().waitFor();
    expect(await waiting.count()).toBeGreaterThanOrEqual(9);
    await page.getByRole('button', { name: /^Read the notice to Pia Petro .*Returned: interpretation v\d+ of well WM-6/ }).click();
    const notice = page.getByRole('region', { name: 'Notice' });
    await notice.getByText('washout in the Pellow Shale', { exact: false }).first().waitFor();
    await notice.getByText('as the catcher received it').click();
    expect(await notice.locator('pre.mail-raw').textContent()).toMatch(/^Message-ID: <[^>]+>$/m);
    await screenshot(page, 'mail-notices');
  });
});
