import ExcelJS from 'exceljs';
import { readFileSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { launchChromium, screenshot, signIn } from './browser.js';

/** The recoverable P90/P50/P10 the results table shows (exact values from data attributes). */
async function recoverablePercentiles(page: Page): Promise<{ p90: number; p50: number; p10: number }> {
  const table = page.locator('table', { has: page.locator('caption', { hasText: 'Probabilistic volumes' }) });
  const at = async (k: string) => Number(await table.locator(`[data-stat="${k}"] [data-value]`).getAttribute('data-value'));
  return { p90: await at('p90'), p50: await at('p50'), p10: await at('p10') };
}

describe('reserves in Chromium: an engineer builds a case from approved net pay, runs Monte Carlo and exports it', () => {
  let browser: Browser;
  const baseUrl = inject('baseUrl');
  let caseUrl = '';
  beforeAll(async () => {
    browser = await launchChromium();
  });
  afterAll(async () => browser?.close());

  it('creates an oil case from the approved Wren Sand interpretations, overrides a value with a reason, runs 100,000 trials: P90 < P50 < P10', async () => {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 }, acceptDownloads: true });
    await signIn(page, baseUrl, 'engineer@poreline.demo', 'engineer-demo-2026');
    await page.getByRole('link', { name: 'Wrenmoor Field' }).click();
    await page.getByRole('link', { name: 'Reserves cases' }).click();
    await page.getByRole('heading', { name: 'Reserves cases', level: 1 }).waitFor();
    await page.getByRole('link', { name: 'Fenna Sand gas – base case' }).waitFor({ timeout: 30_000 });
    expect(await page.getByRole('note', { name: 'Caution about volumes' }).first().textContent()).toMatch(/SPE-PRMS/);

    await page.getByLabel('Case name').fill('E2E Wren oil');
    await page.getByLabel('Target formation').selectOption({ label: 'Wren Sand' });
    await page.getByLabel('Fluid').selectOption('oil');
    const boxes = page.getByRole('group', { name: 'Approved interpretations with this formation' }).getByRole('checkbox');
    await boxes.first().waitFor({ timeout: 30_000 });
    const count = await boxes.count();
    expect(count).toBeGreaterThanOrEqual(3);
    for (let i = 0; i < 3; i++) await boxes.nth(i).click();
    await screenshot(page, 'reserves-new-case');
    await page.getByRole('button', { name: 'Create case' }).click();
    await page.waitForURL(/\/reserves\/[0-9a-f-]{36}$/);
    caseUrl = page.url();

    // sources: three wells with their approved versions, combined by thickness
    const sources = page.locator('table', { has: page.locator('caption', { hasText: 'Sources and combined values' }) });
    await sources.waitFor();
    expect(await sources.locator('tbody tr').count()).toBe(4); // 3 wells + combined
    // override one well's Sw with a reason
    await sources.getByRole('button', { name: /^Override Sw of / }).first().click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Value (v/v)').fill('0.22');
    await dialog.getByLabel('Reason').fill('Core Sw from the plug set');
    await dialog.getByRole('button', { name: 'Save override' }).click();
    await page.getByText(/“Core Sw from the plug set” \(Eli Engineer/).waitFor();

    await page.getByLabel('Area', { exact: true }).fill('1200');
    await page.getByLabel('Bo (rb/STB)').fill('1.25');
    await page.getByLabel('Recovery factor (v/v)').fill('0.35');
    await page.getByLabel('Trials').fill('100000');
    await page.getByLabel('Area distribution').selectOption('triangular');
    await page.getByLabel('Area Min').fill('900');
    await page.getByLabel('Area Mode').fill('1200');
    await page.getByLabel('Area Max').fill('1500');
    await page.getByLabel('Recovery factor distribution').selectOption('uniform');
    await page.getByLabel('Recovery factor Min').fill('0.25');
    await page.getByLabel('Recovery factor Max').fill('0.45');
    await page.getByLabel('Porosity distribution').selectOption('normal');
    await page.getByLabel('Porosity Mean').fill('0.22');
    await page.getByLabel('Porosity SD').fill('0.015');
    await page.getByLabel('Porosity truncate min').fill('0.17');
    await page.getByLabel('Porosity truncate max').fill('0.27');
    // better rock, better sweep: porosity and recovery factor move together (rank 0.4)
    await page.getByRole('button', { name: 'Add a correlation' }).click();
    await page.getByLabel('Correlation 1: first input').selectOption('porosity');
    await page.getByLabel('Correlation 1: second input').selectOption('recoveryFactor');
    await page.getByLabel('Correlation 1: rank correlation').fill('0.4');
    await screenshot(page, 'reserves-case-inputs');
    await page.getByRole('button', { name: 'Run', exact: true }).click();

    await page.locator('caption', { hasText: 'Probabilistic volumes' }).waitFor({ timeout: 60_000 });
    const pct = await recoverablePercentiles(page);
    expect(pct.p90).toBeGreaterThan(0);
    expect(pct.p90).toBeLessThan(pct.p50);
    expect(pct.p50).toBeLessThan(pct.p10);
    await page.getByRole('heading', { name: /Monte Carlo: 100,000 trials/ }).waitFor({ state: 'visible' }); // fails the test when it does not show
    await page.getByRole('img', { name: /histogram of 100000 trials/ }).waitFor({ state: 'visible' });
    await page.getByRole('img', { name: /Tornado of Recoverable/ }).waitFor({ state: 'visible' });
    expect(await page.getByRole('note', { name: 'Correlated inputs' }).textContent()).toMatch(/Porosity with Recovery factor 0\.40, drawn 0\.[34]\d\d/);
    await screenshot(page, 'reserves-case-results');

    // XLSX export: the workbook carries the caution and the same P90
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export XLSX' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^E2E-Wren-oil-rev\d+\.xlsx$/);
    const path = await download.path();
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(Uint8Array.from(readFileSync(path)).buffer);
    expect(String(wb.getWorksheet('Summary')!.getRow(2).getCell(2).value)).toMatch(/SPE-PRMS/);
    const prob = wb.getWorksheet('Probabilistic')!;
    expect(prob.getRow(3).getCell(1).value).toBe('P90');
    expect(Number(prob.getRow(3).getCell(4).value)).toBeCloseTo(pct.p90, 3);
    expect(JSON.stringify(wb.getWorksheet('Inputs')!.getSheetValues())).toMatch(/Core Sw from the plug set/);
    expect(JSON.stringify(wb.getWorksheet('Inputs')!.getSheetValues())).toMatch(/"Porosity \(fraction\)","Recovery factor \(fraction\)",0\.4,0\.[34]\d*/);

    // a plot as PNG, drawn in the browser
    const [png] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('group', { name: 'Export Histogram: Recoverable' }).getByRole('button', { name: 'Export PNG' }).click(),
    ]);
    expect(png.suggestedFilename()).toMatch(/histogram\.png$/);
    const bytes = readFileSync(await png.path());
    expect(bytes.subarray(1, 4).toString('latin1')).toBe('PNG');

    // submit for review
    await page.getByRole('button', { name: 'Submit for review' }).click();
    await page.getByText('Waiting for review').first().waitFor();
    await page.close();
  });

  it('the reviewer approves the case; it no longer offers edits', async () => {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    await signIn(page, baseUrl, 'reviewer@poreline.demo', 'reviewer-demo-2026');
    await page.goto(caseUrl);
    await page.getByLabel('Review comment (required to return)').fill('Ranges agreed in the peer assist.');
    await page.getByRole('button', { name: 'Approve' }).click();
    await page.getByText('Approved', { exact: true }).first().waitFor();
    expect(await page.getByRole('button', { name: 'Submit for review' }).count()).toBe(0);
    await screenshot(page, 'reserves-case-approved');
    await page.close();
  });

  it('the demo gas case shows the p/z cross-check with drained gas and wells needed, a decline fit and the gas inflow estimate', async () => {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    await signIn(page, baseUrl, 'engineer@poreline.demo', 'engineer-demo-2026');
    await page.getByRole('link', { name: 'Wrenmoor Field' }).click();
    await page.getByRole('link', { name: 'Reserves cases' }).click();
    await page.getByRole('link', { name: 'Fenna Sand gas – base case' }).click();
    await page.getByRole('tab', { name: /Production cross-checks/ }).click();
    await page.getByLabel('Well', { exact: true }).selectOption({ label: 'WM-1' });
    const data = page.getByLabel('Production data', { exact: true });
    await data.waitFor({ timeout: 30_000 });
    const options = await data.locator('option').allTextContents();
    const pressure = options.find((o) => o.startsWith('Pressure'))!;
    await data.selectOption({ label: pressure });
    await page.getByRole('img', { name: /p\/z against cumulative gas/ }).waitFor({ timeout: 30_000 });
    await page.locator('caption', { hasText: 'Wells needed' }).waitFor();
    await screenshot(page, 'reserves-cross-check-pz');
    const rate = options.find((o) => o.startsWith('Rate'));
    if (rate) {
      await data.selectOption({ label: rate });
      await page.getByRole('img', { name: /Rate against time with the hyperbolic Arps fit/ }).waitFor({ timeout: 30_000 });
      await screenshot(page, 'reserves-cross-check-decline');
    }
    // a gas case gets the gas form of the inflow equation, started from the case's reservoir pressure
    await page.getByRole('tab', { name: /Inflow/ }).click();
    const pr = Number(await page.getByLabel('Average reservoir pressure pr (psia)').inputValue());
    expect(pr).toBeGreaterThan(0);
    await page.getByRole('button', { name: 'Estimate gas rate' }).click();
    const result = page.getByRole('region', { name: 'Gas inflow result' });
    await result.waitFor();
    expect(Number(await result.locator('[data-stat="rate"] [data-value]').getAttribute('data-value'))).toBeGreaterThan(0);
    await result.getByText(/1422 T mu z/).waitFor({ state: 'visible' });
    await screenshot(page, 'reserves-inflow');
    await page.close();
  });
});
