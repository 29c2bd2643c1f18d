/**
 * Notes (what the decomposition assumed) and warnings (what looks wrong in the data
 * or the result), added to a finished decomposition so that the output says which
 * choices drove the numbers.
 */
import type { Decomposition } from './decompose.ts';

/** Largest |c0 - 1| accepted silently as "normalised to the star" (our choice). */
const NORMALISATION_TOLERANCE = 0.01;
/** Reduced chi-square is flagged beyond this many standard deviations sqrt(2/dof) from 1 (our choice). */
const CHI2_FLAG_SIGMAS = 5;

/** A segment shorter than this many orbital periods has a trend that is partly degenerate with the phase curve (our choice). */
const SHORT_SEGMENT_PERIODS = 1;

export function addDiagnostics(r: Decomposition, edgeOnAssumed: boolean, timed: boolean, periodDays: number): void {
  const { notes, warnings, model } = r;
  notes.push({
    'beaming': 'sin(2 pi phi) term taken as Doppler beaming; the planet\'s phase peak is held at eclipse (no offset fitted).',
    'offset-beaming-fixed': 'sin(2 pi phi) term split: beaming fixed at the predicted value (its sigma carried into the offset), the rest is the planet\'s phase offset.',
    'offset-no-beaming': 'sin(2 pi phi) term taken wholly as the planet\'s phase offset; the beaming term is absent (taken as zero), so any real beaming appears as an eastward offset.',
  }[model.sineTerm]);
  notes.push(model.eclipseShape === 'box'
    ? 'eclipse shape: a box of the given duration (ingress and egress not resolved without Rp/R* and a/R*).'
    : model.eclipseShape === 'none' ? 'the geometry gives no eclipse: the eclipse depth is not fitted.'
      : 'eclipse shape: overlap of two uniform disks on a circular orbit.');
  if (model.sineTerm === 'offset-beaming-fixed') notes.push('mass check: the beaming was fixed from its prediction, so only the ellipsoidal amplitude is checked.');
  if (model.phaseModel === 'lambert' && edgeOnAssumed) notes.push('Lambert phase term computed for an edge-on orbit (no inclination given).');
  notes.push('brightness map: first-order longitudinal map for an edge-on orbit (Cowan & Agol 2008, ApJ 678, L129); for reflected light it is an effective map.');
  if (model.errorsScaled) notes.push(`uncertainties multiplied by sqrt(reduced chi-square) = ${Math.sqrt(r.reducedChiSquare).toFixed(3)}.`);
  if (r.data.bins !== null) notes.push(`fitted on ${r.data.bins} phase bins (binned model columns, so the binning adds no bias).`);
  baselineDiagnostics(r, timed, periodDays);
  const spread = CHI2_FLAG_SIGMAS * Math.sqrt(2 / r.degreesOfFreedom);
  if (r.reducedChiSquare > 1 + spread && !model.errorsScaled) {
    warnings.push(`reduced chi-square ${r.reducedChiSquare.toFixed(2)}: flux_err is too small or the model misses a signal; the sigmas are then too small (--scale-errors inflates them).`);
  } else if (r.reducedChiSquare < 1 - spread) {
    warnings.push(`reduced chi-square ${r.reducedChiSquare.toFixed(2)}: flux_err looks overestimated, so the sigmas are too large.`);
  }
  if (!model.offsetFitted && r.phaseAmplitudePpm.value < -3 * r.phaseAmplitudePpm.sigma) {
    warnings.push('the planet\'s phase term is negative (brighter at transit than at eclipse): check that the epoch is the mid-transit time.');
  }
  if (r.eclipseDepthPpm && r.data.inEclipsePoints < 10) warnings.push(`only ${r.data.inEclipsePoints} points fall in the eclipse: its depth rests on very few points.`);
  if (!r.brightnessMap.physical) warnings.push('the first-order brightness map goes negative at its darkest longitude (contrast above 1): the map is unphysical at this order.');
  if (model.inclinationDeg < 80 || model.inclinationDeg > 100) warnings.push(`inclination ${model.inclinationDeg.toFixed(1)} deg: the brightness map assumes an edge-on orbit.`);
}

function baselineDiagnostics(r: Decomposition, timed: boolean, periodDays: number): void {
  const { notes, warnings, model } = r;
  const fitted = r.segments.filter((s) => s.normalisation !== null);
  const files = new Set(r.segments.map((s) => s.file)).size;
  const orders = [...new Set(fitted.map((s) => s.trendOrder))].sort();
  const how = files > 1 ? `${files} files` : 'the file';
  const split = timed ? ` split at gaps longer than ${model.gapDays} d` : '';
  notes.push(fitted.length === 1
    ? `baseline: one segment, its normalisation${orders[0]! > 0 ? ` and a polynomial trend of order ${orders[0]} in time (Legendre terms)` : ''} fitted jointly with the signals.`
    : `baseline: ${fitted.length} segments (${how}${split}), each with its own normalisation${orders.some((o) => o > 0) ? ` and a polynomial trend of order ${orders.filter((o) => o > 0).join(' or ')} in time (Legendre terms)` : ''}, fitted jointly with the signals; ${r.trendTerms} trend terms. Amplitudes are fractions of the flux normalisation, to first order in the segments' differences.`);
  if (!timed && model.trendOrder > 0) notes.push('a folded curve has no times: no trend fitted, only a normalisation per file.');
  const dropped = r.segments.filter((s) => s.normalisation === null).length;
  if (dropped > 0) notes.push(`${dropped} segment(s) lie wholly in the masked transit and were left out.`);
  const reduced = fitted.filter((s) => s.trendOrder === 0 && model.trendOrder > 0 && timed);
  if (reduced.length > 0) notes.push(`${reduced.length} segment(s) with too few points were given a normalisation only, no trend.`);
  for (const [k, s] of r.segments.entries()) {
    if (!s.normalisation) continue;
    const where = r.segments.length > 1 ? `segment ${k + 1} (${s.file})` : 'the curve';
    if (Math.abs(s.normalisation.value - 1) > NORMALISATION_TOLERANCE) {
      warnings.push(`the normalisation of ${where} is ${s.normalisation.value.toPrecision(6)}: the flux does not look normalised to the star (near 1); amplitudes are in units of the flux column, so divide the curve by its out-of-transit median first.`);
    }
    if (timed && s.trendOrder > 0 && s.start !== null && s.end !== null && s.end - s.start < SHORT_SEGMENT_PERIODS * periodDays) {
      warnings.push(`${where} spans ${((s.end - s.start) / periodDays).toFixed(2)} orbital periods: its trend is partly degenerate with the phase curve, which widens the uncertainties (a lower --trend-order or a longer --gap helps).`);
    }
  }
}
