/**
 * The linear model of a folded, transit-masked light curve (flux normalised to the
 * star, phi = 0 at transit):
 *
 *   F(phi) = c0 + Ap L(phi) + S sin(2 pi phi) + E [-cos(4 pi phi)] + D [-h(phi)]
 *
 * columns, in this order:
 *   constant     1                      c0: star plus the planet's mean flux
 *   phaseTerm    L(phi)                 Ap: planet's phase term, peak-to-trough (phase-term.ts)
 *   sine         sin(2 pi phi)          S: Doppler beaming semi-amplitude and/or the planet's
 *                                          first-harmonic sine (the two are the same function)
 *   ellipsoidal  -cos(4 pi phi)         E: ellipsoidal semi-amplitude (minima at conjunctions)
 *   eclipse      -h(phi)                D: eclipse depth; h is the hidden fraction of the
 *                                          planet (two-disk overlap or a box)
 *
 * Signs (the usual ones; from memory): beaming
 * brightens the star at phi = 0.25, when the star approaches us (derived: after transit
 * the planet recedes, so the star comes towards us); ellipsoidal light is faintest at
 * the conjunctions, when we see the tidal bulge end-on. D is the planet flux at full phase; during the eclipse the model keeps
 * the phase term running and removes D h(phi), so the planet's small change over the
 * eclipse is neglected (it is second order in the eclipse half-width).
 * The eclipse column is left out when the geometry gives no eclipse.
 *
 * With baseline segments (segments.ts) the single constant is replaced by each
 * segment's constant and Legendre trend terms, placed first; a point's row is zero in
 * the columns of the other segments.
 */
import type { ResolvedGeometry } from './masks.ts';
import type { PhaseTermShape } from './phase-term.ts';
import { legendre, type BaselinePlan } from './segments.ts';
import type { ColumnName } from './types.ts';

/** Row-major design matrix with its data, for the points kept by the mask. */
export interface Design {
  names: ColumnName[];
  rows: number;
  cols: number;
  /** rows x cols, row-major. */
  matrix: Float64Array;
  phase: Float64Array;
  flux: Float64Array;
  fluxErr: Float64Array;
  /** Number of kept points with a non-zero hidden fraction. */
  inEclipse: number;
}

export interface DesignInput {
  phase: Float64Array;
  flux: Float64Array;
  fluxErr: Float64Array;
  /** 1 = use the point. */
  keep: Uint8Array;
  /** Baseline segments; absent = one constant. */
  baseline?: { plan: BaselinePlan; segmentOf: Int32Array; time: Float64Array };
}

export function buildDesign(input: DesignInput, shape: PhaseTermShape, geometry: ResolvedGeometry): Design {
  const base = input.baseline;
  const names: ColumnName[] = base ? [...base.plan.names] : ['constant'];
  const b = names.length;
  names.push('phaseTerm', 'sine', 'ellipsoidal');
  const withEclipse = geometry.contactHalfWidth > 0;
  if (withEclipse) names.push('eclipse');
  const cols = names.length;
  let rows = 0;
  for (let i = 0; i < input.keep.length; i++) rows += input.keep[i]!;
  const matrix = new Float64Array(rows * cols);
  const phase = new Float64Array(rows);
  const flux = new Float64Array(rows);
  const fluxErr = new Float64Array(rows);
  const poly = new Float64Array(8);
  let r = 0;
  let inEclipse = 0;
  for (let i = 0; i < input.keep.length; i++) {
    if (!input.keep[i]) continue;
    const p = input.phase[i]!;
    const o = r * cols;
    const theta = 2 * Math.PI * p;
    if (base) {
      const seg = base.plan.segments[base.segmentOf[i]!]!;
      matrix[o + seg.firstColumn] = 1;
      if (seg.order === 1) matrix[o + seg.firstColumn + 1] = (base.time[i]! - seg.midTime) / seg.halfSpan;
      else if (seg.order > 1) {
        legendre((base.time[i]! - seg.midTime) / seg.halfSpan, seg.order, poly);
        for (let k = 0; k < seg.order; k++) matrix[o + seg.firstColumn + 1 + k] = poly[k]!;
      }
    } else {
      matrix[o] = 1;
    }
    matrix[o + b] = shape.value(p);
    matrix[o + b + 1] = Math.sin(theta);
    matrix[o + b + 2] = -Math.cos(2 * theta);
    if (withEclipse) {
      const h = geometry.hiddenFraction(p);
      if (h > 0) inEclipse++;
      matrix[o + b + 3] = -h;
    }
    phase[r] = p;
    flux[r] = input.flux[i]!;
    fluxErr[r] = input.fluxErr[i]!;
    r++;
  }
  return { names, rows, cols, matrix, phase, flux, fluxErr, inEclipse };
}
