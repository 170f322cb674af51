const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** True for a canonical UUID string (anything else cannot be a row id and is a 404, not a database error). */
export function isUuid(value: unknown): value is string {
  return typeof value === 'string' && UUID.test(value);
}
