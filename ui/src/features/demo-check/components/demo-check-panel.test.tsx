import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { createQueryClient } from '../../../lib/query-client';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import type { DemoCheck, DemoZoneRow } from '../api/get-demo-check';
import { DemoCheckPanel } from './demo-check-panel';

function zone(well: string, name: string, quantity: DemoZoneRow['quantity'], model: number, evaluated: number, tolerance: number, zoneKind: DemoZoneRow['zoneKind'] = 'formation'): DemoZoneRow {
  const unit = quantity === 'net pay' || quantity === 'net reservoir' ? 'ft' : 'v/v';
  return { well, zone: name, zoneKind, quantity, unit, model, evaluated, difference: evaluated - model, tolerance, pass: Math.abs(evaluated - model) <= tolerance };
}

/** A small answer of the check (test data shaped like the API's, not check values). */
function answer(overrides: Partial<DemoCheck> = {}): DemoCheck {
  const zones = [
    zone('WM-1', 'Wren Sand', 'net reservoir', 91.56, 91.5, 0.5),
    zone('WM-1', 'Wren Sand', 'net pay', 91.56, 91.5, 0.5),
    zone('WM-1', 'Wren Sand', 'mean porosity', 0.231, 0.2308, 0.005),
    zone('WM-1', 'Wren Sand', 'mean Sw', 0.195, 0.2, 0.02),
    zone('WM-2', 'Fenna Sand', 'net reservoir', 43.15, 43, 0.5),
    zone('WM-2', 'Fenna Sand', 'net pay', 37.83, 36.5, 0.5),
    zone('WM-1', 'Wren Sand oil', 'net pay', 40, 40, 0.5, 'fluid'),
  ];
  return {
    assetId: 'a1',
    generatedAt: '2026-12-02T10:00:00Z',
    explanation: 'The demo field is generated from a known earth model.',
    basis: ['Logs: the stored LAS files.'],
    tolerances: { thickness: 'one sample step', porosity: 0.005, sw: 0.02, volumeRelative: 0.02 },
    summary: {
      zoneRows: zones.length,
      zoneRowsPassed: zones.filter((z) => z.pass).length,
      volumeRows: 2,
      volumeRowsPassed: 1,
      zonesEvaluated: 2,
      zonesInModel: 3,
      allPass: false,
      largest: { netReservoirFt: 0.15, netPayFt: 1.33, porosity: 0.0005, sw: 0.005, volumeRelative: 0.031 },
    },
    zones,
    volumes: [
      { accumulation: 'Fenna gas', fluid: 'gas', unit: 'scf', model: 30.62e9, evaluated: 30.5e9, relativeDifference: -0.0039, tolerance: 0.02, pass: true, wells: ['WM-1', 'WM-2'], missingWells: [], areaAcres: 748.6, fvf: 0.0061, modelInputs: { netPayFt: 35, porosity: 0.2, sw: 0.19 }, evaluatedInputs: { netPayFt: 35, porosity: 0.2, sw: 0.19 } },
      { accumulation: 'Wren oil leg', fluid: 'oil', unit: 'STB', model: 122.48e6, evaluated: 126.28e6, relativeDifference: 0.031, tolerance: 0.02, pass: false, wells: ['WM-4'], missingWells: [], areaAcres: 2711.7, fvf: 1.28, modelInputs: { netPayFt: 40.8, porosity: 0.235, sw: 0.222 }, evaluatedInputs: { netPayFt: 42, porosity: 0.235, sw: 0.222 } },
    ],
    notEvaluated: [{ well: 'WM-4', zone: 'Fenna Sand', reason: "Zone 'Fenna Sand' is not evaluated: it lies outside the logged interval." }],
    caution: 'Estimates only.',
    ...overrides,
  };
}

function serve(status: number, body: unknown) {
  const fetch = vi.fn(async (_url: string) => jsonResponse(status, body));
  vi.stubGlobal('fetch', fetch);
  return fetch;
}

