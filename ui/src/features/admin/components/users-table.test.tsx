import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import type { UserAccount } from '../../../types/admin';
import { UsersTable } from './users-table';

const users: UserAccount[] = [
  { id: 'u2', email: 'sam@tern.test', name: 'Sam Petro', isAdmin: false, createdAt: '2026-03-01T09:00:00Z', memberships: [{ assetId: 'a1', assetName: 'North Tern', role: 'petrophysicist' }] },
  { id: 'u1', email: 'lee@tern.test', name: 'Lee Admin', isAdmin: true, createdAt: '2026-03-01T08:00:00Z', memberships: [] },
  { id: 'u3', email: 'ari@tern.test', name: 'Ari Viewer', isAdmin: false, createdAt: '2026-03-02T08:00:00Z', memberships: [] },
];

function shownNames(): string[] {
  const rows = within(screen.getByRole('table', { name: 'People' })).getAllByRole('row').slice(1);
  return rows.map((r) => within(r).getAllByRole('cell')[0].textContent ?? '');
}

describe('UsersTable', () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('lists the accounts by name with e-mail, asset roles and the admin flag; the caller is marked', () => {
    renderWithProviders(<UsersTable users={users} currentUserId="u1" />);
    expect(shownNames()).toEqual(['Ari Viewer', 'Lee Admin', 'Sam Petro']);
    expect(within(screen.getByRole('list', { name: 'Assets of Sam Petro' })).getByText(/North Tern/).textContent).toContain('petrophysicist');
    expect(screen.getByText('admin (you)')).toBeTruthy();
    expect(screen.getByText('every asset, as admin')).toBeTruthy();
    expect(screen.getAllByText('none yet')).toHaveLength(1);
    expect(screen.getAllByRole('button', { name: /^Edit / }).map((b) => b.getAttribute('aria-label'))).toEqual(['Edit Ari Viewer', 'Edit Lee Admin', 'Edit Sam Petro']);
  });

  it('sorts by e-mail when its header is clicked, reversed on the second click', () => {
    renderWithProviders(<UsersTable users={users} currentUserId="u1" />);
    const header = screen.getByRole('button', { name: /E-mail/ });
    fireEvent.click(header);
    expect(shownNames()).toEqual(['Ari Viewer', 'Lee Admin', 'Sam Petro']);
    fireEvent.click(header);
    expect(shownNames()).toEqual(['Sam Petro', 'Lee Admin', 'Ari Viewer']);
  });

  it('grants admin with PATCH { isAdmin: true }, and shows the refusal to withdraw the last admin', async () => {
    const fetchMock = vi.fn(async (url: string, init?: RequestInit) =>
      url === '/api/users/u1'
        ? jsonResponse(409, { statusCode: 409, message: 'isAdmin: this is the last admin of the organisation; make another user admin first.' })
        : jsonResponse(200, { ...users[0], isAdmin: JSON.parse(String(init?.body)).isAdmin }),
    );
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<UsersTable users={users} currentUserId="u1" />);
    fireEvent.click(screen.getByRole('button', { name: 'Make Sam Petro an admin' }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalledTimes(1));
    const [url, init] = fetchMock.mock.calls[0];
    expect([url, init?.method, JSON.parse(String(init?.body))]).toEqual(['/api/users/u2', 'PATCH', { isAdmin: true }]);

    fireEvent.click(screen.getByRole('button', { name: 'Withdraw admin from Lee Admin' }));
    expect((await screen.findByRole('alert')).textContent).toContain('last admin of the organisation');
  });
});
