/**
 * What the interpretation adds to the albedo posterior:
 * the catalog match, the clouds-or-ice verdict, the particle albedo a thick cloud
 * would need, and the reading of a measured phase offset.
 */
import type { CatalogEntry, CondensateCurve } from '../catalog/index.ts';
import type { AlbedoPosterior } from '../inference/types.ts';

/** The catalog data the matching needs; the caller reads it from the database. */
export interface CatalogData {
  entries: readonly CatalogEntry[];
  /** Condensation curves of the catalog; species without one fall back to src/physics. */
  condensates?: readonly CondensateCurve[];
}

/** untested: the albedo is not excluded but the entry has no temperature limits, so it cannot be called consistent. */
export type CandidateStatus = 'consistent' | 'marginal' | 'untested' | 'excluded';

/** How an entry's band relates to the measured band. */
export interface BandOverlap {
  /** Shared wavelength range over the narrower band's width (1 when one contains the other). */
  fraction: number;
  /** none: no shared wavelengths; barely: fraction below BARELY_OVERLAPPING; good otherwise. */
  grade: 'none' | 'barely' | 'good';
}

/** The temperature test of one entry. */
export interface TemperatureCheck {
  /** window: the entry's temperature limits; condensation: its species' curve; none: no limits known. */
  kind: 'window' | 'condensation' | 'none';
  /** Feasible range [K]; null where open. For condensation: T_cond at 1e-3 and at 1 bar. */
  rangeK: [number | null, number | null];
  /** P(T_day in range), P(T_eq in range) under the posterior (null when kind is none); for condensation P(T <= T_cond at 1 bar). */
  probabilityDayside: number | null;
  probabilityEquilibrium: number | null;
  /** untested: no window and no curve (kind none). */
  grade: 'ok' | 'marginal' | 'excluded' | 'untested';
  /** Readable sentence when grade is not ok, or the feasibility note when it is. */
  text: string;
}

export interface Candidate {
  id: string;
  name: string;
  category: string;
  status: CandidateStatus;
  reasons: string[];
  /** The entry's value as a geometric-albedo interval in the measured band. */
  geometricAlbedoRange: [number, number];
  geometricAlbedoNominal: number;
  /** Posterior probability of A_g inside the interval (intervals narrower than 0.01 widened to 0.01). */
  probability: number;
  quantity: string;
  /** How the value was converted ("geometric as is", "Bond / q, q 1-1.5", ...). */
  conversion: string;
  bandOverlapFraction: number;
  /** The three tests behind the status. */
  checks: {
    albedo: CandidateStatus;
    temperature: { grade: TemperatureCheck['grade']; kind: TemperatureCheck['kind']; rangeK: TemperatureCheck['rangeK'] };
    band: BandOverlap['grade'];
    /** none-visible: a surface entry on a gas-rich planet. */
    surface: 'ok' | 'none-visible';
  };
  provenance: string;
  sources: string[];
}

/** The cloud-free ceiling the verdict compares with. */
export interface CloudFreeCeiling {
  geometricAlbedo: number;
  entryId: string;
  entryName: string;
  category: string;
  /** The cloud-free categories searched (clear-atmosphere; rock, lava). */
  categories: string[];
  /** Number of feasible cloud-free entries the maximum was taken over. */
  entriesConsidered: number;
  /** Always true: references without a temperature range are never used. */
  temperatureTested: boolean;
}

export interface PlanetClassReading {
  planetClass: 'giant' | 'rocky' | 'either';
  /** assumption: assumptions.planetClass; radius: from the planet's radius. */
  basis: 'assumption' | 'radius';
  radiusRearth: number | null;
  text: string;
}

/** The cloud-free reference the verdict used, with its regime (class, temperature window, band). */
export interface VerdictReference {
  id: string;
  name: string;
  regime: string;
  geometricAlbedoCeiling: number;
  sources: string[];
}

export interface Verdict {
  cloudsOrIceRequired: 'yes' | 'no' | 'inconclusive';
  /** P(A_g > ceiling) under the posterior (null when no ceiling exists). */
  probability: number | null;
  reason: string;
  ceiling: CloudFreeCeiling | null;
  reference: VerdictReference | null;
  planetClass: PlanetClassReading;
}

export interface ParticleReach {
  id: string;
  name: string;
  condensate: string | null;
  singleScatteringAlbedoMin: number;
  singleScatteringAlbedoMax: number;
  /** True when the entry's range meets the required 68 % range (not only exceeds its lower end). */
  withinRange: boolean;
  /** Status of this entry in the candidate list (temperature and albedo together). */
  status: CandidateStatus;
}

/** The single-scattering albedo a semi-infinite isotropic cloud needs for the measured A_g. */
export interface RequiredSingleScatteringAlbedo {
  lower68: number;
  median: number;
  upper68: number;
  /** True when the A_g upper 68 % bound exceeds A_g(w = 1): isotropic scatterers cannot reach it. */
  aboveConservativeLimit: boolean;
  /** A_g of conservative isotropic scatterers (w = 1), about 0.69. */
  conservativeGeometricAlbedo: number;
  /** Particle (Mie) single-scattering entries whose largest value reaches the lower 68 % bound, those inside the range first. */
  reachedBy: ParticleReach[];
  /** Particle entries that stay below it. */
  notReached: ParticleReach[];
  note: string;
}

export interface PhaseOffsetReading {
  valueDeg: number;
  /** Uncertainty toward zero [deg]; null when the offset was given without one. */
  sigmaDeg: number | null;
  /** |value| / sigma; null without an uncertainty. */
  significanceSigma: number | null;
  direction: 'east' | 'west' | 'none';
  significant: boolean;
  /** The measured band ends at or below 1100 nm (the westward cloud signature applies to optical bands). */
  opticalBand: boolean;
  interpretation: string;
}

export type Interpretation = AlbedoPosterior & {
  verdict: Verdict;
  candidates: Candidate[];
  requiredSingleScatteringAlbedo: RequiredSingleScatteringAlbedo;
  phaseOffset?: PhaseOffsetReading;
};
