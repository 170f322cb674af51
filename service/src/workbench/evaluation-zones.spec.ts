import { describe, expect, it } from 'vitest';
import { evaluationZones } from './evaluation-zones.js';

const zone = (name: string, top: number, base: number | null) => ({ formationId: name, name, colour: '#000000', top, base, params: {}, isDefault: true });

describe('evaluationZones', () => {
  it('clips zones to the merged index, leaves out those outside it or without a base, and says why', () => {
    const r = evaluationZones([zone('A', 900, 1000), zone('B', 1000, 1300), zone('C', 1300, 1400), zone('D', 1400, null)], { first: 950, last: 1200 });
    expect(r.zones.map((z) => [z.name, z.formation, z.top, z.base])).toEqual([
      ['A', 'A', 950, 1000],
      ['B', 'B', 1000, 1200],
    ]);
    expect(r.notes).toEqual([
      "Zone 'A' is evaluated over 950 - 1000, the part of 900 - 1000 inside the logged interval.",
      "Zone 'B' is evaluated over 1000 - 1200, the part of 1000 - 1300 inside the logged interval.",
      "Zone 'C' (1300 - 1400) is not evaluated: it lies outside the logged interval 950 - 1200.",
      "Zone 'D' is not evaluated: nothing is logged below its top (1400).",
    ]);
  });

  it('without merged data no zone is evaluated', () => {
    expect(evaluationZones([zone('A', 1, 2)], null)).toEqual({ zones: [], notes: ["Zone 'A' is not evaluated: the well has no merged log data."] });
  });
});
