import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import { oilInputs, reservesCase, resultsFor } from '../../../test/reserves-fixture';
import { CaseEditor } from './case-editor';

describe('CaseEditor', () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('shows the caution, P90 < P50 < P10 with the PRMS convention, and plots with export buttons', () => {
    renderWithProviders(<CaseEditor assetId="a1" reservesCase={reservesCase()} canEdit canReview={false} />);
    expect(screen.getAllByRole('note', { name: 'Caution about volumes' }).length).toBeGreaterThan(0);
    expect(screen.getAllByText(/SPE-PRMS/).length).toBeGreaterThan(0);
    const table = screen.getByRole('table', { name: 'Probabilistic volumes' });
    const value = (k: string) => Number(table.querySelector(`[data-stat="${k}"] [data-value]`)!.getAttribute('data-value'));
    expect(value('p90')).toBeLessThan(value('p50'));
    expect(value('p50')).toBeLessThan(value('p10'));
    expect(screen.getByText(/P90 is the low estimate: the value exceeded with 90 % probability/)).toBeTruthy();
    expect(screen.getByRole('img', { name: /Recoverable histogram of 5000 trials/ })).toBeTruthy();
    expect(screen.getByRole('img', { name: /probability of exceeding/ })).toBeTruthy();
    expect(screen.getByRole('img', { name: /Tornado of Recoverable: Area, Sw/ })).toBeTruthy();
    expect(within(screen.getByRole('group', { name: 'Export Histogram: Recoverable' })).getByRole('button', { name: 'Export SVG' })).toBeTruthy();
    // deterministic OOIP, Craft & Hawkins by hand: 7758.37 x 640 x 30 x 0.2 x 0.75 / 1.2 = 18.62 MMSTB
    expect(within(screen.getByRole('table', { name: 'Deterministic volumes' })).getByText('18.62 MMSTB')).toBeTruthy();
  });

  it('a viewer sees no Run, Submit or Override controls, but can export', async () => {
    renderWithProviders(<CaseEditor assetId="a1" reservesCase={reservesCase()} canEdit={false} canReview={false} />);
    expect(screen.queryByRole('button', { name: 'Submit for review' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Export XLSX' })).toBeTruthy();
    fireEvent.mouseDown(screen.getByRole('tab', { name: /Sources and inputs/ }));
    fireEvent.click(screen.getByRole('tab', { name: /Sources and inputs/ }));
    await screen.findByRole('table', { name: 'Sources and combined values' });
    expect(screen.queryByRole('button', { name: 'Run' })).toBeNull();
    expect(screen.queryByRole('button', { name: /Override/ })).toBeNull();
  });

  it('marks a stale source and refreshes it through the API', async () => {
    const fetchMock = vi.fn(async () => jsonResponse(200, reservesCase({ staleSources: 0 }, false)));
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<CaseEditor assetId="a1" reservesCase={reservesCase({}, false)} canEdit canReview={false} />);
    expect(screen.getByText('stale: v2 approved')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Refresh sources' }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalled());
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/assets/a1/reserves-cases/c1/refresh-sources');
    expect(init.method).toBe('POST');
  });

  it('a reviewer must write a comment to return a submitted case', async () => {
    const fetchMock = vi.fn(async () => jsonResponse(200, reservesCase({ status: 'returned', reviewComment: 'Explain RF' })));
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<CaseEditor assetId="a1" reservesCase={reservesCase({ status: 'submitted', staleSources: 0 })} canEdit={false} canReview />);
    fireEvent.click(screen.getByRole('button', { name: 'Return' }));
    expect(await screen.findByText('Say what should change before returning the case.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
    fireEvent.change(screen.getByLabelText('Review comment (required to return)'), { target: { value: 'Explain RF' } });
    fireEvent.click(screen.getByRole('button', { name: 'Return' }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalled());
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/assets/a1/reserves-cases/c1/return');
    expect(JSON.parse(String(init.body))).toEqual({ comment: 'Explain RF' });
  });

  it('correlated inputs: the results say what was asked and what was drawn', () => {
    const inputs = { ...oilInputs(), correlations: [{ a: 'area' as const, b: 'sw' as const, rank: 0.4 }] };
    const withPair = reservesCase({ inputs, results: resultsFor(inputs) });
    renderWithProviders(<CaseEditor assetId="a1" reservesCase={withPair} canEdit canReview={false} />);
    const note = screen.getByRole('note', { name: 'Correlated inputs' });
    expect(note.textContent).toMatch(/Area with Sw 0\.40, drawn 0\.[34]\d\d/);
  });

  it('correlated inputs: the inputs tab adds a pair, refuses a rank out of range, and saves it', async () => {
    const fetchMock = vi.fn(async (_url: string, init?: RequestInit) => jsonResponse(200, reservesCase({ inputs: { ...oilInputs(), ...JSON.parse(String(init?.body)).inputs } })));
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<CaseEditor assetId="a1" reservesCase={reservesCase()} canEdit canReview={false} />);
    fireEvent.mouseDown(screen.getByRole('tab', { name: /Sources and inputs/ }));
    fireEvent.click(screen.getByRole('tab', { name: /Sources and inputs/ }));
    fireEvent.click(await screen.findByRole('button', { name: 'Add a correlation' }));
    expect((screen.getByLabelText('Correlation 1: first input') as HTMLSelectElement).value).toBe('area');
    expect((screen.getByLabelText('Correlation 1: second input') as HTMLSelectElement).value).toBe('sw');
    fireEvent.change(screen.getByLabelText('Correlation 1: rank correlation'), { target: { value: '1.3' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save inputs' }));
    expect(await screen.findByText('Rank correlation must be a number from -0.99 to 0.99.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
    fireEvent.change(screen.getByLabelText('Correlation 1: rank correlation'), { target: { value: '-0.3' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save inputs' }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalled());
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/assets/a1/reserves-cases/c1');
    expect(JSON.parse(String(init.body)).inputs.correlations).toEqual([{ a: 'area', b: 'sw', rank: -0.3 }]);
  });
});
