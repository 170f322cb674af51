/**
 * CSV text (RFC 4180: comma-separated, a header line, fields quoted when they hold a comma,
 * quote or line break; LF line endings) for the tops, survey, well list and production files.
 */

function field(v: string | number): string {
  const s = typeof v === 'number' ? String(v) : v;
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/**
 * CSV text from a header and rows (numbers are written as given: format them first).
 * Throws RangeError('toCsv: row 3 has 4 fields, the header 5') on a ragged row.
 * @example toCsv(['a', 'b'], [[1, 'x,y']]) // 'a,b\n1,"x,y"\n'
 */
export function toCsv(header: readonly string[], rows: readonly (readonly (string | number)[])[]): string {
  rows.forEach((r, i) => {
    if (r.length !== header.length) throw new RangeError(`toCsv: row ${i + 1} has ${r.length} fields, the header ${header.length}`);
  });
  return [header, ...rows].map((r) => r.map(field).join(',')).join('\n') + '\n';
}
