/**
 * Finding and naming LAS sections. A section starts at a line whose first non-blank
 * character is '~'; its kind comes from the title (LAS 1.2/2.0: the first letter, V W C P O A;
 * LAS 3.0: the names Log_Parameter, Log_Definition, Log_Data, with the 2.0 names still
 * accepted). LAS 3.0 groups other than Log (Core_, Drilling_, Tops_, ...) are kept as text.
 */

export type SectionKind = 'version' | 'well' | 'curves' | 'parameters' | 'other' | 'data' | 'extra';

/**
 * Kind of a section from its title (the text after '~').
 * @example sectionKind('Log_Definition') // 'curves'
 * @example sectionKind('a  DEPTH GR')     // 'data'
 */
export function sectionKind(title: string): SectionKind {
  const name = title.split('|')[0].trim().toUpperCase();
  const first = name.split(/\s+/)[0] ?? '';
  if (first.includes('_')) {
    if (!first.startsWith('LOG_')) return 'extra';
    const rest = first.slice(4);
    if (rest.startsWith('PARAMETER')) return 'parameters';
    if (rest.startsWith('DEFINITION')) return 'curves';
    if (rest.startsWith('DATA')) return 'data';
    return 'extra';
  }
  switch (first.charAt(0)) {
    case 'V':
      return 'version';
    case 'W':
      return 'well';
    case 'C':
      return 'curves';
    case 'P':
      return 'parameters';
    case 'O':
      return 'other';
    case 'A':
      return 'data';
    default:
      return 'extra';
  }
}

/** Offset just past the line ending at `e` (CRLF, CR or LF), or `e` at the end of input. */
export function afterLineEnd(bytes: Uint8Array, e: number): number {
  if (e >= bytes.length) return e;
  return bytes[e] === 13 && bytes[e + 1] === 10 ? e + 2 : e + 1;
}

/** Offset of the end of the line starting at or containing `i` (the CR or LF, or length). */
export function lineEnd(bytes: Uint8Array, i: number): number {
  const n = bytes.length;
  let e = i;
  while (e < n) {
    const c = bytes[e];
    if (c === 10 || c === 13) break;
    e++;
  }
  return e;
}

export interface NextSection {
  /** Offset of the '~' line (or input length when none). */
  at: number;
  /** Its 1-based line number. */
  line: number;
}

/** Scans lines from `pos` (a line start, numbered `line`) for the next line starting with '~'. */
export function findNextSection(bytes: Uint8Array, pos: number, line: number): NextSection {
  const n = bytes.length;
  let i = pos;
  let ln = line;
  while (i < n) {
    let j = i;
    while (j < n && (bytes[j] === 32 || bytes[j] === 9)) j++;
    if (j < n && bytes[j] === 126) return { at: i, line: ln };
    i = afterLineEnd(bytes, lineEnd(bytes, j));
    ln++;
  }
  return { at: n, line: ln };
}
