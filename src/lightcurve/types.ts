/**
 * Shared shapes of the light-curve route. Flux is normalised to the stellar flux
 * (a detrended curve near 1); orbital phase phi is in cycles, 0 at mid-transit and
 * 0.5 at mid-eclipse (circular orbit).
 */

/** A value with its one-sigma uncertainty, in the unit named by the field. */
export interface ValueSigma {
  value: number;
  sigma: number;
}

/** A light curve as read: either a time series (days) or an already folded curve. */
export interface LightCurve {
  /** What `x` holds: times in days (BJD or any consistent system) or phases in cycles. */
  column: 'time' | 'phase';
  x: Float64Array;
  flux: Float64Array;
  fluxErr: Float64Array;
  /**
   * Which input file each point came from (an index into `files`), when the curve was
   * read from several; absent means one file. Each file gets its own baseline segments.
   */
  fileIndex?: Int32Array;
  /** Labels of the input files (e.g. their names), in the order of `fileIndex`. */
  files?: string[];
}

/** A folded curve: phase in [0, 1). */
export interface FoldedCurve {
  phase: Float64Array;
  flux: Float64Array;
  fluxErr: Float64Array;
}

/**
 * Geometry for the transit mask and the eclipse shape.
 * - `disks`: two uniform disks on a circular orbit (k = Rp/R*, a/R*, inclination).
 * - `window`: only a total duration (first to fourth contact) is known; the eclipse is
 *   a box of that width and the transit mask a window of that width. The inclination is
 *   optional and used only by the Lambert phase term (edge-on when absent).
 */
export type EclipseGeometry =
  | { kind: 'disks'; radiusRatio: number; scaledSemiMajorAxis: number; inclinationDeg: number }
  | { kind: 'window'; durationHours: number; inclinationDeg?: number };

/** The planet's phase term: a first-harmonic cosine or the Lambert-sphere phase function. */
export type PhaseModel = 'cosine' | 'lambert';

/**
 * Names of the columns of the linear model. The baseline columns come first: with one
 * segment `constant` and `trend1`, `trend2`, ...; with several `segment2.constant`,
 * `segment2.trend1`, ... (segments numbered from 1). Then the signal columns.
 */
export type BaselineColumn = 'constant' | `trend${number}` | `segment${number}.constant` | `segment${number}.trend${number}`;
export type SignalColumn = 'phaseTerm' | 'sine' | 'ellipsoidal' | 'eclipse';
export type ColumnName = BaselineColumn | SignalColumn;

/**
 * What the sin(2 pi phi) coefficient was taken to be. It is one function shared by the
 * star's Doppler beaming and the planet's first-harmonic sine (phase offset), so the
 * data alone cannot split it:
 * - `beaming`: no offset fitted; the whole sine term is beaming (planet peak at eclipse).
 * - `offset-beaming-fixed`: offset fitted; beaming fixed at a given prediction and
 *   subtracted from the sine term.
 * - `offset-no-beaming`: offset fitted with the beaming term absent (taken as zero);
 *   any real beaming is absorbed into the offset.
 */
export type SineAttribution = 'beaming' | 'offset-beaming-fixed' | 'offset-no-beaming';
