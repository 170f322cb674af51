/**
 * Rock, fluid and field constants of the Wrenmoor model. The same values go into the forward
 * log synthesis and into the zone parameters the evaluation uses, so the evaluation can
 * recover the model.
 */

/** Matrix bulk density, g/cm3: sandstone 2.65, limestone 2.71. // from memory: Asquith & Krygowski (2004) ch. 4, matrix density table. */
export const RHO_MATRIX = { sandstone: 2.65, limestone: 2.71 } as const;
/** Bulk density of wet shale, g/cm3 (model choice; typical shales read 2.2-2.6, common practice). */
export const RHO_SHALE = 2.45;
/**
 * Fluid density seen by the density tool, g/cm3: fresh mud filtrate 1.0 (common practice).
 * Model simplification: the invaded zone the density and neutron tools read is fully flushed
 * (Sxo = 1), so residual hydrocarbons do not move them.
 */
export const RHO_FLUID = 1.0;

/** Matrix transit time, us/ft: sandstone 55.5, limestone 47.6; fluid 189. // from memory: Asquith & Krygowski (2004) ch. 4. */
export const DT_MATRIX = { sandstone: 55.5, limestone: 47.6 } as const;
export const DT_FLUID = 189;
/** Shale transit time, us/ft (model choice). */
export const DT_SHALE = 105;

/**
 * Neutron porosity on a limestone-calibrated scale, v/v: apparent matrix porosity of quartz
 * sandstone -0.03 and of limestone 0 // from memory: the sandstone offset of limestone-scaled
 * thermal neutron charts at low porosity; wet shale 0.36 (model choice); filtrate hydrogen index 1.
 */
export const NPHI_MATRIX = { sandstone: -0.03, limestone: 0 } as const;
export const NPHI_SHALE = 0.36;

/** Gamma ray of clean rock and of shale, gAPI (model choice, field-wide). */
export const GR_CLEAN = 22;
export const GR_SHALE = 128;

/** Formation water resistivity at the reference temperature, ohm.m at 75 F (model choice, field-wide brine). */
export const RW_REFERENCE = { rw: 0.08, temperatureF: 75 } as const;
/** Mud filtrate resistivity, ohm.m at 75 F (model choice). */
export const RMF_REFERENCE = { rmf: 0.9, temperatureF: 75 } as const;

/** Mean annual ground temperature, F, and geothermal gradient, F per 100 ft (model choice). */
export const SURFACE_TEMPERATURE_F = 68;
export const GEOTHERMAL_GRADIENT_F_PER_100FT = 1.4;

/** Bit size, inches. */
export const BIT_SIZE_IN = 8.5;

/**
 * Hydrostatic water pressure gradient, psi/ft (0.45 psi/ft for a moderately saline brine,
 * common practice), and the elevation of the regional water table, ft above sea level
 * (model choice): p(TVDSS) = 14.696 + 0.45 (TVDSS + 300).
 */
export const WATER_GRADIENT_PSI_PER_FT = 0.45;
export const WATER_TABLE_ELEVATION_FT = 300;
/** Oil and gas pressure gradients in the reservoir, psi/ft (model choice). */
export const OIL_GRADIENT_PSI_PER_FT = 0.33;
export const GAS_GRADIENT_PSI_PER_FT = 0.08;

/** Oil formation volume factor, rb/STB, and solution gas-oil ratio, scf/STB (model choice). */
export const OIL_BO = 1.28;
export const OIL_RS_SCF_PER_STB = 480;

/** Depth sampling of the LAS files: 0.5 ft (and 0.1 m for the metric well). */
export const STEP_FT = 0.5;
export const STEP_M = 0.1;

/** Feet per metre: 1 ft = 0.3048 m exactly (Thompson & Taylor 2008, NIST SP 811). */
export const M_PER_FT = 0.3048;

/** The fixed seed of the demo field's noise. */
export const FIELD_SEED = 20240611;

export const FIELD_NAME = 'Wrenmoor Field';
export const OPERATOR_NAME = 'Sablefin Energy (demo operator)';
/** Invented logging contractor written in the LAS headers. */
export const SERVICE_COMPANY = 'Tern Wireline Services (demo)';
