import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import { NewUserForm } from './new-user-form';

function fill(values: { name: string; email: string; password: string }) {
  const form = screen.getByRole('form', { name: 'New user' });
  fireEvent.change(within(form).getByLabelText('Name'), { target: { value: values.name } });
  fireEvent.change(within(form).getByLabelText('E-mail'), { target: { value: values.email } });
  fireEvent.change(within(form).getByLabelText('Initial password'), { target: { value: values.password } });
  return form;
}

describe('NewUserForm', () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('names each field that is wrong and sends nothing', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<NewUserForm />);
    const form = fill({ name: ' ', email: 'kim', password: 'eleven-char' });
    fireEvent.click(within(form).getByRole('button', { name: 'Create account' }));
    expect(await screen.findByText('The initial password needs at least 12 characters.')).toBeTruthy();
    expect(screen.getByText('Give the person a name.')).toBeTruthy();
    expect(screen.getByText('Enter an e-mail address.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('POSTs the account (admin flag from the checkbox) and confirms it', async () => {
    const fetchMock = vi.fn(async () => jsonResponse(201, { id: 'u9', email: 'kim@tern.test', name: 'Kim', isAdmin: true, createdAt: '2026-03-01T09:00:00Z', memberships: [] }));
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<NewUserForm />);
    const form = fill({ name: ' Kim ', email: 'kim@tern.test', password: 'twelve-chars' });
    fireEvent.click(within(form).getByRole('checkbox', { name: /Organisation admin/ }));
    fireEvent.click(within(form).getByRole('button', { name: 'Create account' }));
    expect((await screen.findByRole('status')).textContent).toContain('Account for kim@tern.test created');
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect([url, init.method]).toEqual(['/api/users', 'POST']);
    expect(JSON.parse(String(init.body))).toEqual({ name: 'Kim', email: 'kim@tern.test', password: 'twelve-chars', isAdmin: true });
  });

  it("shows the server's refusal of a taken e-mail", async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(409, { statusCode: 409, message: 'email: an account with the e-mail kim@tern.test already exists.' })));
    renderWithProviders(<NewUserForm />);
    const form = fill({ name: 'Kim', email: 'kim@tern.test', password: 'twelve-chars' });
    fireEvent.click(within(form).getByRole('button', { name: 'Create account' }));
    expect((await screen.findByRole('alert')).textContent).toBe('email: an account with the e-mail kim@tern.test already exists.');
  });
});
