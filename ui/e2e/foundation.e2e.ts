import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { fixture, launchChromium, screenshot, signIn } from './browser.js';

describe('foundation in Chromium: sign in, upload a LAS file, see its depth track, manage accounts', () => {
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

  it('a new user changes their password on their account page, then signs in with the new one only', async () => {
    const stamp = Date.now().toString(36);
    const email = `e2e-pw-${stamp}@poreline.test`;
    await createUser(baseUrl, { email, name: `Pat ${stamp}`, password: 'first-password-1' });
    const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
    await signIn(page, baseUrl, email, 'first-password-1');
    await page.getByRole('banner').getByRole('link', { name: 'Your account' }).click();
    await page.getByRole('heading', { name: 'Your account', level: 1 }).waitFor();

    const form = page.getByRole('form', { name: 'Change password' });
    await form.getByLabel('Current password').fill('not-my-password');
    await form.getByLabel('New password', { exact: true }).fill('second-password-2');
    await form.getByLabel('New password again').fill('second-password-2');
    await form.getByRole('button', { name: 'Change password' }).click();
    await form.getByText('Current password is not your current password.').waitFor(); // the service's refusal, under the field
    await screenshot(page, 'account-wrong-current-password');

    await form.getByLabel('Current password').fill('first-password-1');
    await form.getByRole('button', { name: 'Change password' }).click();
    await page.getByRole('status').filter({ hasText: 'Password changed' }).waitFor();
    await screenshot(page, 'account-password-changed');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('Email').fill(email);
    await page.getByLabel('Password').fill('first-password-1');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('alert').waitFor(); // the old password no longer works
    expect(page.url()).toMatch(/\/sign-in/);
    await page.getByLabel('Password').fill('second-password-2');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/assets/);
    await page.close();
  });

  it('the demo admin renames an asset and a user of their own making; the new names show in the lists', async () => {
    const stamp = Date.now().toString(36);
    const token = await apiToken(baseUrl, 'admin@poreline.demo', 'admin-demo-2026');
    await api(baseUrl, token, 'POST', '/assets', { name: `E2E asset ${stamp}` });
    await api(baseUrl, token, 'POST', '/users', { email: `e2e-edit-${stamp}@poreline.test`, name: `Kim ${stamp}`, password: 'first-password-1' });
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, baseUrl, 'admin@poreline.demo', 'admin-demo-2026');
    await page.getByRole('link', { name: 'Team and assets' }).click();

    await page.getByRole('button', { name: `Edit E2E asset ${stamp}` }).click();
    const assetForm = page.getByRole('form', { name: `Edit E2E asset ${stamp}` });
    await assetForm.getByLabel('Asset name').fill('Wrenmoor Field');
    await assetForm.getByRole('button', { name: 'Save asset' }).click();
    await assetForm.getByText('An asset named "Wrenmoor Field" already exists in your organisation.').waitFor();
    await screenshot(page, 'admin-edit-asset-taken-name', { fullPage: false });
    await assetForm.getByLabel('Asset name').fill(`E2E renamed ${stamp}`);
    await assetForm.getByLabel('Description').fill('Renamed in the browser test');
    await assetForm.getByRole('button', { name: 'Save asset' }).click();
    await page.getByRole('rowheader', { name: `E2E renamed ${stamp}` }).waitFor();

    await page.getByRole('button', { name: `Edit Kim ${stamp}` }).click();
    const userForm = page.getByRole('form', { name: `Edit Kim ${stamp}` });
    await userForm.getByLabel('Name').fill(`Kim Renamed ${stamp}`);
    await userForm.getByLabel('New password').fill('reset-password-3');
    await screenshot(page, 'admin-edit-user-dialog', { fullPage: false });
    await userForm.getByRole('button', { name: 'Save user' }).click();
    await page.getByRole('table', { name: 'People' }).getByText(`Kim Renamed ${stamp}`).waitFor();
    await screenshot(page, 'admin-after-edits');

    await page.getByRole('banner').getByRole('link', { name: 'Assets', exact: true }).click();
    await page.getByRole('link', { name: `E2E renamed ${stamp}` }).waitFor(); // the assets list took the new name
    await screenshot(page, 'assets-after-rename');
    const login = await fetch(`${baseUrl}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email: `e2e-edit-${stamp}@poreline.test`, password: 'reset-password-3' }) });
    expect(login.status).toBe(200);
    await page.close();
  });
});

async function apiToken(baseUrl: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password }) });
  expect(res.status).toBe(200);
  return ((await res.json()) as { token: string }).token;
}

async function api(baseUrl: string, token: string, method: string, path: string, body: unknown): Promise<unknown> {
  const res = await fetch(`${baseUrl}/api${path}`, { method, headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` }, body: JSON.stringify(body) });
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
  return res.json();
}

/** A throwaway account made by the demo admin, so the demo accounts keep their passwords. */
async function createUser(baseUrl: string, user: { email: string; name: string; password: string }): Promise<void> {
  const token = await apiToken(baseUrl, 'admin@poreline.demo', 'admin-demo-2026');
  await api(baseUrl, token, 'POST', '/users', user);
}
