/**
 * Unit conversion constants for reserves volumes, with their sources.
 *
 * Source: Thompson, A., Taylor, B.N. (2008) Guide for the Use of the International System of
 * Units (SI), NIST Special Publication 811, Appendix B (conversion factors). The foot is the
 * international foot, 0.3048 m exactly; the acre and acre-foot here are built on it
 * (43,560 ft2 per acre). The petroleum barrel is 42 US gallons of 231 in3 = 9,702 in3.
 * The SP 811 digits are quoted from memory and re-derived from the exact definitions in the
 * tests (units-constants.test.ts).
 */

/** Cubic feet in one acre-foot: 43,560 ft2 per acre x 1 ft (NIST SP 811; exact by definition). */
export const FT3_PER_ACRE_FT = 43_560;

/**
 * Cubic feet in one barrel (42 US gal = 9,702 in3 = 5.6145833... ft3), rounded to 5.614583 as
 * printed in the reservoir-engineering literature (Craft & Hawkins 1991). Used for the
 * field-unit constant 7758.37 bbl per acre-ft.
 */
export const FT3_PER_BBL = 5.614583;

/** Metres in one foot (international foot, exact; NIST SP 811). */
export const M_PER_FT = 0.3048;

/** Cubic metres in one barrel (42 US gal; exact: 42 x 231 x 0.0254^3; NIST SP 811 1.589873 E-01). */
export const M3_PER_BBL = 0.158987294928;

/** Square metres in one acre (43,560 international ft2, exact: 43,560 x 0.3048^2; NIST SP 811). */
export const M2_PER_ACRE = 4046.8564224;

/** Cubic metres in one cubic foot (0.3048^3 = 0.028316846592; NIST SP 811 2.831685 E-02). */
export const M3_PER_FT3 = 0.028316846592;

/** Square metres in one square kilometre (SI prefix, exact). */
export const M2_PER_KM2 = 1_000_000;

/**
 * Reservoir barrels in one acre-foot: 43,560 / 5.614583 = 7758.37 (the "7758" of the OOIP
 * formula, Craft & Hawkins 1991, eq. for volumetric oil in place).
 */
export const BBL_PER_ACRE_FT = FT3_PER_ACRE_FT / FT3_PER_BBL;

/** Offset from degrees Fahrenheit to degrees Rankine (T[R] = T[F] + 459.67; NIST SP 811). */
export const RANKINE_OFFSET = 459.67;

/** Days in one year for decline rates (Julian year, 365.25 d). // common practice */
export const DAYS_PER_YEAR = 365.25;
