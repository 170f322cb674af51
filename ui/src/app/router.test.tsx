import { encodeCurveBundle } from '@poreline/core';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { getToken, setToken } from '../lib/auth-token';
import { createQueryClient } from '../lib/query-client';
import { jsonResponse } from '../test/render';
import type { Asset, Me, Role, WellDetail, WellRow } from '../types/api';
import { sendUnauthorizedToSignIn } from './app';
import { AppProviders } from './providers';
import { appRoutes } from './router';

function me(role: Role): Me {
  return { id: 'u1', email: 'pat@example.test', name: 'Pat Doe', isAdmin: false, memberships: [{ assetId: 'a1', assetName: 'North Basin', role }] };
}

const asset: Asset = { id: 'a1', name: 'North Basin', description: 'An invented gas field.', role: 'petrophysicist' };

const run = {
  id: 'r1',
  wellId: 'w1',
  fileName: 'heron-1.las',
  sha256: 'ab'.repeat(32),
  sizeBytes: 2048,
  lasVersion: '2.0',
  wrapped: false,
  depthUnit: 'm',
  start: 1500,
  stop: 1502,
  step: 0.5,
  rowCount: 5,
  curveCount: 3,
  uploadedAt: '2026-01-10T09:00:00Z',
  uploadedBy: '00000000-0000-4000-8000-000000000001',
  uploadedByName: 'Pat Doe',
};

const wellRow: WellRow = { id: 'w1', name: 'Heron-1', uwi: '100/01', logRunCount: 1, curveCount: 2, top: 1500, base: 1502, depthUnit: 'm', logRuns: [run] };

const wellDetail: WellDetail = {
  ...wellRow,
  logRuns: [
    {
      ...run,
      curves: [
        { id: 'c1', mnemonic: 'GR', unit: 'gAPI', description: 'Gamma ray', curveClass: 'gamma_ray', nullCount: 1, min: 40, max: 90 },
        { id: 'c2', mnemonic: 'RT', unit: 'ohm.m', description: 'True resistivity', curveClass: 'resistivity_deep', nullCount: 0, min: 2, max: 40 },
      ],
      diagnostics: [{ severity: 'info', line: 7, message: 'NULL value -999.25 read as missing' }],
    },
  ],
};

function samplesBundle(): Uint8Array {
  return encodeCurveBundle(
    [
      { mnemonic: 'DEPT', unit: 'm' },
      { mnemonic: 'GR', unit: 'gAPI', curveClass: 'gamma_ray' },
      { mnemonic: 'RT', unit: 'ohm.m', curveClass: 'resistivity_deep' },
    ],
    [new Float64Array([1500, 1500.5, 1501, 1501.5, 1502]), new Float64Array([40, 55, NaN, 90, 70]), new Float64Array([2, 4, 40, 8, 3])],
  );
}

