/**
 * The model signals for one nuisance draw as functions of the Bond albedo on the grid
 * Everything that does not depend on the albedo is
 * computed once per draw here; the albedo-dependent part is a few multiplications
 * and two band-flux lookups per grid node.
 *
 * Eclipse depth     = A_g (k/aR)^2 Phi(90deg - i) + k^2 F(T_day) / F(T*)
 * Phase amplitude   = [A_g (k/aR)^2 + k^2 (F(T_day) - F(T_night)) / F(T*)] sin i
 *   (Lambert peak-to-trough is exactly A_g (k/aR)^2 sin i, derived: Phi(90 - i) - Phi(90 + i) = sin i;
 *    two-hemisphere thermal term (F_d - F_n) sin i, common practice)
 * Nightside flux    = A_g (k/aR)^2 Phi(90deg + i) + k^2 F(T_night) / F(T*)
 * T_day, T_night scale as (1 - A_B)^(1/4) at fixed eps (Cowan & Agol 2011, ApJ 729, 54).
 */
import type { Band } from '../physics/bandpass.ts';
import { bandFlux, getBandTable } from '../physics/bandpass.ts';
import { TABLE_MIN_K, denseFluxTable, type BandTable, type DenseFluxTable } from '../physics/band-table.ts';
import { darkeningCoefficients } from '../physics/darkening.ts';
import { GRAVITY_DARKENING_RANGE, beamingAmplitude, ellipsoidalAmplitude, rvSemiAmplitudeMs } from '../physics/mass-effects.ts';
import { lambertPhaseFunction } from '../physics/reflection.ts';
import { localEquilibriumFactorAt, localEquilibriumTable, type LocalEquilibriumTable } from '../physics/local-equilibrium.ts';
import { daysideTemperatureK, nightsideTemperatureK } from '../physics/temperature.ts';
import type { Nuisance } from './nuisance.ts';

export interface ModelSettings {
  band: Band;
  weighting: 'photon' | 'energy';
  thermal: boolean;
  /** A tabulated stellar spectrum's factors on the blackbody star's band flux and beaming factor (absent: blackbody star). */
  star?: { fluxFactor: number; beamingFactor: number };
  /** Dayside brightness map: uniform at T_day (default) or in local equilibrium (local-equilibrium.ts). */
  dayMap: 'uniform' | 'local-equilibrium';
}

/** The local-equilibrium factor table of the settings, or undefined for a uniform dayside. */
export function dayMapTable(m: ModelSettings): LocalEquilibriumTable | undefined {
  return m.thermal && m.dayMap === 'local-equilibrium' ? localEquilibriumTable(planetTable(m)) : undefined;
}

/** Multiplies a dayside flux row by the local-equilibrium factor C(T_day, eps) (the row's T_day at ln T = lnT0 + lnFactor[j]). */
export function applyDayMap(t: LocalEquilibriumTable, lnT0: number, lnFactor: Float64Array, redistribution: number, row: Float64Array): void {
  for (let j = 0; j < lnFactor.length; j++) {
    if (row[j]! > 0) row[j]! *= localEquilibriumFactorAt(t, lnT0 + lnFactor[j]!, redistribution);
  }
}

/** The band-flux table of the settings, fetched once for the hot loop. */
export function planetTable(m: ModelSettings): BandTable {
  return getBandTable(m.band, m.weighting);
}

/** The dense linear-flux table of the settings (built once per band and weighting). */
export function planetDenseTable(m: ModelSettings): DenseFluxTable {
  return denseFluxTable(planetTable(m));
}

export const LN_TABLE_MIN_K = Math.log(TABLE_MIN_K);

export interface DrawModel {
  /** (k/aR)^2 Phi(90 - i): reflected eclipse depth per unit A_g. */
  reflectedDepthPerAg: number;
  /** (k/aR)^2 sin i: reflected phase amplitude per unit A_g. */
  reflectedAmplitudePerAg: number;
  /** (k/aR)^2 Phi(90 + i): reflected flux at transit phase per unit A_g. */
  reflectedNightPerAg: number;
  sinI: number;
  /** T_day and T_night at A_B = 0. */
  dayZeroK: number;
  nightZeroK: number;
  /** k^2 / F_band(T*), to turn a band flux into a planet-to-star ratio. */
  thermalScale: number;
  /** ln T_day and ln T_night at A_B = 0 (-Infinity for 0 K). */
  lnDayZeroK: number;
  lnNightZeroK: number;
  /** Equilibrium temperature (full redistribution) at A_B = 0. */
  equilibriumZeroK: number;
}

