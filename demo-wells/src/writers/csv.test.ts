import { describe, it, expect } from 'vitest';
import { toCsv } from './csv.js';

describe('toCsv', () => {
  it('toCsv quotes fields with commas or quotes (RFC 4180) and ends lines with LF', () => {
    expect(toCsv(['a', 'b'], [[1, 'x,y'], ['say "hi"', 2]])).toBe('a,b\n1,"x,y"\n"say ""hi""",2\n');
  });
  it('toCsv refuses a ragged row', () => {
    expect(() => toCsv(['a', 'b'], [[1]])).toThrow('toCsv: row 1 has 1 fields, the header 2');
  });
});
