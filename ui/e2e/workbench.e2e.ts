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

  beforeAll(async () => {
    browser = await launchChromium();
    const token = await login(baseUrl, 'petro@poreline.demo', 'petro-demo-2026');
    const ids = await setUpDemoWell(baseUrl, token, `WB-${Date.now().toString(36)}`);
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

  it('the petrophysicist moves the Sw max slider and the flags and zone table follow, then saves and the server agrees', async () => {
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

    await page.getByRole('slider', { name: 'Sw max' }).fill('0.12');
    await expect.poll(async () => Number(await netPayCell(page, 'Wren Sand').textContent()), { timeout: 10_000 }).toBeLessThan(before);
    expect(await page.locator('path[data-curve="NET_PAY"]').getAttribute('d')).not.toBe(flagsBefore);
    tunedNetPay = Number(await netPayCell(page, 'Wren Sand').textContent());
    // The live figure of the tuned formation shows the same net pay.
    expect(await page.getByRole('group', { name: 'Live figures of Wren Sand' }).textContent()).toContain(`${tunedNetPay.toFixed(2)} ft`);
    await screenshot(page, 'workbench-tuning');

    await page.getByRole('button', { name: 'Save', exact: true }).click();
    const check = page.locator('[data-server-check]');
    await check.waitFor({ timeout: 60_000 });
    expect(await check.getAttribute('data-server-check')).toBe('match');
    expect(await check.textContent()).toContain('equals the browser’s');
    // After the save the stored cutoff is the tuned one: the slider keeps 0.12 and nothing is unsaved.
    expect(await page.getByRole('slider', { name: 'Sw max' }).inputValue()).toBe('0.12');
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

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: /^Export CSV/ }).first().click()]);
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
