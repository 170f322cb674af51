import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { getToken, setToken } from '../../../lib/auth-token';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import { ChangePasswordForm } from './change-password-form';

function fill(values: { current: string; next: string; again: string }) {
  const form = screen.getByRole('form', { name: 'Change password' });
  fireEvent.change(within(form).getByLabelText('Current password'), { target: { value: values.current } });
  fireEvent.change(within(form).getByLabelText('New password'), { target: { value: values.next } });
  fireEvent.change(within(form).getByLabelText('New password again'), { target: { value: values.again } });
  fireEvent.click(within(form).getByRole('button', { name: 'Change password' }));
  return form;
}

/** The message shown for a field: the element its input names as its description. */
function messageOf(label: string): string {
  const input = screen.getByLabelText(label);
  expect(input.getAttribute('aria-invalid')).toBe('true');
  const described = input.getAttribute('aria-describedby');
  return (described && document.getElementById(described)?.textContent) || '';
}

describe('ChangePasswordForm', () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('names each wrong field and sends nothing: empty current, short new, second copy differing', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<ChangePasswordForm />);
    fill({ current: '', next: 'eleven-char', again: 'eleven-chaR' });
    await screen.findByText('Enter your current password.');
    expect(messageOf('Current password')).toBe('Enter your current password.');
    expect(messageOf('New password')).toBe('The new password needs at least 12 characters.');
    expect(messageOf('New password again')).toBe('The two new passwords differ; type the same one twice.');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('refuses a new password equal to the current one before sending', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<ChangePasswordForm />);
    fill({ current: 'same-password-1', next: 'same-password-1', again: 'same-password-1' });
    await waitFor(() => expect(messageOf('New password')).toBe('The new password must differ from the current one.'));
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('PATCHes current and new password, keeps the new token for this session, confirms, and empties the fields', async () => {
    const fetchMock = vi.fn(async () => jsonResponse(200, { token: 'token-after-change' }));
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<ChangePasswordForm />);
    fill({ current: 'old-password-1', next: 'a-new-password-2', again: 'a-new-password-2' });
    expect((await screen.findByRole('status')).textContent).toBe('Password changed. Other sessions with the old password are signed out; this one stays signed in.');
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect([url, init.method, JSON.parse(String(init.body))]).toEqual(['/api/users/me/password', 'PATCH', { currentPassword: 'old-password-1', newPassword: 'a-new-password-2' }]);
    expect(screen.getByLabelText('Current password')).toHaveProperty('value', '');
    expect(screen.getByLabelText('New password')).toHaveProperty('value', '');
    expect(getToken()).toBe('token-after-change');
  });

  it("shows the service's refusal of a wrong current password under that field", async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(400, { statusCode: 400, message: 'currentPassword is not your current password.', error: 'Bad Request' })));
    renderWithProviders(<ChangePasswordForm />);
    fill({ current: 'not-it-at-all', next: 'a-new-password-2', again: 'a-new-password-2' });
    await waitFor(() => expect(messageOf('Current password')).toBe('Current password is not your current password.'));
    expect(screen.getByLabelText('New password').getAttribute('aria-invalid')).toBeNull();
    expect(screen.queryByRole('alert')).toBeNull();
    expect(screen.queryByRole('status')).toBeNull();
  });

  it("shows the service's validation list under the new password, and other refusals in an alert", async () => {
    const fetchMock = vi.fn(async () => jsonResponse(400, { statusCode: 400, message: ['newPassword must be at least 12 characters'], error: 'Bad Request' }));
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<ChangePasswordForm />);
    fill({ current: 'old-password-1', next: 'a-new-password-2', again: 'a-new-password-2' });
    await waitFor(() => expect(messageOf('New password')).toBe('New password must be at least 12 characters'));

    fetchMock.mockImplementation(async () => jsonResponse(404, { statusCode: 404, message: 'No such user in your organisation.' }));
    fireEvent.click(screen.getByRole('button', { name: 'Change password' }));
    expect((await screen.findByRole('alert')).textContent).toBe('No such user in your organisation.');
  });
});
