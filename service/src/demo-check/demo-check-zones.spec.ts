import { demoTops, fluidZones, zoneParametersFor } from '@poreline/demo-wells';
import { describe, expect, it } from 'vitest';
import { demoCheckZones } from './demo-check-zones.js';

describe('demoCheckZones', () => {
  const tops = demoTops();

  it('demoCheckZones(WM-1) gives the 7 formation zones from the tops (the deepest to the log base) and the model fluid zones', () => {
    const own = tops.filter((t) => t.well === 'WM-1').sort((a, b) => a.topMd - b.topMd);
    const z = demoCheckZones('WM-1', tops, 'ft', { first: 0, last: 9000 }, zoneParametersFor('WM-1'), { 'Wren Sand': 'f-wren' });
    expect(z.formationZones.map((k) => [k.name, k.top, k.base])).toEqual(own.map((t, i) => [t.formation, t.topMd, i + 1 < own.length ? own[i + 1].topMd : 9000]));
    expect(z.fluidZones.map((k) => [k.name, k.formation])).toEqual(fluidZones('WM-1').map((k) => [k.name, k.formation]));
    expect(z.formationZones.find((k) => k.name === 'Wren Sand')!.formationId).toBe('f-wren');
    expect(z.formationZones.find((k) => k.name === 'Wren Sand')!.params).toEqual(zoneParametersFor('WM-1')['Wren Sand']);
    expect(z.notes).toEqual([]);
  });

  it('demoCheckZones clips to the logged interval and says which zones are left out', () => {
    const own = tops.filter((t) => t.well === 'WM-4').sort((a, b) => a.topMd - b.topMd);
    const marrow = own.find((t) => t.formation === 'Marrow Shale')!.topMd;
    const z = demoCheckZones('WM-4', tops, 'ft', { first: marrow + 10, last: 9000 }, zoneParametersFor('WM-4'), {});
    expect(z.formationZones[0]).toMatchObject({ name: 'Marrow Shale', top: marrow + 10 });
    expect(z.formationZones.map((k) => k.name)).not.toContain('Fenna Sand');
    expect(z.notes.some((n) => n.includes("'Fenna Sand'") && n.includes('outside the logged interval'))).toBe(true);
  });

  it('demoCheckZones converts the model depths to the well unit (0.3048 m per ft)', () => {
    const own = tops.filter((t) => t.well === 'WM-5').sort((a, b) => a.topMd - b.topMd);
    expect(own[0].depthUnit).toBe('m');
    const z = demoCheckZones('WM-5', tops, 'ft', { first: 0, last: 30000 }, zoneParametersFor('WM-5'), {});
    expect(z.formationZones[0].top).toBeCloseTo(own[0].topMd / 0.3048, 9);
  });

  it('demoCheckZones throws for a well the model does not know', () => {
    expect(() => demoCheckZones('XX-1', tops, 'ft', { first: 0, last: 1 }, {}, {})).toThrow(RangeError);
  });
});