export interface MassPrediction {
  rvSemiAmplitudeMs: number;
  beamingPpm: number;
  ellipsoidalPpm: number;
}

export function drawModel(n: Nuisance, m: ModelSettings): DrawModel {
  const geom = (n.radiusRatio / n.scaledSemiMajorAxis) ** 2;
  const halfPi = Math.PI / 2;
  const sinI = Math.sin(n.inclinationRad);
  const dayZeroK = daysideTemperatureK(n.teffK, n.scaledSemiMajorAxis, 0, n.redistribution);
  const nightZeroK = nightsideTemperatureK(n.teffK, n.scaledSemiMajorAxis, 0, n.redistribution);
  const thermalScale = m.thermal ? (n.radiusRatio * n.radiusRatio) / (bandFlux(m.band, n.teffK, m.weighting) * (m.star?.fluxFactor ?? 1)) : 0;
  return {
    lnDayZeroK: Math.log(dayZeroK),
    lnNightZeroK: Math.log(nightZeroK),
    reflectedDepthPerAg: geom * lambertPhaseFunction(Math.abs(halfPi - n.inclinationRad)),
    reflectedAmplitudePerAg: geom * sinI,
    reflectedNightPerAg: geom * lambertPhaseFunction(Math.min(Math.PI, halfPi + n.inclinationRad)),
    sinI,
    dayZeroK,
    nightZeroK,
    thermalScale,
    // eps = 1 limit of the dayside formula: T0 (1 - A_B)^(1/4) / sqrt(2) (Cowan & Agol 2011).
    equilibriumZeroK: daysideTemperatureK(n.teffK, n.scaledSemiMajorAxis, 0, 1),
  };
}

/**
 * The planet-to-star band-flux ratio for a whole grid row: out[j] at ln T = lnT0 + lnFactor[j] (0 below 10 K),
 * from the dense linear-flux table (band-table.ts), so the row needs no exp. This
 * loop runs samples x nodes times per interpretation.
 */
export function thermalRatioRow(dm: DrawModel, dense: DenseFluxTable, lnT0: number, lnFactor: Float64Array, out: Float64Array): void {
  const n = lnFactor.length;
  if (dm.thermalScale === 0 || lnT0 === -Infinity) {
    out.fill(0, 0, n);
    return;
  }
  const { flux, invStep } = dense;
  const base = dense.lnT0;
  const last = flux.length - 2;
  const scale = dm.thermalScale;
  for (let j = 0; j < n; j++) {
    const lnT = lnT0 + lnFactor[j]!;
    if (!(lnT >= LN_TABLE_MIN_K)) {
      out[j] = 0;
      continue;
    }
    const s = (lnT - base) * invStep;
    let i = s | 0;
    if (i > last) i = last;
    const f0 = flux[i]!;
    out[j] = scale * (f0 + (s - i) * (flux[i + 1]! - f0));
  }
}

/** The planet's band flux relative to the star at temperature tK (0 below the table). */
export function thermalRatio(dm: DrawModel, m: ModelSettings, tK: number): number {
  if (dm.thermalScale === 0 || tK < 10) return 0;
  return dm.thermalScale * bandFlux(m.band, tK, m.weighting);
}

/** `beamingFactor` multiplies the blackbody beaming factor (a tabulated stellar spectrum's correction; 1 for a blackbody). */
export function predictMassEffects(n: Nuisance, band: Band, beamingFactor = 1): MassPrediction | undefined {
  if (n.planetMassKg === undefined || n.starMassKg === undefined || n.periodS === undefined) return undefined;
  const k = rvSemiAmplitudeMs(n.periodS, n.planetMassKg, n.starMassKg, n.inclinationRad);
  let u = n.limbDarkeningU;
  let g = n.gravityDarkeningG;
  if (Number.isNaN(u) || Number.isNaN(g)) {
    const d = darkeningCoefficients(band, n.teffK);
    if (Number.isNaN(u)) u = d.u;
    if (Number.isNaN(g)) g = Math.min(GRAVITY_DARKENING_RANGE[1], d.g);
  }
  return {
    rvSemiAmplitudeMs: k,
    beamingPpm: beamingAmplitude(n.teffK, band, k) * beamingFactor * 1e6,
    ellipsoidalPpm: ellipsoidalAmplitude(n.planetMassKg, n.starMassKg, n.scaledSemiMajorAxis, n.inclinationRad, u, g) * 1e6,
  };
}
