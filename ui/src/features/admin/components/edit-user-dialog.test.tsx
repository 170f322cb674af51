import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { meKey } from '../../../lib/query-keys';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import type { UserAccount } from '../../../types/admin';
import { membersQueryOptions } from '../api/get-members';
import { usersQueryOptions } from '../api/get-users';
import { EditUserDialog } from './edit-user-dialog';

const sam: UserAccount = { id: 'u2', email: 'sam@tern.test', name: 'Sam Petro', isAdmin: false, createdAt: '2026-03-01T09:00:00Z', memberships: [{ assetId: 'a1', assetName: 'North Tern', role: 'petrophysicist' }] };

function open() {
  fireEvent.click(screen.getByRole('button', { name: 'Edit Sam Petro' }));
  return screen.getByRole('form', { name: 'Edit Sam Petro' });
}

function fillAndSave(form: HTMLElement, values: { name?: string; password?: string }) {
  if (values.name !== undefined) fireEvent.change(within(form).getByLabelText('Name'), { target: { value: values.name } });
  if (values.password !== undefined) fireEvent.change(within(form).getByLabelText('New password'), { target: { value: values.password } });
  fireEvent.click(within(form).getByRole('button', { name: 'Save user' }));
}

function messageOf(form: HTMLElement, label: string): string {
  const input = within(form).getByLabelText(label);
  expect(input.getAttribute('aria-invalid')).toBe('true');
  return document.getElementById(input.getAttribute('aria-describedby') ?? '')?.textContent ?? '';
}

function sentBodies(fetchMock: ReturnType<typeof vi.fn>) {
  return fetchMock.mock.calls.map(([url, init]) => [url, (init as RequestInit).method, JSON.parse(String((init as RequestInit).body))]);
}

describe('EditUserDialog', () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('names each wrong field and sends nothing: blank name, short password', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<EditUserDialog user={sam} />);
    const form = open();
    expect(within(form).getByLabelText('Name')).toHaveProperty('value', 'Sam Petro');
    fillAndSave(form, { name: '  ', password: 'eleven-char' });
    await waitFor(() => expect(messageOf(form, 'Name')).toBe('Give the person a name.'));
    expect(messageOf(form, 'New password')).toBe('A new password needs at least 12 characters (or leave it empty).');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('renames with PATCH { name } only, closes, says so, and refreshes users, me and the asset members', async () => {
    const fetchMock = vi.fn(async () => jsonResponse(200, { ...sam, name: 'Sam Petrova' }));
    vi.stubGlobal('fetch', fetchMock);
    const { queryClient } = renderWithProviders(<EditUserDialog user={sam} />);
    const membersKey = membersQueryOptions('a1').queryKey;
    queryClient.setQueryData(usersQueryOptions().queryKey, [sam]);
    queryClient.setQueryData(meKey, { id: 'u1', name: 'Lee Admin', memberships: [] });
    queryClient.setQueryData(membersKey, []);
    queryClient.setQueryData(membersQueryOptions('a2').queryKey, []);
    fillAndSave(open(), { name: ' Sam Petrova ' });
    expect((await screen.findByRole('status')).textContent).toBe('Saved.');
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(sentBodies(fetchMock)).toEqual([['/api/users/u2', 'PATCH', { name: 'Sam Petrova' }]]);
    for (const key of [usersQueryOptions().queryKey, meKey, membersKey]) expect(queryClient.getQueryState(key)?.isInvalidated).toBe(true);
    expect(queryClient.getQueryState(membersQueryOptions('a2').queryKey)?.isInvalidated).toBe(false);
  });

  it('resets the password with PATCH { password } and says so in the row', async () => {
    const fetchMock = vi.fn(async () => jsonResponse(200, sam));
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<EditUserDialog user={sam} />);
    fillAndSave(open(), { password: 'a-fresh-password' });
    expect((await screen.findByRole('status')).textContent).toBe('Password reset.');
    expect(sentBodies(fetchMock)).toEqual([['/api/users/u2', 'PATCH', { password: 'a-fresh-password' }]]);
  });

  it("shows the service's validation messages under the fields they name, and keeps the dialog open", async () => {
    const message = ['name must not be blank', 'password must be at least 12 characters'];
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(400, { statusCode: 400, message, error: 'Bad Request' })));
    renderWithProviders(<EditUserDialog user={sam} />);
    const form = open();
    fillAndSave(form, { name: 'Sam P', password: 'twelve-chars' });
    await waitFor(() => expect(messageOf(form, 'Name')).toBe('Name must not be blank'));
    expect(messageOf(form, 'New password')).toBe('New password must be at least 12 characters');
    expect(screen.getByRole('dialog')).toBeTruthy();
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('shows a refusal that names no field in an alert', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(404, { statusCode: 404, message: 'No such user in your organisation.' })));
    renderWithProviders(<EditUserDialog user={sam} />);
    fillAndSave(open(), { name: 'Sam P' });
    expect((await screen.findByRole('alert')).textContent).toBe('No such user in your organisation.');
  });
});
