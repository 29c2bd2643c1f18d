/**
 * The physics layer's public surface: pure functions, SI inside, units in names.
 * Other layers may import from here or from the individual files.
 */

/** Constants (CODATA 2018, IAU 2015 Resolution B3) and unit conversion at the edge. */
export * from './constants.ts';
export { convertValue, isKnownUnit, parseQuantity, toKelvin } from './units.ts';

/** Numerical helpers: Gauss-Legendre and adaptive quadrature, bisection. */
export { gaussLegendreRule, integrateAdaptive, integrateGaussLegendre, type AdaptiveOptions, type QuadratureRule } from './integrate.ts';
export { bisect, type BisectOptions } from './solve.ts';

/** Blackbody radiation. */
export {
  WEIGHTINGS, blackbodyExitanceWPerM2, planckLambda, planckLogTemperatureSlope, planckPeakWavelengthM,
  planckPhotonLambda, requireWeighting, type Weighting,
} from './planck.ts';

/** Bands: built-in and user response curves, band fluxes from the cached table or by direct integration. */
export {
  bandFlux, bandFluxDirect, bandFluxRatio, builtinBandIds, describeBand, getBandTable, listBuiltinBands,
  logBandFlux, resolveBand, type Band, type BandDescription, type BandSpec,
} from './bandpass.ts';
export { BUILTIN_BAND_DEFS, type BandShape, type BuiltinBandDef, type Provenance } from './bands-builtin.ts';
export { bandMoments, type BandMoments } from './band-integral.ts';
export { TABLE_MAX_K, TABLE_MIN_K, TABLE_POINTS, buildBandTable, type BandTable } from './band-table.ts';
export { RESPONSE_MAX_NM, RESPONSE_MIN_NM, parseResponseCsv, validateResponsePairs, type ResponseCurve } from './response-curve.ts';

/** Argument guards shared by the physics functions. */
export {
  requireBondAlbedo, requireInclination, requireRadiusRatio, requireRedistribution, requireScaledSemiMajorAxis,
  requireTemperatureK,
} from './guards.ts';

/** Reflected light: Lambert phase function, phase angle, flux ratio, phase integral. */
export {
  bondAlbedoFromGeometric, geometricAlbedoFromFluxRatio, lambertPhaseFunction, lambertPhaseIntegral, maxGeometricAlbedo,
  minimumPhaseAngleRad, phaseAngleRad, phaseIntegral, reflectedFluxRatio, reflectedFluxRatioAtPhase, reflectedPhaseAmplitude,
} from './reflection.ts';

/** Temperatures (Cowan & Agol 2011) and stellar energy balance. */
export {
  daysideTemperatureK, equilibriumTemperatureFromIrradianceK, equilibriumTemperatureK, irradianceWPerM2,
  irradiationTemperatureK, nightsideTemperatureK, stellarLuminosityW,
} from './temperature.ts';

/** Thermal emission in a band (two-hemisphere approximation). */
export {
  BRIGHTNESS_TEMPERATURE_RANGE_K, brightnessTemperatureK, nightsideFluxRatio, thermalEclipseDepth,
  thermalFluxRatioAtPhase, thermalPhaseAmplitude,
} from './thermal.ts';

/** Orbits: Kepler's third law and a/R*. */
export { periodFromSemiMajorAxisS, scaledSemiMajorAxis, semiMajorAxisFromPeriodM } from './orbit.ts';

/** Mass effects: RV semi-amplitude, Doppler beaming, ellipsoidal variation. */
export {
  GRAVITY_DARKENING_RANGE, LIMB_DARKENING_RANGE, beamingAmplitude, beamingFactor, beamingFactorAtWavelength,
  ellipsoidalAmplitude, ellipsoidalCoefficient, rvSemiAmplitudeMs,
} from './mass-effects.ts';

/** Cloud condensation curves and saturation vapour pressures. */
export {
  CONDENSATION_CURVES, SATURATION_CURVES, condensationSpecies, condensationTemperature, condensationTemperatureK,
  type CondensationCurve, type CondensationOptions, type CondensationResult, type SaturationCurve,
} from './condensation.ts';
export { FIT_METALLICITY_RANGE_DEX, FIT_PRESSURE_RANGE_BAR } from './condensation-curves.ts';
