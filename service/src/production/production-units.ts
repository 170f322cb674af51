/**
 * Units accepted for production data, and their conversion to the field units the cross-checks
 * use (scf, psia, days). Factors from NIST SP 811 (Thompson & Taylor 2008) where noted.
 */

export const CUM_GAS_UNITS = ['scf', 'Mscf', 'MMscf', 'Bcf', 'm3'] as const;
export type CumGasUnit = (typeof CUM_GAS_UNITS)[number];
export const PRESSURE_UNITS = ['psia', 'kPa', 'bar'] as const;
export type PressureUnit = (typeof PRESSURE_UNITS)[number];
export const TIME_UNITS = ['day', 'month', 'year'] as const;
export type TimeUnit = (typeof TIME_UNITS)[number];
export const RATE_UNITS = ['STB/d', 'Mscf/d', 'MMscf/d', 'm3/d'] as const;
export type RateUnit = (typeof RATE_UNITS)[number];

const FT3_PER_M3 = 1 / 0.028316846592; // 0.3048^3 m3 per ft3, exact (NIST SP 811)
const PSI_PER_KPA = 1 / 6.894757293168; // 1 psi = 6.894757 kPa (NIST SP 811)

/** Standard cubic feet per unit of cumulative gas (m3 stays at the same standard conditions). */
export const SCF_PER: Record<CumGasUnit, number> = { scf: 1, Mscf: 1e3, MMscf: 1e6, Bcf: 1e9, m3: FT3_PER_M3 };

/** psia per unit of absolute pressure (1 bar = 100 kPa). */
export const PSIA_PER: Record<PressureUnit, number> = { psia: 1, kPa: PSI_PER_KPA, bar: 100 * PSI_PER_KPA };

/** Days per time unit: a year of 365.25 days and a month of 365.25/12 days. // common practice */
export const DAYS_PER: Record<TimeUnit, number> = { day: 1, month: 365.25 / 12, year: 365.25 };

/** The volume unit of a rate unit's cumulative (rate x days). */
export const VOLUME_OF_RATE: Record<RateUnit, string> = { 'STB/d': 'STB', 'Mscf/d': 'Mscf', 'MMscf/d': 'MMscf', 'm3/d': 'm3' };

/** Units stored with a series. */
export type PressureSeriesUnits = { cumGas: CumGasUnit; pressure: PressureUnit };
export type RateSeriesUnits = { time: TimeUnit; rate: RateUnit };
