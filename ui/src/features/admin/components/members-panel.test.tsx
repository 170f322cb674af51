import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import type { AssetMember } from '../../../types/admin';
import { MembersPanel } from './members-panel';

const lee: AssetMember = { userId: 'u1', name: 'Lee Admin', email: 'lee@tern.test', role: 'admin', isAdmin: true };
const sam: AssetMember = { userId: 'u2', name: 'Sam Petro', email: 'sam@tern.test', role: 'petrophysicist', isAdmin: false };

/** Answers GET with the members; PUT and DELETE with what the test gives. */
function stubMembers(answers: { put?: () => Response; del?: () => Response } = {}) {
  const fetchMock = vi.fn(async (url: string, init?: RequestInit) => {
    const method = init?.method ?? 'GET';
    if (method === 'GET' && url === '/api/assets/a1/members') return jsonResponse(200, [lee, sam]);
    if (method === 'PUT' && answers.put) return answers.put();
    if (method === 'DELETE' && answers.del) return answers.del();
    return jsonResponse(404, { statusCode: 404, message: `No route ${method} ${url}` });
  });
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

function sent(fetchMock: ReturnType<typeof stubMembers>, method: string) {
  return fetchMock.mock.calls.filter(([, init]) => (init?.method ?? 'GET') === method).map(([url, init]) => ({ url, body: init?.body ? JSON.parse(String(init.body)) : undefined }));
}

describe('MembersPanel', () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('lists the members with their role in a select, and marks organisation admins', async () => {
    stubMembers();
    renderWithProviders(<MembersPanel assetId="a1" assetName="North Tern" />);
    const table = await screen.findByRole('table', { name: 'Members of North Tern' });
    expect(within(table).getByRole('combobox', { name: 'Role of Sam Petro' })).toHaveProperty('value', 'petrophysicist');
    expect(within(table).getByRole('combobox', { name: 'Role of Lee Admin' })).toHaveProperty('value', 'admin');
    expect(within(table).getByText('org admin')).toBeTruthy();
  });

  it('adds a member by e-mail with the chosen role (PUT) and shows the answer', async () => {
    const kim: AssetMember = { userId: 'u3', name: 'Kim Reviewer', email: 'kim@tern.test', role: 'reviewer', isAdmin: false };
    const fetchMock = stubMembers({ put: () => jsonResponse(200, [lee, kim, sam]) });
    renderWithProviders(<MembersPanel assetId="a1" assetName="North Tern" knownEmails={['kim@tern.test']} />);
    await screen.findByRole('table', { name: 'Members of North Tern' });
    const form = screen.getByRole('form', { name: 'Add a member to North Tern' });
    fireEvent.change(within(form).getByLabelText('E-mail of the person'), { target: { value: 'kim@tern.test' } });
    fireEvent.change(within(form).getByLabelText('Role'), { target: { value: 'reviewer' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add member' }));
    expect(await screen.findByRole('combobox', { name: 'Role of Kim Reviewer' })).toHaveProperty('value', 'reviewer');
    expect(sent(fetchMock, 'PUT')).toEqual([{ url: '/api/assets/a1/members', body: { email: 'kim@tern.test', role: 'reviewer' } }]);
  });

  it('refuses a malformed e-mail before sending, and shows the server message for an unknown one', async () => {
    const fetchMock = stubMembers({ put: () => jsonResponse(404, { statusCode: 404, message: 'No user with the e-mail zed@tern.test in this organisation; they need an account first.' }) });
    renderWithProviders(<MembersPanel assetId="a1" assetName="North Tern" />);
    await screen.findByRole('table', { name: 'Members of North Tern' });
    const form = screen.getByRole('form', { name: 'Add a member to North Tern' });
    fireEvent.change(within(form).getByLabelText('E-mail of the person'), { target: { value: 'not-an-email' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add member' }));
    expect(await screen.findByText('Enter the e-mail of an account of your organisation.')).toBeTruthy();
    expect(sent(fetchMock, 'PUT')).toEqual([]);
    fireEvent.change(within(form).getByLabelText('E-mail of the person'), { target: { value: 'zed@tern.test' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add member' }));
    expect((await screen.findByRole('alert')).textContent).toContain('they need an account first');
  });

  it('changes a role from the select (PUT with the member e-mail)', async () => {
    const fetchMock = stubMembers({ put: () => jsonResponse(200, [lee, { ...sam, role: 'viewer' }]) });
    renderWithProviders(<MembersPanel assetId="a1" assetName="North Tern" />);
    fireEvent.change(await screen.findByRole('combobox', { name: 'Role of Sam Petro' }), { target: { value: 'viewer' } });
    await waitFor(() => expect(screen.getByRole('combobox', { name: 'Role of Sam Petro' })).toHaveProperty('value', 'viewer'));
    expect(sent(fetchMock, 'PUT')).toEqual([{ url: '/api/assets/a1/members', body: { email: 'sam@tern.test', role: 'viewer' } }]);
  });

  it('removes a member (DELETE), and shows why the last admin cannot be removed', async () => {
    const fetchMock = stubMembers({ del: () => jsonResponse(200, [lee]) });
    renderWithProviders(<MembersPanel assetId="a1" assetName="North Tern" />);
    fireEvent.click(await screen.findByRole('button', { name: 'Remove Sam Petro from North Tern' }));
    await waitFor(() => expect(screen.queryByRole('combobox', { name: 'Role of Sam Petro' })).toBeNull());
    expect(sent(fetchMock, 'DELETE').map((c) => c.url)).toEqual(['/api/assets/a1/members/u2']);

    fetchMock.mockImplementation(async (_url: string, init?: RequestInit) =>
      (init?.method ?? 'GET') === 'DELETE'
        ? jsonResponse(409, { statusCode: 409, message: 'This is the last admin of the asset; give another member the admin role first.' })
        : jsonResponse(200, [lee]),
    );
    fireEvent.click(screen.getByRole('button', { name: 'Remove Lee Admin from North Tern' }));
    expect((await screen.findByRole('alert')).textContent).toContain('last admin of the asset');
    expect(screen.getByRole('combobox', { name: 'Role of Lee Admin' })).toBeTruthy();
  });
});
