/**
 * Porosity-tool responses of a rock of effective porosity phi and shale volume Vsh: each tool
 * reads the volume-weighted sum of matrix, shale and pore-fluid responses (the linear
 * volumetric model; Asquith & Krygowski 2004, ch. 4). The pore fluid is mud filtrate (the
 * model's invaded zone is fully flushed, see constants.ts).
 */

/**
 * Bulk density, g/cm3: RHOB = phi rhoFluid + Vsh rhoShale + (1 - phi - Vsh) rhoMatrix.
 * Its inverse for Vsh = 0 is the density-porosity equation phi = (rhoma - RHOB)/(rhoma - rhof)
 * (Asquith & Krygowski 2004, ch. 4); with shale, density porosity reads
 * phi + Vsh (rhoma - rhosh)/(rhoma - rhof), which the effective-porosity correction removes.
 * @example bulkDensity(0.2, 0.1, 2.65, 2.45, 1.0) // 0.2 + 0.245 + 0.7 * 2.65 = 2.3
 */
export function bulkDensity(phi: number, vsh: number, rhoMatrix: number, rhoShale: number, rhoFluid: number): number {
  return phi * rhoFluid + vsh * rhoShale + (1 - phi - vsh) * rhoMatrix;
}

/**
 * Neutron porosity (v/v, on the matrix scale of `nphiMatrix`):
 * NPHI = phi HI + Vsh NPHIshale + (1 - phi - Vsh) NPHImatrix, HI = hydrogen index of the pore
 * fluid (1 for filtrate). Common practice (linear volumetric response).
 * @example neutronPorosity(0.2, 0.1, -0.03, 0.36, 1) // 0.2 + 0.036 - 0.021 = 0.215
 */
export function neutronPorosity(phi: number, vsh: number, nphiMatrix: number, nphiShale: number, hydrogenIndex = 1): number {
  return phi * hydrogenIndex + vsh * nphiShale + (1 - phi - vsh) * nphiMatrix;
}

/**
 * Sonic transit time, us/ft, by the Wyllie time average extended with a shale term:
 * DT = phi DTfluid + Vsh DTshale + (1 - phi - Vsh) DTmatrix (Wyllie, Gregory & Gardner 1956,
 * Geophysics 21(1); shale term common practice).
 * @example sonicTransitTime(0.2, 0, 55.5, 105, 189) // 0.2 * 189 + 0.8 * 55.5 = 82.2
 */
export function sonicTransitTime(phi: number, vsh: number, dtMatrix: number, dtShale: number, dtFluid: number): number {
  return phi * dtFluid + vsh * dtShale + (1 - phi - vsh) * dtMatrix;
}
