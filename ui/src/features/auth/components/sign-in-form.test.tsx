import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { getToken } from '../../../lib/auth-token';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import type { Me } from '../../../types/api';
import { SignInForm } from './sign-in-form';

const user: Me = {
  id: 'u1',
  email: 'petro@example.test',
  name: 'Pat Petro',
  isAdmin: false,
  memberships: [{ assetId: 'a1', assetName: 'North Basin', role: 'petrophysicist' }],
};

function fillAndSubmit(email: string, password: string) {
  fireEvent.change(screen.getByLabelText('Email'), { target: { value: email } });
  fireEvent.change(screen.getByLabelText('Password'), { target: { value: password } });
  fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('SignInForm', () => {
  afterEach(() => vi.unstubAllGlobals());

  it("shows the server's own message when the credentials are refused, and stores no token", async () => {
    const fetchMock = vi.fn(async () => jsonResponse(401, { statusCode: 401, message: 'Email or password is not right.', error: 'Unauthorized' }));
    vi.stubGlobal('fetch', fetchMock);
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);

    fillAndSubmit('petro@example.test', 'wrong');

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toBe('Email or password is not right.');
    expect(onSignedIn).not.toHaveBeenCalled();
    expect(getToken()).toBeNull();
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/auth/login');
    expect(init.method).toBe('POST');
    expect(JSON.parse(String(init.body))).toEqual({ email: 'petro@example.test', password: 'wrong' });
  });

  it('checks the fields before asking the server', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />);

    fillAndSubmit('not-an-email', '');

    expect(await screen.findByText('Enter the email address you were invited with.')).toBeTruthy();
    expect(screen.getByText('Enter your password.')).toBeTruthy();
    expect(screen.getByLabelText('Email').getAttribute('aria-invalid')).toBe('true');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('stores the token and hands over the user on success', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(201, { token: 'jwt-abc', user })));
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);

    fillAndSubmit('petro@example.test', 'right');

    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(user));
    expect(getToken()).toBe('jwt-abc');
  });
});
