/**
 * One LAS header line, `MNEM.UNIT  VALUE : DESCRIPTION`, split by the CWLS rules
 * (LAS 2.0, section "line format"; from memory: the mnemonic ends at the first period, the
 * unit runs from that period to the first space, the description starts after the last
 * colon, the value is what lies between).
 */

export interface ParsedHeaderLine {
  mnemonic: string;
  unit: string;
  value: string;
  description: string;
  format?: string;
  association?: string;
  /** Set when the line breaks the rules and a best reading was taken. */
  problem?: string;
}

/** Index of the last ':' that is not inside a `{...}` group (LAS 3.0 formats such as {hh:mm}). */
function lastDelimiterColon(text: string, from: number): number {
  let depth = 0;
  for (let i = text.length - 1; i >= from; i--) {
    const ch = text.charCodeAt(i);
    if (ch === 125 /* } */) depth++;
    else if (ch === 123 /* { */ && depth > 0) depth--;
    else if (ch === 58 /* : */ && depth === 0) return i;
  }
  // Unbalanced braces (a stray '}' in a description): fall back to the plain last colon.
  const plain = text.lastIndexOf(':');
  return plain >= from ? plain : -1;
}

function isBlank(ch: number): boolean {
  return ch === 32 || ch === 9;
}

/**
 * Splits one header line. `las3` additionally separates a trailing `{format}` and
 * `| association` from the description (LAS 3.0).
 *
 * @example parseHeaderLine('TIME.HH:MM  12:30 : LOG TIME', false)
 *   // { mnemonic: 'TIME', unit: 'HH:MM', value: '12:30', description: 'LOG TIME' }
 */
export function parseHeaderLine(text: string, las3: boolean): ParsedHeaderLine {
  const dot = text.indexOf('.');
  const firstColon = lastDelimiterColon(text, 0);
  let result: ParsedHeaderLine;
  const beforeDot = dot < 0 ? '' : text.slice(0, dot).trim();
  if (dot < 0 || (firstColon >= 0 && dot > firstColon) || /\s/.test(beforeDot)) {
    // No period before the value: read "MNEM VALUE : DESC" and say so.
    const colon = firstColon;
    const head = (colon >= 0 ? text.slice(0, colon) : text).trim();
    const sp = head.search(/\s/);
    result = {
      mnemonic: sp < 0 ? head : head.slice(0, sp),
      unit: '',
      value: sp < 0 ? '' : head.slice(sp).trim(),
      description: colon >= 0 ? text.slice(colon + 1).trim() : '',
      problem: "no '.' after the mnemonic",
    };
  } else {
    const mnemonic = beforeDot;
    let u = dot + 1;
    while (u < text.length && !isBlank(text.charCodeAt(u))) u++;
    let unit = text.slice(dot + 1, u);
    let rest = u;
    let colon = lastDelimiterColon(text, rest);
    if (colon < 0) {
      // "DEPT.M:depth" - no space after the unit: the unit stops at its colon.
      const inUnit = unit.indexOf(':');
      if (inUnit >= 0) {
        unit = unit.slice(0, inUnit);
        rest = dot + 1 + inUnit;
        colon = rest;
      }
    }
    result = {
      mnemonic,
      unit,
      value: (colon >= 0 ? text.slice(rest, colon) : text.slice(rest)).trim(),
      description: colon >= 0 ? text.slice(colon + 1).trim() : '',
    };
    if (colon < 0) result.problem = "no ':' before the description";
  }
  if (las3) splitLas3Description(result);
  return result;
}

function splitLas3Description(item: ParsedHeaderLine): void {
  let d = item.description;
  const bar = d.indexOf('|');
  if (bar >= 0) {
    item.association = d.slice(bar + 1).trim();
    d = d.slice(0, bar).trim();
  }
  const m = /\{([^{}]*)\}\s*$/.exec(d);
  if (m) {
    item.format = m[1].trim();
    d = d.slice(0, m.index).trim();
  }
  item.description = d;
}
