/**
 * Hot loops of evaluateWell (internal). Each stage is a small function specialised to one
 * method, looping over an index range with the shared per-sample kernels, so every loop
 * stays monomorphic and its kernel calls inline. evaluateWell runs the stages chunk by chunk
 * (a few thousand samples) so the arrays a chunk touches stay in cache between stages.
 * Clamps set bits in the QC mask (qc.ts).
 */
import { densityPorosity, neutronDensityGasPorosity, neutronDensityPorosity } from '../petro/porosity.js';
import { coatesPermeability, timurPermeability } from '../petro/permeability.js';
import { archieSaturation, indonesiaSaturation, simandouxSaturation } from '../petro/saturation.js';
import { clavier, larionovOlder, larionovTertiary, steiber } from '../petro/shale-volume.js';
import { sonicPorosityRhg, sonicPorosityWyllie } from '../petro/sonic-porosity.js';
import { payFlag, reservoirFlag } from './cutoffs.js';
import { QC_PHIE_CLAMPED, QC_PHIT_CLAMPED, QC_SW_CLAMPED, QC_SW_NO_ROOT, QC_VSH_CLIPPED } from './qc.js';

type F64 = Float64Array;

// ---- Shale volume: GR index clipped to [0, 1], then the method. -------------------------

/** Writes the clipped GR index into VSH (NaN GR -> NaN) and flags clipping. */
function grIndexLoop(gr: F64, s: number, e: number, grClean: number, invGr: number, VSH: F64, qc: Uint8Array): void {
  for (let i = s; i < e; i++) {
    const x = (gr[i] - grClean) * invGr;
    if (x < 0) { VSH[i] = 0; qc[i] |= QC_VSH_CLIPPED; } else if (x > 1) { VSH[i] = 1; qc[i] |= QC_VSH_CLIPPED; } else VSH[i] = x;
  }
}
function larionovTertiaryLoop(s: number, e: number, VSH: F64): void {
  for (let i = s; i < e; i++) VSH[i] = clip01(larionovTertiary(VSH[i]));
}
function larionovOlderLoop(s: number, e: number, VSH: F64): void {
  for (let i = s; i < e; i++) VSH[i] = clip01(larionovOlder(VSH[i]));
}
function steiberLoop(s: number, e: number, VSH: F64): void {
  for (let i = s; i < e; i++) VSH[i] = clip01(steiber(VSH[i]));
}
function clavierLoop(s: number, e: number, VSH: F64): void {
  for (let i = s; i < e; i++) VSH[i] = clip01(clavier(VSH[i]));
}
function clip01(v: number): number {
  return v < 0 ? 0 : v > 1 ? 1 : v;
}

export function vshStage(code: number, gr: F64, s: number, e: number, grClean: number, invGr: number, VSH: F64, qc: Uint8Array): void {
  grIndexLoop(gr, s, e, grClean, invGr, VSH, qc);
  if (code === 1) larionovTertiaryLoop(s, e, VSH);
  else if (code === 2) larionovOlderLoop(s, e, VSH);
  else if (code === 3) steiberLoop(s, e, VSH);
  else if (code === 4) clavierLoop(s, e, VSH);
}

// ---- Total porosity, clamped to [0, phiMax]. ---------------------------------------------

