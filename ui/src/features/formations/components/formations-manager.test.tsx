import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import type { FormationDto } from '../../../types/workbench';
import { FormationsManager } from './formations-manager';

const formations: FormationDto[] = [
  { id: 'f2', name: 'Wren Sand', ordinal: 2, colour: '#4f9fa8', lithology: 'sandstone', cutoffs: { vshMax: 0.4, phiMin: 0.08, swMax: 0.6, permMin: null } },
  { id: 'f1', name: 'Fenna Sand', ordinal: 1, colour: '#c9a227', lithology: 'sandstone', cutoffs: { vshMax: 0.35, phiMin: 0.1, swMax: 0.5, permMin: null } },
];

function serve() {
  const calls: { method: string; url: string; body: unknown }[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      const method = init?.method ?? 'GET';
      const body = init?.body ? JSON.parse(String(init.body)) : undefined;
      calls.push({ method, url, body });
      if (url.endsWith('/cutoffs')) {
        return jsonResponse(200, {
          formation: { ...formations[0], cutoffs: body },
          recomputed: [
            { wellId: 'w1', wellName: 'WM-1', interpretationId: 'i1', version: 2, status: 'draft', netPayBefore: 91.76, netPayAfter: 60.5, changed: true },
            { wellId: 'w2', wellName: 'WM-2', interpretationId: 'i2', version: 1, status: 'approved', netPayBefore: 92.62, netPayAfter: null, changed: false },
          ],
        });
      }
      return jsonResponse(200, formations);
    }),
  );
  return calls;
}

describe('FormationsManager', () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('lists formations in stratigraphic order with their cutoffs', () => {
    serve();
    renderWithProviders(<FormationsManager assetId="a1" formations={formations} canEdit />);
    const names = screen.getAllByRole('textbox', { name: /^Name of / }).map((i) => (i as HTMLInputElement).value);
    expect(names).toEqual(['Fenna Sand', 'Wren Sand']);
    expect((screen.getByRole('textbox', { name: 'Sw max of Wren Sand' }) as HTMLInputElement).value).toBe('0.6');
  });

  it('stores new cutoffs and lists what the server recomputed, leaving approved versions alone', async () => {
    const calls = serve();
    renderWithProviders(<FormationsManager assetId="a1" formations={formations} canEdit />);
    fireEvent.change(screen.getByRole('textbox', { name: 'Porosity min of Wren Sand' }), { target: { value: '0.12' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save Wren Sand' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'PUT')).toBe(true));
    const put = calls.find((c) => c.method === 'PUT')!;
    expect(put.url).toBe('/api/assets/a1/formations/f2/cutoffs');
    expect(put.body).toEqual({ vshMax: 0.4, phiMin: 0.12, swMax: 0.6, permMin: null });
    const note = await screen.findByRole('status');
    expect(note.textContent).toContain('WM-1 v2: net pay 91.76 → 60.5');
    expect(note.textContent).toContain('approved, left as it is');
  });

  it('refuses a cutoff outside 0..1 with a message naming the cutoff and the formation', async () => {
    const calls = serve();
    renderWithProviders(<FormationsManager assetId="a1" formations={formations} canEdit />);
    fireEvent.change(screen.getByRole('textbox', { name: 'Vsh max of Fenna Sand' }), { target: { value: '1.4' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save Fenna Sand' }));
    expect((await screen.findByRole('alert')).textContent).toBe('Vsh max of Fenna Sand must be a fraction between 0 and 1');
    expect(calls.filter((c) => c.method !== 'GET')).toHaveLength(0);
  });

  it('moves a formation up by asking the server for its new position', async () => {
    const calls = serve();
    renderWithProviders(<FormationsManager assetId="a1" formations={formations} canEdit />);
    fireEvent.click(screen.getByRole('button', { name: 'Move Wren Sand up' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ ordinal: 1 }));
    expect(calls.find((c) => c.method === 'PATCH')?.url).toBe('/api/assets/a1/formations/f2');
  });
});
