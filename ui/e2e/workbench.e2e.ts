import { readFileSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { launchChromium, screenshot, screenshotDir, signIn } from './browser.js';
import { login, setUpDemoWell } from './demo-well.js';

/**
 * The well workbench in Chromium, on a copy of demo well WM-1 set up through the API:
 * tune a cutoff with its slider and watch the zone table change, save (the server's summary
 * must equal the browser's), submit, approve as the reviewer, export the CSV and read it.
 */
describe('well workbench in Chromium: tune, save, submit, approve, export', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;
  let workbenchUrl = '';
  let assetId = '';
  let tunedNetPay = NaN;
  const wellName = `WB-${Date.now().toString(36)}`;

  beforeAll(async () => {
    browser = await launchChromium();
    const token = await login(baseUrl, 'petro@poreline.demo', 'petro-demo-2026');
    const ids = await setUpDemoWell(baseUrl, token, wellName);
    assetId = ids.assetId;
    workbenchUrl = `${baseUrl}/assets/${ids.assetId}/wells/${ids.wellId}/workbench`;
  });
  afterAll(async () => browser?.close());

  async function openAs(email: string, password: string): Promise<Page> {
    const context = await browser.newContext({ viewport: { width: 1500, height: 950 }, acceptDownloads: true });
    const page = await context.newPage();
    await signIn(page, baseUrl, email, password);
    await page.goto(workbenchUrl);
    await page.locator('path[data-curve="NET_PAY"]').waitFor({ timeout: 60_000 });
    return page;
  }

  const netPayCell = (page: Page, zone: string) =>
    page
      .getByRole('table', { name: 'Zone summary' })
      .getByRole('row')
      .filter({ hasText: zone })
      .getByRole('cell')
      .nth(4); // Zone, Top, Gross, Net res., Net pay

  it('the petrophysicist moves the porosity min slider and the flags and zone table follow, then saves and the server agrees', async () => {
    const page = await openAs('petro@poreline.demo', 'petro-demo-2026');
    await page.getByRole('combobox', { name: 'Formation', exact: true }).selectOption('Wren Sand');
    const before = Number(await netPayCell(page, 'Wren Sand').textContent());
    const flagsBefore = await page.locator('path[data-curve="NET_PAY"]').getAttribute('d');
    expect(before).toBeGreaterThan(0);
    await page.locator('svg[aria-label^="Workbench depth view"]').screenshot({ path: `${screenshotDir}/workbench-depth-view.png` });

    // The depth view as files, made in the browser: SVG serialised, PNG drawn on a canvas.
    const [svgFile] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export SVG' }).click()]);
    const svgText = readFileSync(await svgFile.path(), 'utf8');
    expect(svgText.startsWith('<?xml')).toBe(true);
    expect(svgText).toContain('data-curve="NET_PAY"');
    expect(svgText).toContain('Wren Sand');
    const [pngFile] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export PNG' }).click()]);
    const png = readFileSync(await pngFile.path());
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // PNG signature
    expect(png.readUInt32BE(16)).toBeGreaterThan(1000); // width: twice the on-screen size
    expect(svgFile.suggestedFilename()).toMatch(/depth-view\.svg$/);

    // Wren Sand: upper sand about 0.245 porosity, lower sand about 0.215 (demo-wells model):
    // a porosity min of 0.235 keeps most of the upper sand only.
    await page.getByRole('slider', { name: 'Porosity min' }).fill('0.235');
    await expect.poll(async () => Number(await netPayCell(page, 'Wren Sand').textContent()), { timeout: 10_000 }).toBeLessThan(before);
    expect(await page.locator('path[data-curve="NET_PAY"]').getAttribute('d')).not.toBe(flagsBefore);
    tunedNetPay = Number(await netPayCell(page, 'Wren Sand').textContent());
    expect(tunedNetPay).toBeGreaterThan(0);
    // The live figure of the tuned formation shows the same net pay.
    expect(await page.getByRole('group', { name: 'Live figures of Wren Sand' }).textContent()).toContain(`${tunedNetPay.toFixed(2)} ft`);
    await screenshot(page, 'workbench-tuning');

    await page.getByRole('button', { name: 'Save', exact: true }).click();
    const check = page.locator('[data-server-check]');
    await check.waitFor({ timeout: 60_000 });
    expect(await check.getAttribute('data-server-check')).toBe('match');
    expect(await check.textContent()).toContain('equals the browser’s');
    // After the save the stored cutoff is the tuned one: the slider keeps its value and nothing is unsaved.
    expect(await page.getByRole('slider', { name: 'Porosity min' }).inputValue()).toBe('0.235');
    expect(await page.getByText(/unsaved cutoffs/).count()).toBe(0);
    expect(Number(await netPayCell(page, 'Wren Sand').textContent())).toBeCloseTo(tunedNetPay, 2);

    await page.getByRole('tab', { name: 'Versions' }).click();
    await page.getByRole('button', { name: 'Submit for review' }).click();
    await page.getByText('Waiting for a reviewer').waitFor();
    await page.context().close();
  });

  it('the reviewer approves the submitted version and exports its zone table as CSV', async () => {
    const page = await openAs('reviewer@poreline.demo', 'reviewer-demo-2026');
    await page.getByRole('tab', { name: 'Versions' }).click();
    await page.getByRole('button', { name: 'Approve' }).click();
    await page.locator('[data-status="approved"]').first().waitFor();
    await screenshot(page, 'workbench-approved');

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export CSV', exact: true }).click()]);
    const csv = readFileSync(await download.path(), 'utf8');
    // Provenance lines start with '#'; then the header row (units in brackets) and one row per zone.
    const rows = parseCsv(csv).filter((r) => !r[0]?.startsWith('#'));
    const header = rows[0];
    const payCol = header.indexOf('Net pay MD (ft)');
    expect(payCol, `a "Net pay MD (ft)" column in ${header.join(' | ')}`).toBeGreaterThanOrEqual(0);
    const wren = rows.find((r) => r.includes('Wren Sand'));
    expect(wren, 'a Wren Sand row in the CSV').toBeTruthy();
    expect(Number(wren![payCol])).toBeCloseTo(tunedNetPay, 2);
    expect(csv).toMatch(/approved/);
    await page.context().close();
  });

  it('the asset zone table shows the approved version for Wren Sand and exports it as CSV', async () => {
    const context = await browser.newContext({ viewport: { width: 1400, height: 900 }, acceptDownloads: true });
    const page = await context.newPage();
    await signIn(page, baseUrl, 'viewer@poreline.demo', 'viewer-demo-2026');
    await page.goto(`${baseUrl}/assets/${assetId}/zone-table`);
    await page.getByRole('combobox', { name: 'Formation' }).selectOption({ label: 'Wren Sand' });
    const table = page.getByRole('table', { name: 'Zone summary across wells' });
    const row = table.getByRole('row').filter({ hasText: wellName });
    await row.waitFor();
    expect(await row.textContent()).toContain('approved');
    const headers = await table.getByRole('columnheader').allTextContents();
    const cells = await row.getByRole('cell').allTextContents();
    const payAt = headers.findIndex((h) => /^Net pay\s*ft/.test(h));
    expect(Number(cells[payAt]), `net pay in ${JSON.stringify({ headers, cells })}`).toBeCloseTo(tunedNetPay, 2);
    await screenshot(page, 'workbench-zone-table');
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export CSV', exact: true }).click()]);
    const rows = parseCsv(readFileSync(await download.path(), 'utf8')).filter((r) => !r[0]?.startsWith('#'));
    // Wells of the asset log in ft and m, so the header says "(depth unit)" and each row names its unit.
    const payCol = rows[0].findIndex((h) => h.startsWith('Net pay MD ('));
    const ours = rows.find((r) => r.includes(wellName) && r.includes('Wren Sand'));
    expect(ours, `a row of ${wellName} in the zone table CSV`).toBeTruthy();
    expect(Number(ours![payCol])).toBeCloseTo(tunedNetPay, 2);
    await context.close();
  });

  it('the reviewer sees the save, submit and approve in the audit log', async () => {
    const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
    const page = await context.newPage();
    await signIn(page, baseUrl, 'reviewer@poreline.demo', 'reviewer-demo-2026');
    await page.goto(`${baseUrl}/assets/${assetId}/audit`);
    const table = page.getByRole('table', { name: 'Audit log' });
    await table.waitFor();
    await expect.poll(async () => (await table.textContent()) ?? '').toMatch(/approve/);
    await screenshot(page, 'workbench-audit');
    await context.close();
  });
});

/** RFC 4180 CSV rows (quoted fields with doubled quotes, CRLF or LF). */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      row.push(field);
      field = '';
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
    } else field += ch;
  }
  if (field || row.length) rows.push([...row, field]);
  return rows.filter((r) => r.some((f) => f !== ''));
}