function clampPhit(i: number, phi: number, phiMax: number, PHIT: F64, qc: Uint8Array): void {
  if (phi < 0) { PHIT[i] = 0; qc[i] |= QC_PHIT_CLAMPED; } else if (phi > phiMax) { PHIT[i] = phiMax; qc[i] |= QC_PHIT_CLAMPED; } else PHIT[i] = phi;
}
function densityLoop(rhob: F64, s: number, e: number, rhoMa: number, rhoF: number, phiMax: number, PHIT: F64, qc: Uint8Array): void {
  for (let i = s; i < e; i++) clampPhit(i, densityPorosity(rhob[i], rhoMa, rhoF), phiMax, PHIT, qc);
}
function neutronDensityLoop(nphi: F64, rhob: F64, s: number, e: number, rhoMa: number, rhoF: number, phiMax: number, PHIT: F64, qc: Uint8Array): void {
  for (let i = s; i < e; i++) clampPhit(i, neutronDensityPorosity(nphi[i], densityPorosity(rhob[i], rhoMa, rhoF)), phiMax, PHIT, qc);
}
function neutronDensityGasLoop(nphi: F64, rhob: F64, s: number, e: number, rhoMa: number, rhoF: number, phiMax: number, PHIT: F64, qc: Uint8Array): void {
  for (let i = s; i < e; i++) clampPhit(i, neutronDensityGasPorosity(nphi[i], densityPorosity(rhob[i], rhoMa, rhoF)), phiMax, PHIT, qc);
}
function wyllieLoop(dt: F64, s: number, e: number, dtMa: number, dtF: number, cp: number, phiMax: number, PHIT: F64, qc: Uint8Array): void {
  for (let i = s; i < e; i++) clampPhit(i, sonicPorosityWyllie(dt[i], dtMa, dtF, cp), phiMax, PHIT, qc);
}
function rhgLoop(dt: F64, s: number, e: number, dtMa: number, dtF: number, phiMax: number, PHIT: F64, qc: Uint8Array): void {
  for (let i = s; i < e; i++) clampPhit(i, sonicPorosityRhg(dt[i], dtMa, dtF), phiMax, PHIT, qc);
}

export interface PorosityInputs {
  code: number;
  rhob: F64;
  nphi: F64;
  dt: F64;
  rhoMatrix: number;
  rhoFluid: number;
  dtMatrix: number;
  dtFluid: number;
  cp: number;
  phiMax: number;
  phiShale: number;
}

export function porosityStage(p: PorosityInputs, s: number, e: number, VSH: F64, PHIT: F64, PHIE: F64, qc: Uint8Array): void {
  switch (p.code) {
    case 0: densityLoop(p.rhob, s, e, p.rhoMatrix, p.rhoFluid, p.phiMax, PHIT, qc); break;
    case 1: neutronDensityLoop(p.nphi, p.rhob, s, e, p.rhoMatrix, p.rhoFluid, p.phiMax, PHIT, qc); break;
    case 2: neutronDensityGasLoop(p.nphi, p.rhob, s, e, p.rhoMatrix, p.rhoFluid, p.phiMax, PHIT, qc); break;
    case 3: wyllieLoop(p.dt, s, e, p.dtMatrix, p.dtFluid, p.cp, p.phiMax, PHIT, qc); break;
    default: rhgLoop(p.dt, s, e, p.dtMatrix, p.dtFluid, p.phiMax, PHIT, qc);
  }
  if (p.phiShale === 0) PHIE.set(PHIT.subarray(s, e), s);
  else effectiveLoop(s, e, p.phiShale, VSH, PHIT, PHIE, qc);
}

/** PHIE = PHIT - VSH * phiShale, clamped to [0, PHIT]. */
function effectiveLoop(s: number, e: number, phiShale: number, VSH: F64, PHIT: F64, PHIE: F64, qc: Uint8Array): void {
  for (let i = s; i < e; i++) {
    const t = PHIT[i];
    const v = t - VSH[i] * phiShale;
    if (v < 0) { PHIE[i] = 0; qc[i] |= QC_PHIE_CLAMPED; } else if (v > t) { PHIE[i] = t; qc[i] |= QC_PHIE_CLAMPED; } else PHIE[i] = v;
  }
}

// ---- Water saturation, Rw by Arps at each sample's temperature, clamped to [0, 1]. -------

/** Rw at sample i = rwNum / (tk + slope * tvd[i]) with rwNum = Rw_ref (T_ref + k), tk = t0 + k. */
export interface SaturationInputs {
  code: number;
  rt: F64;
  tvd: F64;
  rwNum: number;
  tk: number;
  slope: number;
  a: number;
  m: number;
  n: number;
  rsh: number;
}

