/**
 * QC mask bits written by evaluateWell, one byte per sample, so clamping is recorded per
 * sample and counted in the zone summaries (never hidden).
 */
/** The gamma-ray index was outside [0, 1] and clipped (Vsh set to 0 or 1). */
export const QC_VSH_CLIPPED = 1;
/** Total porosity was outside [0, phiMax] and clamped. */
export const QC_PHIT_CLAMPED = 2;
/** Effective porosity was outside [0, PHIT] and clamped. */
export const QC_PHIE_CLAMPED = 4;
/** Water saturation was outside [0, 1] and clamped. */
export const QC_SW_CLAMPED = 8;
/** The iterative Simandoux solve did not converge (SW left NaN). */
export const QC_SW_NO_ROOT = 16;
