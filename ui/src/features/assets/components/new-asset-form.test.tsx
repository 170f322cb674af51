import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import { assetsQueryOptions } from '../api/get-assets';
import { NewAssetForm } from './new-asset-form';

describe('NewAssetForm', () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('asks for a name before sending anything', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<NewAssetForm />);
    fireEvent.click(screen.getByRole('button', { name: 'Create asset' }));
    expect(await screen.findByText('Give the asset a name.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('POSTs name and description, reports the new asset and marks the assets list stale', async () => {
    const asset = { id: 'a9', name: 'North Tern', description: 'Gas', role: 'admin', isDemo: false };
    const fetchMock = vi.fn(async () => jsonResponse(201, asset));
    vi.stubGlobal('fetch', fetchMock);
    const onCreated = vi.fn();
    const { queryClient } = renderWithProviders(<NewAssetForm onCreated={onCreated} />);
    queryClient.setQueryData(assetsQueryOptions().queryKey, []);
    const form = screen.getByRole('form', { name: 'New asset' });
    fireEvent.change(within(form).getByLabelText('Asset name'), { target: { value: ' North Tern ' } });
    fireEvent.change(within(form).getByLabelText('Description (optional)'), { target: { value: 'Gas' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Create asset' }));
    expect((await screen.findByRole('status')).textContent).toBe('Asset North Tern created; you are its admin.');
    expect(onCreated).toHaveBeenCalledWith(asset);
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect([url, init.method, JSON.parse(String(init.body))]).toEqual(['/api/assets', 'POST', { name: 'North Tern', description: 'Gas' }]);
    await waitFor(() => expect(queryClient.getQueryState(assetsQueryOptions().queryKey)?.isInvalidated).toBe(true));
  });

  it("shows the server's refusal of a taken name", async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(409, { statusCode: 409, message: 'name: an asset named "North Tern" already exists in your organisation.' })));
    renderWithProviders(<NewAssetForm />);
    fireEvent.change(screen.getByLabelText('Asset name'), { target: { value: 'North Tern' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create asset' }));
    expect((await screen.findByRole('alert')).textContent).toContain('already exists');
  });
});