function clampSw(i: number, sw: number, SW: F64, qc: Uint8Array): void {
  if (sw < 0) { SW[i] = 0; qc[i] |= QC_SW_CLAMPED; } else if (sw > 1) { SW[i] = 1; qc[i] |= QC_SW_CLAMPED; } else SW[i] = sw;
}
function archieLoop(q: SaturationInputs, s: number, e: number, PHIE: F64, SW: F64, qc: Uint8Array): void {
  const { rt, tvd, rwNum, tk, slope, a, m, n } = q;
  for (let i = s; i < e; i++) clampSw(i, archieSaturation(PHIE[i], rt[i], rwNum / (tk + slope * tvd[i]), a, m, n), SW, qc);
}
function simandouxLoop(q: SaturationInputs, s: number, e: number, VSH: F64, PHIE: F64, SW: F64, qc: Uint8Array): number {
  const { rt, tvd, rwNum, tk, slope, a, m, n, rsh } = q;
  let noRoot = 0;
  for (let i = s; i < e; i++) {
    const sw = simandouxSaturation(PHIE[i], rt[i], VSH[i], rwNum / (tk + slope * tvd[i]), rsh, a, m, n);
    clampSw(i, sw, SW, qc);
    if (sw !== sw && PHIE[i] === PHIE[i] && rt[i] === rt[i] && VSH[i] === VSH[i]) { qc[i] |= QC_SW_NO_ROOT; noRoot++; }
  }
  return noRoot;
}
function indonesiaLoop(q: SaturationInputs, s: number, e: number, VSH: F64, PHIE: F64, SW: F64, qc: Uint8Array): void {
  const { rt, tvd, rwNum, tk, slope, a, m, n, rsh } = q;
  for (let i = s; i < e; i++) clampSw(i, indonesiaSaturation(PHIE[i], rt[i], VSH[i], rwNum / (tk + slope * tvd[i]), rsh, a, m, n), SW, qc);
}

/** Returns the count of samples where the iterative Simandoux found no root. */
export function saturationStage(q: SaturationInputs, s: number, e: number, VSH: F64, PHIE: F64, SW: F64, qc: Uint8Array): number {
  if (q.code === 0) archieLoop(q, s, e, PHIE, SW, qc);
  else if (q.code === 1) return simandouxLoop(q, s, e, VSH, PHIE, SW, qc);
  else indonesiaLoop(q, s, e, VSH, PHIE, SW, qc);
  return 0;
}

// ---- BVW, permeability and the net flags. ------------------------------------------------

export interface FlagInputs {
  vshMax: number;
  phiMin: number;
  swMax: number;
  /** -Infinity when no permeability cutoff. */
  permMin: number;
  /** 0 none, 1 Timur, 2 Coates. */
  permCode: number;
  /** NaN: use each sample's SW. */
  swIrr: number;
}

function flagsLoop(f: FlagInputs, s: number, e: number, VSH: F64, PHIE: F64, SW: F64, BVW: F64, NET_RES: F64, NET_PAY: F64): void {
  const { vshMax, phiMin, swMax } = f;
  for (let i = s; i < e; i++) {
    const phi = PHIE[i], sw = SW[i];
    BVW[i] = phi * sw;
    const res = reservoirFlag(VSH[i], phi, NaN, vshMax, phiMin, -Infinity);
    NET_RES[i] = res;
    NET_PAY[i] = payFlag(res, sw, swMax);
  }
}
function flagsPermLoop(f: FlagInputs, s: number, e: number, VSH: F64, PHIE: F64, SW: F64, BVW: F64, PERM: F64, NET_RES: F64, NET_PAY: F64): void {
  const { vshMax, phiMin, swMax, permMin, permCode, swIrr } = f;
  const fixed = swIrr === swIrr;
  for (let i = s; i < e; i++) {
    const phi = PHIE[i], sw = SW[i];
    BVW[i] = phi * sw;
    const si = fixed ? swIrr : sw;
    const k = permCode === 1 ? timurPermeability(phi, si) : permCode === 2 ? coatesPermeability(phi, si) : NaN;
    PERM[i] = k;
    const res = reservoirFlag(VSH[i], phi, k, vshMax, phiMin, permMin);
    NET_RES[i] = res;
    NET_PAY[i] = payFlag(res, sw, swMax);
  }
}

export function flagStage(f: FlagInputs, s: number, e: number, VSH: F64, PHIE: F64, SW: F64, BVW: F64, PERM: F64 | null, NET_RES: F64, NET_PAY: F64): void {
  if (PERM === null) flagsLoop(f, s, e, VSH, PHIE, SW, BVW, NET_RES, NET_PAY);
  else flagsPermLoop(f, s, e, VSH, PHIE, SW, BVW, PERM, NET_RES, NET_PAY);
}
