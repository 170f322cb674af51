import { describe, expect, it } from 'vitest';
import { toFormValues, toZoneParameters, zoneParamsSchema, type ZoneParametersJson } from './zone-params-form';

// A complete sandstone parameter set (values typed here, as a user would).
const params: ZoneParametersJson = {
  vshMethod: 'linear',
  grClean: null,
  grShale: null,
  grCleanPercentile: 5,
  grShalePercentile: 95,
  porosityMethod: 'density',
  rhoMatrix: 2.65,
  rhoFluid: 1,
  dtMatrix: 55.5,
  dtFluid: 189,
  sonicCompaction: 1,
  phiShale: 0,
  phiMax: 0.5,
  temperatureUnit: 'F',
  temperature: { kind: 'gradient', surfaceTemperature: 60, gradientPer100: 1.5 },
  rw: { kind: 'at_temperature', rw: 0.05, temperature: 75 },
  swModel: 'archie',
  a: 1,
  m: 2,
  n: 2,
  rsh: null,
  permeability: null,
};

function messages(values: ReturnType<typeof toFormValues>): Record<string, string> {
  const r = zoneParamsSchema.safeParse(values);
  if (r.success) return {};
  return Object.fromEntries(r.error.issues.map((i) => [String(i.path[0]), i.message]));
}

describe('zone parameters form', () => {
  it('round-trips stored parameters through the form values unchanged', () => {
    const v = toFormValues(params);
    expect(zoneParamsSchema.safeParse(v).success).toBe(true);
    expect(toZoneParameters(v, params)).toEqual(params);
  });

  it('names the field in each message: matrix equal to fluid density, Rw not positive, empty a', () => {
    const v = { ...toFormValues(params), rhoFluid: '2.65', rw: '0', a: '' };
    const m = messages(v);
    expect(m.rhoMatrix).toBe('Matrix density must differ from fluid density (both 2.65 g/cm3)');
    expect(m.rw).toBe('Rw must be greater than 0');
    expect(m.a).toBe('Tortuosity a is required');
  });

  it('checks fixed GR picks in order and asks Rsh only of shaly-sand models', () => {
    const v = { ...toFormValues(params), grPick: 'fixed' as const, grClean: '90', grShale: '40', swModel: 'simandoux' as const, rsh: '' };
    const m = messages(v);
    expect(m.grShale).toBe('GR shale must be greater than GR clean (90 gAPI)');
    expect(m.rsh).toBe('Rsh is required');
    expect(messages({ ...v, grShale: '140', rsh: '2.5' })).toEqual({});
  });

  it('refuses a temperature at or below the Arps pole of its unit', () => {
    const v = { ...toFormValues(params), temperatureUnit: 'C' as const, rwTemperature: '-30' };
    expect(messages(v).rwTemperature).toBe('Rw temperature must be above -21.5 °C');
  });

  it('builds the chosen branches: Pickett Rw source, bottom-hole temperature, a permeability transform', () => {
    const v = {
      ...toFormValues(params),
      rwKind: 'pickett' as const,
      pickettTop: '5100',
      pickettBase: '5150',
      pickettFitM: true,
      temperatureKind: 'bht' as const,
      surfaceTemperature: '70',
      bht: '190',
      bhtDepth: '9000',
      permMethod: 'timur' as const,
      swIrr: '',
    };
    expect(messages(v)).toEqual({});
    const p = toZoneParameters(v, params);
    expect(p.rw).toEqual({ kind: 'pickett', top: 5100, base: 5150, fitM: true });
    expect(p.temperature).toEqual({ kind: 'bht', surfaceTemperature: 70, bht: 190, bhtDepth: 9000 });
    expect(p.permeability).toEqual({ method: 'timur', swIrr: null });
  });
});
