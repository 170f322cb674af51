import { ApiError } from './api-client';

/** A service refusal split into messages for the form's fields and the rest. */
export interface ServerFieldErrors<F extends string> {
  /** One message per named field, the field's key replaced by its label. */
  fields: Partial<Record<F, string>>;
  /** Messages that name none of the form's fields (a 404, a network error, ...). */
  other: string[];
}

/**
 * Sorts the service's messages by the field they name. The service starts each message with
 * the body field it is about, either as the subject ("newPassword must be at least 12
 * characters", "currentPassword is not your current password.") or as a prefix ("name: an
 * asset named "X" already exists ..."); validation failures come as a list of such messages.
 * The subject form gets the field's label in place of its key ("New password must be ..."), the
 * prefix form loses the prefix. Several messages for one field are joined with "; ".
 */
export function serverFieldErrors<F extends string>(error: unknown, labels: Record<F, string>): ServerFieldErrors<F> {
  const result: ServerFieldErrors<F> = { fields: {}, other: [] };
  for (const message of messagesOf(error)) {
    const match = /^(\w+)(: | )([\s\S]*)$/.exec(message);
    const key = match?.[1];
    if (!match || key === undefined || !Object.hasOwn(labels, key)) {
      result.other.push(message);
      continue;
    }
    const field = key as F;
    const text = match[2] === ': ' ? capitalise(match[3]) : `${labels[field]} ${match[3]}`;
    result.fields[field] = result.fields[field] ? `${result.fields[field]}; ${text}` : text;
  }
  return result;
}

function messagesOf(error: unknown): string[] {
  if (error instanceof ApiError && error.body && typeof error.body === 'object' && 'message' in error.body) {
    const message = (error.body as { message: unknown }).message;
    if (Array.isArray(message)) return message.filter((m): m is string => typeof m === 'string' && m !== '');
    if (typeof message === 'string' && message) return [message];
  }
  return error instanceof Error ? [error.message] : [String(error)];
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
