import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';
import { serverFieldErrors } from './server-field-errors';

const labels = { currentPassword: 'Current password', newPassword: 'New password' };

function refusal(status: number, message: string | string[]): ApiError {
  return new ApiError(status, Array.isArray(message) ? message.join('; ') : message, { statusCode: status, message });
}

describe('serverFieldErrors', () => {
  it('puts a message whose subject is a field under that field, with its label', () => {
    expect(serverFieldErrors(refusal(400, 'currentPassword is not your current password.'), labels)).toEqual({
      fields: { currentPassword: 'Current password is not your current password.' },
      other: [],
    });
  });

  it('sorts a validation list by field and joins two messages for one field', () => {
    const error = refusal(400, ['newPassword must be at least 12 characters', 'currentPassword must not be empty', 'newPassword must be a string']);
    expect(serverFieldErrors(error, labels).fields).toEqual({
      newPassword: 'New password must be at least 12 characters; New password must be a string',
      currentPassword: 'Current password must not be empty',
    });
  });

  it('drops a "field: " prefix and capitalises the rest', () => {
    const error = refusal(409, 'name: an asset named "North Tern" already exists in your organisation.');
    expect(serverFieldErrors(error, { name: 'Asset name' }).fields).toEqual({ name: 'An asset named "North Tern" already exists in your organisation.' });
  });

  it('keeps messages that name no field of the form, and plain errors, as other', () => {
    expect(serverFieldErrors(refusal(404, 'No such user in your organisation.'), labels)).toEqual({ fields: {}, other: ['No such user in your organisation.'] });
    expect(serverFieldErrors(refusal(409, 'isAdmin: this is the last admin.'), labels).other).toEqual(['isAdmin: this is the last admin.']);
    expect(serverFieldErrors(new ApiError(0, 'The server could not be reached (network error).', null), labels).other).toEqual(['The server could not be reached (network error).']);
  });

  it('does not take an inherited property name for a field', () => {
    expect(serverFieldErrors(refusal(400, 'constructor is odd'), labels).other).toEqual(['constructor is odd']);
  });
});