/** A fake service answering by method and path, like the real one would. */
function stubService(role: Role = 'petrophysicist') {
  const fetchMock = vi.fn(async (url: string, init?: RequestInit) => {
    const method = init?.method ?? 'GET';
    const key = `${method} ${url}`;
    switch (key) {
      case 'POST /api/auth/login':
        return jsonResponse(201, { token: 'jwt-1', user: me(role) });
      case 'GET /api/setup':
        return jsonResponse(200, { needsFirstAdmin: false });
      case 'GET /api/auth/me':
        return jsonResponse(200, me(role));
      case 'GET /api/assets':
        return jsonResponse(200, [asset]);
      case 'GET /api/assets/a1':
        return jsonResponse(200, { ...asset, role });
      case 'GET /api/assets/a1/wells':
        return jsonResponse(200, [wellRow]);
      case 'GET /api/assets/a1/wells/w1':
        return jsonResponse(200, wellDetail);
      case 'GET /api/assets/a1/wells/w1/log-runs/r1/samples':
        return new Response(new Uint8Array(samplesBundle()), { status: 200, headers: { 'Content-Type': 'application/octet-stream' } });
      default:
        return jsonResponse(404, { statusCode: 404, message: `No route ${key}`, error: 'Not Found' });
    }
  });
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

function renderAt(path: string) {
  const queryClient = createQueryClient();
  const router = createMemoryRouter(appRoutes(queryClient), { initialEntries: [path] });
  sendUnauthorizedToSignIn(router, queryClient);
  render(
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>,
  );
  return router;
}

describe('routes', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('sends a signed-out user from / to the sign-in page, asking the server only the public set-up check', async () => {
    const fetchMock = stubService();
    const router = renderAt('/');
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(fetchMock.mock.calls.map(([url]) => url)).toEqual(['/api/setup']);
    expect(new Headers(fetchMock.mock.calls[0][1]?.headers).has('Authorization')).toBe(false);
  });

  it('signs in and lands on the assets list, with the user and role in the shell', async () => {
    stubService();
    const router = renderAt('/');
    fireEvent.change(await screen.findByLabelText('Email'), { target: { value: 'pat@example.test' } });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'secret' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { name: 'Assets', level: 1 })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/assets');
    expect(screen.getByRole('link', { name: 'North Basin' })).toBeTruthy();
    const shell = screen.getByRole('banner');
    expect(within(shell).getByText('Poreline')).toBeTruthy();
    expect(within(shell).getByText('Pat Doe')).toBeTruthy();
    expect(within(shell).getByText('petrophysicist')).toBeTruthy();
    expect(within(shell).getByRole('button', { name: 'Sign out' })).toBeTruthy();
  });

  it('returns a signed-out visitor of a deep link to it after sign-in', async () => {
    stubService();
    const router = renderAt('/assets/a1');
    await screen.findByRole('heading', { name: 'Sign in' });
    expect(router.state.location.search).toBe('?next=%2Fassets%2Fa1');
    fireEvent.change(screen.getByLabelText('Email'), { target: { value: 'pat@example.test' } });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'secret' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('heading', { name: 'North Basin', level: 1 })).toBeTruthy();
  });

  it('shows a petrophysicist the wells table, the New well form and an upload control per well', async () => {
    setToken('jwt-1');
    stubService('petrophysicist');
    renderAt('/assets/a1');
    const table = await screen.findByRole('table', { name: 'Wells' });
    expect(within(table).getByRole('link', { name: 'Heron-1' })).toBeTruthy();
    expect(within(table).getByText('1,500 – 1,502 m')).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'New well' })).toBeTruthy();
    expect(screen.getByLabelText('LAS files for Heron-1')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Edit North Basin' })).toBeNull();
  });

  it('offers the asset admin (not an organisation admin) to rename the asset from its page', async () => {
    setToken('jwt-1');
    stubService('admin');
    renderAt('/assets/a1');
    await screen.findByRole('table', { name: 'Wells' });
    expect(screen.getByRole('button', { name: 'Edit North Basin' })).toBeTruthy();
  });

  it('hides the New well form and the upload control from a viewer', async () => {
    setToken('jwt-1');
    stubService('viewer');
    renderAt('/assets/a1');
    await screen.findByRole('table', { name: 'Wells' });
    expect(screen.queryByRole('heading', { name: 'New well' })).toBeNull();
    expect(screen.queryByLabelText('LAS files for Heron-1')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Edit North Basin' })).toBeNull();
  });

  it('opens the well page with its curves, diagnostics and a depth view drawn from the binary samples', async () => {
    setToken('jwt-1');
    stubService();
    renderAt('/assets/a1');
    fireEvent.click(within(await screen.findByRole('table', { name: 'Wells' })).getByRole('link', { name: 'Heron-1' }));

    const svg = await screen.findByRole('img', { name: 'Depth view of Heron-1' });
    const paths = Array.from(svg.querySelectorAll('path[data-curve]'));
    expect(paths.map((p) => p.getAttribute('data-curve'))).toEqual(['GR', 'RT']);
    const curves = screen.getByRole('table', { name: 'Curves of heron-1.las' });
    expect(within(curves).getByRole('rowheader', { name: 'RT' })).toBeTruthy();
    expect(within(curves).getByText('resistivity_deep')).toBeTruthy();
    expect(screen.getByRole('list', { name: 'Diagnostics for heron-1.las' }).textContent).toContain('line 7');
  });

  it('goes back to sign-in, forgetting the token, when the stored token is refused', async () => {
    setToken('expired');
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(401, { statusCode: 401, message: 'Unauthorized' })));
    const router = renderAt('/assets');
    await screen.findByRole('heading', { name: 'Sign in' });
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
    expect(router.state.location.search).toBe('?next=%2Fassets');
    expect(getToken()).toBeNull();
  });

  it('takes a viewer from the shell to their account page, with the change-password form', async () => {
    setToken('jwt-1');
    stubService('viewer');
    const router = renderAt('/assets');
    fireEvent.click(within(await screen.findByRole('banner')).getByRole('link', { name: 'Your account' }));
    expect(await screen.findByRole('heading', { name: 'Your account', level: 1 })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/account');
    expect(screen.getByText('pat@example.test', { selector: 'main *' })).toBeTruthy();
    expect(screen.getByRole('form', { name: 'Change password' })).toBeTruthy();
  });

  it('signs out from the shell back to the sign-in page', async () => {
    setToken('jwt-1');
    stubService();
    const router = renderAt('/assets');
    fireEvent.click(within(await screen.findByRole('banner')).getByRole('button', { name: 'Sign out' }));
    await screen.findByRole('heading', { name: 'Sign in' });
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(getToken()).toBeNull();
  });
});
