// Expected splits follow the LAS 2.0 line rules (from memory: mnemonic to the first period,
// unit to the first space after it, description after the last colon); each case is worked
// by hand from the line.
import { describe, expect, it } from 'vitest';
import { parseHeaderLine } from './header-line.js';

describe('parseHeaderLine', () => {
  it.each([
    ['STRT.M        1670.0000 : START DEPTH', 'STRT', 'M', '1670.0000', 'START DEPTH'],
    ['NULL.   -999.25 : NULL VALUE', 'NULL', '', '-999.25', 'NULL VALUE'],
    ['RHOB.G/CC    : BULK DENSITY', 'RHOB', 'G/CC', '', 'BULK DENSITY'],
    ['RDEP.OHM.M   : deep', 'RDEP', 'OHM.M', '', 'deep'],
    ['DATE.   2019-03-12 10:30:00 : Log date', 'DATE', '', '2019-03-12 10:30:00', 'Log date'],
    ['TIME.HH:MM   14:45 : on bottom', 'TIME', 'HH:MM', '14:45', 'on bottom'],
    ['DEPT .M   : depth', 'DEPT', 'M', '', 'depth'],
    ['WELL.   A B C : ', 'WELL', '', 'A B C', ''],
    ['DEPT.M:depth', 'DEPT', 'M', '', 'depth'],
  ])('parseHeaderLine(%j) splits into mnemonic, unit, value, description', (line, m, u, v, d) => {
    expect(parseHeaderLine(line, false)).toEqual({ mnemonic: m, unit: u, value: v, description: d });
  });

  it('parseHeaderLine without a period reads MNEM VALUE : DESC and flags the problem', () => {
    expect(parseHeaderLine('STRT 1670.5 : start', false)).toMatchObject({ mnemonic: 'STRT', unit: '', value: '1670.5', description: 'start', problem: "no '.' after the mnemonic" });
  });

  it('parseHeaderLine without a colon keeps the value and flags the problem', () => {
    expect(parseHeaderLine('STRT.M 1670.5', false)).toMatchObject({ mnemonic: 'STRT', unit: 'M', value: '1670.5', description: '', problem: "no ':' before the description" });
  });

  it('parseHeaderLine(las3) separates {format} and | association, ignoring colons inside braces', () => {
    expect(parseHeaderLine('TIME.   09:15:00 : Time on bottom {hh:mm:ss} | Run[1]', true)).toEqual({
      mnemonic: 'TIME',
      unit: '',
      value: '09:15:00',
      description: 'Time on bottom',
      format: 'hh:mm:ss',
      association: 'Run[1]',
    });
  });
});
