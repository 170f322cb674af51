import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { assetScope, meKey, usersKey } from '../../../lib/query-keys';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import type { Asset } from '../../../types/api';
import { assetQueryOptions } from '../api/get-asset';
import { assetsQueryOptions } from '../api/get-assets';
import { EditAssetDialog } from './edit-asset-dialog';

const tern: Asset = { id: 'a1', name: 'North Tern', description: 'Gas', role: 'admin', isDemo: false };

function open() {
  fireEvent.click(screen.getByRole('button', { name: 'Edit North Tern' }));
  return screen.getByRole('form', { name: 'Edit North Tern' });
}

function messageOf(form: HTMLElement, label: string): string {
  const input = within(form).getByLabelText(label);
  expect(input.getAttribute('aria-invalid')).toBe('true');
  return document.getElementById(input.getAttribute('aria-describedby') ?? '')?.textContent ?? '';
}

describe('EditAssetDialog', () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('opens with the current name and description, and asks for a name before sending', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<EditAssetDialog asset={tern} />);
    const form = open();
    expect(within(form).getByLabelText('Asset name')).toHaveProperty('value', 'North Tern');
    expect(within(form).getByLabelText('Description')).toHaveProperty('value', 'Gas');
    fireEvent.change(within(form).getByLabelText('Asset name'), { target: { value: '   ' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save asset' }));
    await waitFor(() => expect(messageOf(form, 'Asset name')).toBe('Give the asset a name.'));
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('PATCHes only the changed name, closes, and refreshes every list that shows the name (not the asset\'s wells)', async () => {
    const renamed = { ...tern, name: 'South Tern' };
    const fetchMock = vi.fn(async () => jsonResponse(200, renamed));
    vi.stubGlobal('fetch', fetchMock);
    const { queryClient } = renderWithProviders(<EditAssetDialog asset={tern} />);
    const wellsKey = [...assetScope('a1'), 'wells'];
    queryClient.setQueryData(assetsQueryOptions().queryKey, [tern]);
    queryClient.setQueryData(assetQueryOptions('a1').queryKey, tern);
    queryClient.setQueryData(meKey, { id: 'u1', memberships: [{ assetId: 'a1', assetName: 'North Tern', role: 'admin' }] });
    queryClient.setQueryData(usersKey, []);
    queryClient.setQueryData(wellsKey, []);

    const form = open();
    fireEvent.change(within(form).getByLabelText('Asset name'), { target: { value: ' South Tern ' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save asset' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());

    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect([url, init.method, JSON.parse(String(init.body))]).toEqual(['/api/assets/a1', 'PATCH', { name: 'South Tern' }]);
    expect(queryClient.getQueryData(assetQueryOptions('a1').queryKey)).toEqual(renamed);
    for (const key of [assetsQueryOptions().queryKey, meKey, usersKey]) expect(queryClient.getQueryState(key)?.isInvalidated).toBe(true);
    expect(queryClient.getQueryState(wellsKey)?.isInvalidated).toBe(false);
  });

  it('closes without a request when nothing changed', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<EditAssetDialog asset={tern} />);
    const form = open();
    fireEvent.click(within(form).getByRole('button', { name: 'Save asset' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("shows the service's refusal of a taken name under the name, and keeps the dialog open", async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(409, { statusCode: 409, message: 'name: an asset named "Wrenmoor" already exists in your organisation.' })));
    renderWithProviders(<EditAssetDialog asset={tern} />);
    const form = open();
    fireEvent.change(within(form).getByLabelText('Asset name'), { target: { value: 'Wrenmoor' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save asset' }));
    await waitFor(() => expect(messageOf(form, 'Asset name')).toBe('An asset named "Wrenmoor" already exists in your organisation.'));
    expect(screen.getByRole('dialog')).toBeTruthy();
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it("shows a refusal that names no field (no longer admin) in an alert", async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(403, { statusCode: 403, message: 'Forbidden resource', error: 'Forbidden' })));
    renderWithProviders(<EditAssetDialog asset={tern} />);
    const form = open();
    fireEvent.change(within(form).getByLabelText('Description'), { target: { value: 'Gas and condensate' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save asset' }));
    expect((await screen.findByRole('alert')).textContent).toBe('Forbidden resource');
  });
});
