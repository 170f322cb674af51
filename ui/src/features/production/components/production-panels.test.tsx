import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { FakeXhr } from '../../../test/fake-xhr';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import { GasInflowCalculator } from './gas-inflow-calculator';
import { InflowCalculator } from './inflow-calculator';
import { SeriesUploadForm } from './series-upload-form';

describe('production data and inflow', () => {
  beforeEach(() => {
    FakeXhr.requests = [];
    setToken('t-1');
  });
  afterEach(() => vi.unstubAllGlobals());

  it('SeriesUploadForm sends typed points as a CSV file with units, and lists each refused line', async () => {
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    renderWithProviders(<SeriesUploadForm assetId="a1" wellId="w1" wellName="WM-1" />);
    fireEvent.click(screen.getByRole('radio', { name: 'Enter points' }));
    fireEvent.change(screen.getByLabelText('Points as CSV'), { target: { value: 'cum_gas,pressure\n0,3000\n500,abc' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add data' }));
    await waitFor(() => expect(FakeXhr.requests).toHaveLength(1));
    const xhr = FakeXhr.requests[0];
    expect(xhr.url).toBe('/api/assets/a1/wells/w1/production/upload');
    const form = xhr.body as FormData;
    expect(form.get('kind')).toBe('pressure');
    expect(form.get('cumGasUnit')).toBe('MMscf');
    expect(await (form.get('file') as File).text()).toBe('cum_gas,pressure\n0,3000\n500,abc');
    act(() =>
      xhr.respond(400, { statusCode: 400, message: ['x line 3: pressure must be a number (got "abc")'], errors: [{ line: 3, message: 'pressure must be a number (got "abc")' }], stored: false }),
    );
    expect(await screen.findByText('Line 3: pressure must be a number (got "abc")')).toBeTruthy();
    expect(screen.getByText(/Nothing was stored/)).toBeTruthy();
  });

  it('InflowCalculator refuses a missing viscosity before asking the server, then shows both wells', async () => {
    const fetchMock = vi.fn(async () =>
      jsonResponse(200, {
        vertical: { rateStbPerDay: 535.6, productivityIndex: 1.071, equation: 'q = 0.00708 k h dp / (mu Bo (ln(re/rw) - 0.75 + s))' },
        horizontal: { rateStbPerDay: 3520, productivityIndex: 7.04, aFt: 1666, beta: 1, verticalSteadyStateRateStbPerDay: 487.9, productivityRatio: 7.2, equation: 'Joshi (1988)' },
        assumptions: ['Single-phase oil flow.'],
      }),
    );
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<InflowCalculator assetId="a1" netPayFt={30} bo={1.2} />);
    fireEvent.change(screen.getByLabelText('Oil viscosity (cp)'), { target: { value: '' } });
    fireEvent.click(screen.getByRole('button', { name: 'Estimate rate' }));
    expect(await screen.findByText('Viscosity is required.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
    fireEvent.change(screen.getByLabelText('Oil viscosity (cp)'), { target: { value: '1.2' } });
    fireEvent.click(screen.getByRole('button', { name: 'Estimate rate' }));
    await screen.findByRole('region', { name: 'Inflow result' });
    const body = JSON.parse(String((fetchMock.mock.calls[0] as unknown as [string, RequestInit])[1].body));
    expect(body).toMatchObject({ netPayFt: 30, fvf: 1.2, viscosityCp: 1.2, horizontal: { lengthFt: 2000 } });
    expect(screen.getByText(/7\.2 ×/)).toBeTruthy();
  });

  it('GasInflowCalculator starts from the case PVT, refuses a bottom-hole pressure above the reservoir pressure, then posts and shows the rate and z', async () => {
    const fetchMock = vi.fn(async () =>
      jsonResponse(200, {
        rateMscfPerDay: 2345.6,
        absoluteOpenFlowMscfPerDay: 3664.9,
        coefficient: 9.1625e-4,
        averagePressurePsia: 1840,
        pvt: { z: 0.8712, zMethod: 'hall-yarborough', tpr: 1.63, ppr: 2.75 },
        equation: 'q [Mscf/d] = k h (pr^2 - pwf^2) / (1422 T mu z (ln(re/rw) - 0.75 + s))',
        assumptions: ['Single-phase gas, Darcy flow.'],
      }),
    );
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<GasInflowCalculator assetId="a1" netPayFt={42.5} gas={{ pressurePsia: 2300, temperatureF: 175, gasGravity: 0.68, zMethod: 'hall-yarborough' }} />);
    expect((screen.getByLabelText('Average reservoir pressure pr (psia)') as HTMLInputElement).value).toBe('2300');
    expect((screen.getByLabelText('Flowing bottom-hole pressure pwf (psia)') as HTMLInputElement).value).toBe('1380');
    fireEvent.change(screen.getByLabelText('Flowing bottom-hole pressure pwf (psia)'), { target: { value: '2500' } });
    fireEvent.click(screen.getByRole('button', { name: 'Estimate gas rate' }));
    expect(await screen.findByText(/must not exceed the reservoir pressure/)).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
    fireEvent.change(screen.getByLabelText('Flowing bottom-hole pressure pwf (psia)'), { target: { value: '1380' } });
    fireEvent.click(screen.getByRole('button', { name: 'Estimate gas rate' }));
    const result = await screen.findByRole('region', { name: 'Gas inflow result' });
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/assets/a1/inflow/gas');
    expect(JSON.parse(String(init.body))).toMatchObject({ netPayFt: 42.5, reservoirPressurePsia: 2300, bottomholePressurePsia: 1380, temperatureF: 175, gasGravity: 0.68, zMethod: 'hall-yarborough' });
    expect(result.querySelector('[data-stat="rate"] [data-value]')!.getAttribute('data-value')).toBe('2345.6');
    expect(result.textContent).toMatch(/Hall & Yarborough/);
  });
});
