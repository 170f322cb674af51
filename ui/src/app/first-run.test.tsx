import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { getToken, setToken } from '../lib/auth-token';
import { createQueryClient } from '../lib/query-client';
import { jsonResponse } from '../test/render';
import type { AssetMember, UserAccount } from '../types/admin';
import type { Asset, Me } from '../types/api';
import { sendUnauthorizedToSignIn } from './app';
import { AppProviders } from './providers';
import { appRoutes } from './router';

interface Call {
  key: string;
  body: unknown;
}

/**
 * A fake service for a new installation (DEMO_MODE=false): no users until POST /api/setup,
 * then assets, accounts and members kept in memory and answered like the real API.
 */
function stubNewInstallation(options: { signedInAs?: Me } = {}) {
  const calls: Call[] = [];
  let admin: Me | null = options.signedInAs ?? null;
  const assets: Asset[] = [];
  const users: UserAccount[] = [];
  const members = new Map<string, AssetMember[]>();
  const fetchMock = vi.fn(async (url: string, init?: RequestInit) => {
    const method = init?.method ?? 'GET';
    const key = `${method} ${url}`;
    const body = init?.body ? JSON.parse(String(init.body)) : undefined;
    calls.push({ key, body });
    if (key === 'GET /api/setup') return jsonResponse(200, { needsFirstAdmin: admin === null });
    if (key === 'POST /api/setup') {
      admin = { id: 'u-admin', email: body.email.toLowerCase(), name: body.name, isAdmin: true, memberships: [] };
      users.push({ ...admin, createdAt: '2026-03-01T08:00:00Z' });
      return jsonResponse(201, { token: 'jwt-admin', user: admin });
    }
    if (!admin) return jsonResponse(401, { statusCode: 401, message: 'Sign in first.' });
    if (key === 'GET /api/auth/me') return jsonResponse(200, admin);
    if (key === 'GET /api/users') return jsonResponse(200, admin.isAdmin ? users : { statusCode: 403, message: 'Forbidden' });
    if (key === 'GET /api/assets') return jsonResponse(200, assets);
    if (key === 'POST /api/assets') {
      const asset: Asset = { id: `a${assets.length + 1}`, name: body.name, description: body.description ?? '', role: 'admin', isDemo: false };
      assets.push(asset);
      members.set(asset.id, [{ userId: admin.id, name: admin.name, email: admin.email, role: 'admin', isAdmin: true }]);
      return jsonResponse(201, asset);
    }
    if (key === 'POST /api/users') {
      if (users.some((u) => u.email === body.email.toLowerCase())) return jsonResponse(409, { statusCode: 409, message: `email: an account with the e-mail ${body.email} already exists.` });
      const user: UserAccount = { id: `u${users.length + 1}`, email: body.email.toLowerCase(), name: body.name, isAdmin: !!body.isAdmin, createdAt: '2026-03-01T09:00:00Z', memberships: [] };
      users.push(user);
      return jsonResponse(201, user);
    }
    const membersPath = /^\/api\/assets\/(a\d+)\/members$/.exec(url);
    if (membersPath && method === 'GET') return jsonResponse(200, members.get(membersPath[1]) ?? []);
    if (membersPath && method === 'PUT') {
      const user = users.find((u) => u.email === body.email.toLowerCase());
      if (!user) return jsonResponse(404, { statusCode: 404, message: `No user with the e-mail ${body.email} in this organisation; they need an account first.` });
      const list = (members.get(membersPath[1]) ?? []).filter((m) => m.userId !== user.id);
      list.push({ userId: user.id, name: user.name, email: user.email, role: body.role, isAdmin: user.isAdmin });
      members.set(membersPath[1], list);
      const asset = assets.find((a) => a.id === membersPath[1])!;
      user.memberships = [{ assetId: asset.id, assetName: asset.name, role: body.role }];
      return jsonResponse(200, list);
    }
    return jsonResponse(404, { statusCode: 404, message: `No route ${key}` });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { calls };
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

function type(label: string | RegExp, value: string, within_: HTMLElement = document.body) {
  fireEvent.change(within(within_).getByLabelText(label), { target: { value } });
}

describe('first run and the team area', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('a new installation sends the visitor from sign-in to /setup; the first admin lands in Team and assets, signed in', async () => {
    const { calls } = stubNewInstallation();
    const router = renderAt('/');
    expect(await screen.findByRole('heading', { name: 'Set up Poreline' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/setup');

    type('Organisation', 'Tern Energy');
    type('Your name', 'Lee Admin');
    type('E-mail', 'Lee@Tern.test');
    type('Password', 'first-admin-password');
    type('Repeat password', 'first-admin-password');
    fireEvent.click(screen.getByRole('button', { name: 'Create admin and sign in' }));

    expect(await screen.findByRole('heading', { name: 'Team and assets', level: 1 })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/admin');
    expect(getToken()).toBe('jwt-admin');
    expect(calls.find((c) => c.key === 'POST /api/setup')?.body).toEqual({ organisation: 'Tern Energy', name: 'Lee Admin', email: 'Lee@Tern.test', password: 'first-admin-password' });
    const shell = screen.getByRole('banner');
    expect(within(shell).getByRole('link', { name: 'Team and assets' })).toBeTruthy();
    expect(screen.getByText('No assets yet: create the first one below, then add people to it.')).toBeTruthy();
  });

  it('the setup form checks the password length and the repeat before sending anything', async () => {
    const { calls } = stubNewInstallation();
    renderAt('/setup');
    await screen.findByRole('heading', { name: 'Set up Poreline' });
    type('Organisation', 'Tern Energy');
    type('Your name', 'Lee Admin');
    type('E-mail', 'lee@tern.test');
    type('Password', 'too-short');
    type('Repeat password', 'different');
    fireEvent.click(screen.getByRole('button', { name: 'Create admin and sign in' }));
    expect(await screen.findByText('Use at least 12 characters.')).toBeTruthy();
    expect(screen.getByText('The two passwords differ.')).toBeTruthy();
    expect(calls.some((c) => c.key === 'POST /api/setup')).toBe(false);
  });

  it('/setup once an admin exists goes to the sign-in page', async () => {
    stubNewInstallation({ signedInAs: { id: 'u-admin', email: 'lee@tern.test', name: 'Lee Admin', isAdmin: true, memberships: [] } });
    const router = renderAt('/setup');
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/sign-in');
  });

  it('the admin creates an asset and an account, then adds the account to the asset as petrophysicist', async () => {
    setToken('jwt-admin');
    const lee: Me = { id: 'u-admin', email: 'lee@tern.test', name: 'Lee Admin', isAdmin: true, memberships: [] };
    const { calls } = stubNewInstallation({ signedInAs: lee });
    renderAt('/admin');
    await screen.findByRole('heading', { name: 'Team and assets', level: 1 });

    const assetForm = screen.getByRole('form', { name: 'New asset' });
    type('Asset name', 'North Tern Field', assetForm);
    fireEvent.click(within(assetForm).getByRole('button', { name: 'Create asset' }));
    const panel = await screen.findByRole('region', { name: 'Members of North Tern Field' });
    expect((await within(panel).findByRole('table', { name: 'Members of North Tern Field' })).textContent).toContain('lee@tern.test');

    const userForm = screen.getByRole('form', { name: 'New user' });
    type('Name', 'Sam Petro', userForm);
    type('E-mail', 'sam@tern.test', userForm);
    type('Initial password', 'sams-initial-password', userForm);
    fireEvent.click(within(userForm).getByRole('button', { name: 'Create account' }));
    const people = await screen.findByRole('table', { name: 'People' });
    await waitFor(() => expect(within(people).getByText('sam@tern.test')).toBeTruthy());

    const addForm = within(panel).getByRole('form', { name: 'Add a member to North Tern Field' });
    type('E-mail of the person', 'sam@tern.test', addForm);
    fireEvent.change(within(addForm).getByLabelText('Role'), { target: { value: 'petrophysicist' } });
    fireEvent.click(within(addForm).getByRole('button', { name: 'Add member' }));
    expect(await within(panel).findByRole('combobox', { name: 'Role of Sam Petro' })).toHaveProperty('value', 'petrophysicist');
    expect(calls.filter((c) => c.key === 'PUT /api/assets/a1/members').map((c) => c.body)).toEqual([{ email: 'sam@tern.test', role: 'petrophysicist' }]);
    // The people table is refreshed through the same query: Sam now holds a role in the asset.
    await waitFor(() => expect(within(screen.getByRole('list', { name: 'Assets of Sam Petro' })).getByText(/North Tern Field/)).toBeTruthy());
  });

  it('a user who is not an organisation admin has no Team and assets link, and the page says who manages it', async () => {
    setToken('jwt-petro');
    const petro: Me = { id: 'u2', email: 'sam@tern.test', name: 'Sam Petro', isAdmin: false, memberships: [{ assetId: 'a1', assetName: 'North Tern Field', role: 'petrophysicist' }] };
    stubNewInstallation({ signedInAs: petro });
    renderAt('/admin');
    expect(await screen.findByText("Team and assets are managed by the organisation's admins.")).toBeTruthy();
    expect(within(screen.getByRole('banner')).queryByRole('link', { name: 'Team and assets' })).toBeNull();
  });
});