// Radix tables are slow to query by role in jsdom on a busy machine: a generous per-test timeout.
describe('DemoCheckPanel', { timeout: 20_000 }, () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('shows each volume with model, evaluated, difference and a pass or fail, and says that not everything is within tolerance', async () => {
    const fetch = serve(200, answer());
    renderWithProviders(<DemoCheckPanel assetId="a1" />);
    const volumes = await screen.findByRole('table', { name: 'In-place volumes, model vs evaluated' });
    expect(String(fetch.mock.calls[0][0])).toBe('/api/assets/a1/demo-check');
    const fenna = within(volumes).getByRole('rowheader', { name: 'Fenna gas' }).closest('tr')!;
    expect(within(fenna).getByText('30.62 Bscf')).toBeTruthy();
    expect(within(fenna).getByText('30.50 Bscf')).toBeTruthy();
    expect(within(fenna).getByText('-0.39%')).toBeTruthy();
    expect(within(fenna).getByText('Pass')).toBeTruthy();
    const wren = within(volumes).getByRole('rowheader', { name: 'Wren oil leg' }).closest('tr')!;
    expect(within(wren).getByText('122.48 MMSTB')).toBeTruthy();
    expect(within(wren).getByText('+3.10%')).toBeTruthy();
    expect(within(wren).getByText('Fail')).toBeTruthy();
    expect(screen.getByText('Differences outside tolerance')).toBeTruthy();
    expect(screen.getByText(/6 of 7 zone comparisons within tolerance \(1 outside\); 1 of 2 volumes within 2%/)).toBeTruthy();
  });

  it('lists each formation zone once with model and evaluated values side by side, failing the zone when one quantity fails', async () => {
    serve(200, answer());
    renderWithProviders(<DemoCheckPanel assetId="a1" />);
    fireEvent.click((await screen.findByText(/Formation zones \(2 of 3 evaluated\)/)).closest('summary')!);
    const table = screen.getByRole('table', { name: 'Formation zones, model vs evaluated' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    const wm1 = rows.find((r) => within(r).queryByText('WM-1'))!;
    expect(wm1.textContent).toContain('91.6 / 91.5');
    expect(wm1.textContent).toContain('0.231 / 0.231');
    expect(within(wm1).getByText('Pass')).toBeTruthy();
    const wm2 = rows.find((r) => within(r).queryByText('WM-2'))!;
    expect(wm2.textContent).toContain('37.8 / 36.5');
    expect(within(wm2).getByText('Fail')).toBeTruthy();
    fireEvent.click(screen.getByText(/Fluid zones \(formations cut at the contacts/).closest('summary')!);
    const fluid = screen.getByRole('table', { name: 'Fluid zones, model vs evaluated' });
    expect(within(fluid).getByText('Wren Sand oil')).toBeTruthy();
  });

  it('names the zones it could not evaluate, explains the demo model and carries the reserves caution', async () => {
    serve(200, answer({ summary: { ...answer().summary, allPass: true, zoneRowsPassed: 7, volumeRowsPassed: 2 } }));
    renderWithProviders(<DemoCheckPanel assetId="a1" />);
    expect(await screen.findByText('Engine recovers the model')).toBeTruthy();
    const list = screen.getByRole('list', { name: 'Zones not evaluated' });
    expect(list.textContent).toContain('WM-4 Fenna Sand');
    expect(screen.getByText(/generated from a known layered earth model/)).toBeTruthy();
    expect(screen.getByText(/SPE-PRMS or the local regulator/).textContent).toMatch(/qualified evaluator/);
  });

  it('renders nothing for an asset that is not the demo asset (the check answers 404)', async () => {
    const fetch = serve(404, { statusCode: 404, message: 'The model-vs-evaluated check exists only for the demo asset.', error: 'Not Found' });
    const { container } = renderWithProviders(<DemoCheckPanel assetId="other" />);
    await vi.waitFor(() => expect(fetch).toHaveBeenCalled());
    await vi.waitFor(() => expect(container.querySelector('section')).toBeNull());
  });

  it('says so when the check fails on the server', async () => {
    serve(500, { statusCode: 500, message: 'Internal server error', error: 'Internal Server Error' });
    const client = createQueryClient();
    client.setDefaultOptions({ queries: { retry: false } });
    renderWithProviders(<DemoCheckPanel assetId="a1" />, client);
    expect((await screen.findByRole('alert')).textContent).toContain('The check could not run: Internal server error');
  });
});
