import { describe, expect, it } from 'vitest';
import { HesperError } from '../../src/errors.ts';
import { parseCurveCsv } from '../../src/io/curve-csv.ts';
import { decompose, type DecomposeOptions, type Decomposition } from '../../src/lightcurve/decompose.ts';
import { contactHalfWidthPhase } from '../../src/lightcurve/disk-overlap.ts';
import type { LightCurve, ValueSigma } from '../../src/lightcurve/types.ts';
import { lambertPhaseFunction, phaseAngleRad } from '../../src/physics/reflection.ts';
import { cosinePlanet, syntheticTimeSeries, type SyntheticSpec } from './synthetic.ts';

// All amplitudes below are invented inputs of the synthetic curves (fractions of the
// stellar flux); the expected values are those inputs, mapped to the reported
// quantities as derived in the comments.
const PPM = 1e-6;
/** Planet: Fp = MEAN - SEMI cos(2 pi phi + offset), nightside MEAN - SEMI = 20 ppm (a map that stays positive). */
const MEAN = 50;
const SEMI = 30;
const GEOMETRY = { kind: 'disks' as const, radiusRatio: 0.1, scaledSemiMajorAxis: 4, inclinationDeg: 87 };

function spec(over: Partial<SyntheticSpec> = {}): SyntheticSpec {
  return {
    points: 2000, periodDays: 1.5, epochDays: 2460000.25, spanDays: 4.5,
    radiusRatio: 0.1, scaledSemiMajorAxis: 4, inclinationDeg: 87,
    planetFlux: cosinePlanet(MEAN * PPM, SEMI * PPM, 0),
    ellipsoidal: 20 * PPM, beaming: 10 * PPM, noise: 100 * PPM, seed: 1, ...over,
  };
}

function options(s: SyntheticSpec, over: Partial<DecomposeOptions> = {}): DecomposeOptions {
  return { periodDays: s.periodDays, epochDays: s.epochDays, geometry: GEOMETRY, ...over };
}

function pull(q: ValueSigma | null, truth: number): number {
  if (!q) throw new Error('quantity missing');
  return (q.value - truth) / q.sigma;
}

function within3Sigma(q: ValueSigma | null, truth: number): void {
  expect(Math.abs(pull(q, truth))).toBeLessThan(3);
}

describe('decompose: recovery of known signals', () => {
  it('cosine phase term, no offset: depth, amplitude, ellipsoidal and beaming', () => {
    const s = spec();
    const r = decompose(syntheticTimeSeries(s), options(s));
    // derived: Fp = 50 - 30 cos(2 pi phi) ppm, so D = Fp(0.5) = 80 ppm, peak-to-trough 60 ppm,
    // nightside Fp(0) = 20 ppm; E = 20 ppm, B = 10 ppm as injected.
    within3Sigma(r.eclipseDepthPpm, MEAN + SEMI);
    within3Sigma(r.phaseAmplitudePpm, 2 * SEMI);
    within3Sigma(r.nightsideFluxPpm, MEAN - SEMI);
    within3Sigma(r.ellipsoidalAmplitudePpm, 20);
    within3Sigma(r.beamingAmplitudePpm, 10);
    expect(r.phaseOffsetDeg).toBeNull();
    expect(r.model.sineTerm).toBe('beaming');
    expect(r.covariance.names).toEqual(['eclipseDepthPpm', 'phaseAmplitudePpm', 'ellipsoidalAmplitudePpm', 'beamingAmplitudePpm']);
    expect(r.covariance.matrix[0]![0]).toBeCloseTo(r.eclipseDepthPpm!.sigma ** 2, 9);
    expect(r.covariance.matrix[0]![1]).toBeCloseTo(r.covariance.matrix[1]![0]!, 12);
    // derived: the reduced chi-square of a correct model has sd sqrt(2 / dof), about 0.03
    // for these curves; 0.85-1.15 is about 5 of those.
    expect(r.reducedChiSquare).toBeGreaterThan(0.85);
    expect(r.reducedChiSquare).toBeLessThan(1.15);
    // derived: the residual scatter is the injected 100 ppm noise.
    expect(r.residualPpm).toBeGreaterThan(93);
    expect(r.residualPpm).toBeLessThan(107);
    expect(r.points + r.data.maskedTransitPoints).toBe(2000);
    expect(r.warnings).toEqual([]);
  });

  it('cosine with offset and the beaming fixed from a prediction', () => {
    const s = spec({ planetFlux: cosinePlanet(MEAN * PPM, SEMI * PPM, 20), seed: 2 });
    const r = decompose(syntheticTimeSeries(s), options(s, { fitOffset: true, predicted: { beamingPpm: { value: 10, sigma: 1 } } }));
    // derived: D = Fp(0.5) = 50 + 30 cos 20 deg = 78.19 ppm; peak-to-trough 2 x 30 = 60 ppm; offset +20 deg.
    within3Sigma(r.eclipseDepthPpm, MEAN + SEMI * Math.cos((20 * Math.PI) / 180));
    within3Sigma(r.phaseAmplitudePpm, 2 * SEMI);
    within3Sigma(r.phaseOffsetDeg, 20);
    within3Sigma(r.ellipsoidalAmplitudePpm, 20);
    expect(r.model.sineTerm).toBe('offset-beaming-fixed');
    expect(r.beamingAmplitudePpm).toEqual({ value: 10, sigma: 1 });
    expect(r.covariance.names).toEqual(['eclipseDepthPpm', 'phaseAmplitudePpm', 'phaseOffsetDeg', 'ellipsoidalAmplitudePpm']);
    expect(r.notes.join(' ')).toMatch(/beaming fixed at the predicted value/);
    expect(r.brightnessMap.longitudeFitted).toBe(true);
    // first order: the hot-spot longitude is the phase offset (brightness-map.ts).
    expect(r.brightnessMap.hotspotLongitudeDeg.value).toBeCloseTo(r.phaseOffsetDeg!.value, 9);
    expect(r.brightnessMap.hotspotLongitudeDeg.sigma).toBeCloseTo(r.phaseOffsetDeg!.sigma, 9);
  });

  it('offset with the beaming term absent: a real beaming signal becomes an eastward offset', () => {
    const noBeaming = spec({ planetFlux: cosinePlanet(MEAN * PPM, SEMI * PPM, -15), beaming: 0, seed: 3 });
    const r = decompose(syntheticTimeSeries(noBeaming), options(noBeaming, { fitOffset: true }));
    within3Sigma(r.phaseOffsetDeg, -15);
    expect(r.beamingAmplitudePpm).toBeNull();
    expect(r.model.sineTerm).toBe('offset-no-beaming');
    // derived: with beaming B = 30 ppm left in, the sine coefficient is B + R sin(delta) =
    // 30 + 30 sin(-15 deg) = 22.2 ppm and a1 = R cos(delta) = 29.0 ppm: offset atan2 = +37.5 deg.
    const withBeaming = spec({ planetFlux: cosinePlanet(MEAN * PPM, SEMI * PPM, -15), beaming: 30 * PPM, seed: 3 });
    const b = decompose(syntheticTimeSeries(withBeaming), options(withBeaming, { fitOffset: true }));
    const d = (-15 * Math.PI) / 180;
    within3Sigma(b.phaseOffsetDeg, (Math.atan2(30 + SEMI * Math.sin(d), SEMI * Math.cos(d)) * 180) / Math.PI);
    expect(b.notes.join(' ')).toMatch(/any real beaming appears as an eastward offset/);
  });

  it('Lambert phase term on an inclined orbit', () => {
    const i = (87 * Math.PI) / 180;
    const range = lambertPhaseFunction(phaseAngleRad(0.5, i)) - lambertPhaseFunction(phaseAngleRad(0, i));
    const night = 5 * PPM;
    const amp = 70 * PPM;
    const planetFlux = (phase: number): number => night + (amp * lambertPhaseFunction(phaseAngleRad(phase, i))) / range;
    const s = spec({ planetFlux, seed: 4 });
    const r = decompose(syntheticTimeSeries(s), options(s, { phaseModel: 'lambert' }));
    // derived: peak-to-trough 70 ppm; D = Fp(0.5) = 5 + 70 Phi(3 deg)/sin(87 deg) ppm
    // (range = Phi(90 - i) - Phi(90 + i), = sin i, derived from the Lambert phase function).
    within3Sigma(r.phaseAmplitudePpm, 70);
    within3Sigma(r.eclipseDepthPpm, planetFlux(0.5) / PPM);
    within3Sigma(r.nightsideFluxPpm, 5);
    within3Sigma(r.ellipsoidalAmplitudePpm, 20);
    within3Sigma(r.beamingAmplitudePpm, 10);
    // With the offset fitted on a symmetric planet (and no beaming injected, as the sine
    // term then goes to the planet), the offset is consistent with 0.
    const o = decompose(syntheticTimeSeries({ ...s, beaming: 0 }), options(s, { phaseModel: 'lambert', fitOffset: true }));
    within3Sigma(o.phaseOffsetDeg, 0);
    within3Sigma(o.phaseAmplitudePpm, 70);
  });

  it('a duration window instead of the disks (box eclipse)', () => {
    const s = spec({ seed: 5 });
    const durationHours = 2 * contactHalfWidthPhase(0.1, 4, (87 * Math.PI) / 180) * s.periodDays * 24;
    const r = decompose(syntheticTimeSeries(s), options(s, { geometry: { kind: 'window', durationHours } }));
    within3Sigma(r.eclipseDepthPpm, MEAN + SEMI);
    within3Sigma(r.phaseAmplitudePpm, 2 * SEMI);
    expect(r.model.eclipseShape).toBe('box');
    expect(r.notes.join(' ')).toMatch(/a box of the given duration/);
    const l = decompose(syntheticTimeSeries(s), options(s, { geometry: { kind: 'window', durationHours }, phaseModel: 'lambert' }));
    expect(l.model.inclinationDeg).toBe(90);
    expect(l.notes.join(' ')).toMatch(/Lambert phase term computed for an edge-on orbit/);
  });

  it('a non-transiting geometry fits no eclipse and gives no contrast', () => {
    const s = spec({ inclinationDeg: 70, seed: 6 });
    const r = decompose(syntheticTimeSeries(s), options(s, { geometry: { ...GEOMETRY, inclinationDeg: 70 } }));
    expect(r.eclipseDepthPpm).toBeNull();
    expect(r.brightnessMap.dayNightContrast).toBeNull();
    expect(r.data.maskedTransitPoints).toBe(0);
    within3Sigma(r.phaseAmplitudePpm, 2 * SEMI);
    expect(r.warnings.join(' ')).toMatch(/assumes an edge-on orbit/);
  });
});

describe('decompose: error calibration over 200 realisations', () => {
  it('pulls have a standard deviation between 0.8 and 1.2', () => {
    const names = ['eclipseDepthPpm', 'phaseAmplitudePpm', 'phaseOffsetDeg', 'ellipsoidalAmplitudePpm', 'beamingAmplitudePpm', 'dayNightContrast'] as const;
    const pulls: Record<(typeof names)[number], number[]> = {
      eclipseDepthPpm: [], phaseAmplitudePpm: [], phaseOffsetDeg: [], ellipsoidalAmplitudePpm: [], beamingAmplitudePpm: [], dayNightContrast: [],
    };
    // derived (brightness-map.ts): contrast = 2m / (MEAN + m), m = 4 SEMI / pi.
    const m = (4 * SEMI) / Math.PI;
    const contrast = (2 * m) / (MEAN + m);
    const offsetDeg = 20;
    // derived: D = Fp(0.5) = MEAN + SEMI cos 20 deg; peak-to-trough 2 SEMI; E = 20, B = 10 ppm as injected.
    const depth = MEAN + SEMI * Math.cos((offsetDeg * Math.PI) / 180);
    for (let k = 0; k < 200; k++) {
      const s = spec({ planetFlux: cosinePlanet(MEAN * PPM, SEMI * PPM, offsetDeg), seed: 1000 + k });
      const curve = syntheticTimeSeries(s);
      const r = decompose(curve, options(s, { fitOffset: true, predicted: { beamingPpm: { value: 10, sigma: 0 } } }));
      pulls.eclipseDepthPpm.push(pull(r.eclipseDepthPpm, depth));
      pulls.phaseAmplitudePpm.push(pull(r.phaseAmplitudePpm, 2 * SEMI));
      pulls.phaseOffsetDeg.push(pull(r.phaseOffsetDeg, offsetDeg));
      pulls.ellipsoidalAmplitudePpm.push(pull(r.ellipsoidalAmplitudePpm, 20));
      pulls.dayNightContrast.push(pull(r.brightnessMap.dayNightContrast, contrast));
      // beaming is fitted when no offset is: a planet peak held at eclipse; use a symmetric
      // planet for that fit so the model is right.
      const sym = spec({ seed: 5000 + k });
      pulls.beamingAmplitudePpm.push(pull(decompose(syntheticTimeSeries(sym), options(sym)).beamingAmplitudePpm, 10));
    }
    for (const n of names) {
      const a = pulls[n];
      const mean = a.reduce((s, v) => s + v, 0) / a.length;
      const sd = Math.sqrt(a.reduce((s, v) => s + (v - mean) ** 2, 0) / (a.length - 1));
      expect(sd, `${n} pull sd`).toBeGreaterThan(0.8);
      expect(sd, `${n} pull sd`).toBeLessThan(1.2);
      // mean pull: standard error 1/sqrt(200) = 0.07 (derived); 0.3 allows the small
      // second-order bias of holding the planet flux constant across the eclipse.
      expect(Math.abs(mean), `${n} pull mean`).toBeLessThan(0.3);
    }
  });
});

describe('decompose: folding and binning', () => {
  function toPhaseCsv(curve: LightCurve, epoch: number, period: number): string {
    const rows = ['# the same curve, folded by the test: phase = frac((t - epoch) / period)', 'phase,flux,flux_err'];
    const order = Array.from(curve.x.keys()).map((i) => {
      const c = (curve.x[i]! - epoch) / period;
      return { phase: c - Math.floor(c), i };
    }).sort((a, b) => a.phase - b.phase);
    for (const { phase, i } of order) rows.push(`${phase},${curve.flux[i]},${curve.fluxErr[i]}`);
    return rows.join('\n');
  }

  it('a time series and its pre-folded version give the same fit', () => {
    const s = spec({ planetFlux: cosinePlanet(MEAN * PPM, SEMI * PPM, 10), seed: 8 });
    const curve = syntheticTimeSeries(s);
    // A folded curve has no times, so its baseline is one constant: compare with the
    // time series fitted with no trend (trend order 0).
    const opts = options(s, { fitOffset: true, predicted: { beamingPpm: { value: 10, sigma: 0.5 } }, trendOrder: 0 });
    const a = decompose(curve, opts);
    const folded = parseCurveCsv(toPhaseCsv(curve, s.epochDays, s.periodDays), 'folded.csv');
    expect(folded.column).toBe('phase');
    const b = decompose(folded, { ...opts, epochDays: undefined });
    const keys = ['eclipseDepthPpm', 'phaseAmplitudePpm', 'phaseOffsetDeg', 'ellipsoidalAmplitudePpm'] as const;
    for (const k of keys) {
      // Only the summation order differs: agreement to 1e-6 sigma.
      expect(Math.abs(a[k]!.value - b[k]!.value) / a[k]!.sigma, k).toBeLessThan(1e-6);
      expect(b[k]!.sigma / a[k]!.sigma, k).toBeCloseTo(1, 9);
    }
    expect(b.reducedChiSquare).toBeCloseTo(a.reducedChiSquare, 9);
    expect(b.points).toBe(a.points);
  });

  it('binning with model columns averaged per bin agrees with the unbinned fit', () => {
    const s = spec({ seed: 9 });
    const curve = syntheticTimeSeries(s);
    const a = decompose(curve, options(s));
    const b = decompose(curve, options(s, { bins: 400 }));
    // With a trend the bins are formed per orbital cycle (4 cycles touched by the
    // 4.5-day span of a 1.5-day orbit starting 0.3 periods before the epoch, derived).
    expect(b.data.bins).toBeLessThanOrEqual(4 * 400);
    expect(b.data.bins).toBeGreaterThan(400);
    expect(decompose(curve, options(s, { bins: 400, trendOrder: 0 })).data.bins).toBeLessThanOrEqual(400);
    expect(b.points).toBe(a.points);
    const keys = ['eclipseDepthPpm', 'phaseAmplitudePpm', 'ellipsoidalAmplitudePpm', 'beamingAmplitudePpm'] as const;
    for (const k of keys) {
      expect(Math.abs(a[k]!.value - b[k]!.value) / a[k]!.sigma, k).toBeLessThan(0.3);
      expect(b[k]!.sigma / a[k]!.sigma, k).toBeGreaterThan(0.98);
      expect(b[k]!.sigma / a[k]!.sigma, k).toBeLessThan(1.1);
    }
  });
});

describe('decompose: diagnostics and bad input', () => {
  it('warns about un-normalised flux and a large reduced chi-square, and can scale the errors', () => {
    const s = spec({ seed: 10 });
    const curve = syntheticTimeSeries(s);
    const scaled = { ...curve, flux: curve.flux.map((f) => f * 1000), fluxErr: curve.fluxErr.map((e) => e * 1000) };
    expect(decompose(scaled, options(s)).warnings.join(' ')).toMatch(/does not look normalised/);
    const tight = { ...curve, fluxErr: curve.fluxErr.map((e) => e / 2) };
    const r = decompose(tight, options(s));
    // derived: halving flux_err quadruples chi-square.
    expect(r.reducedChiSquare).toBeGreaterThan(3.4);
    expect(r.warnings.join(' ')).toMatch(/reduced chi-square/);
    const fixed: Decomposition = decompose(tight, options(s, { scaleErrors: true }));
    const plain = decompose(curve, options(s));
    expect(fixed.model.errorsScaled).toBe(true);
    expect(fixed.eclipseDepthPpm!.sigma / plain.eclipseDepthPpm!.sigma).toBeCloseTo(Math.sqrt(r.reducedChiSquare / 4), 6);
  });

  it('runs the mass check against predictions', () => {
    const s = spec({ seed: 11 });
    const r = decompose(syntheticTimeSeries(s), options(s, { predicted: { ellipsoidalPpm: { value: 60, sigma: 2 }, beamingPpm: { value: 10, sigma: 1 } } }));
    expect(r.massCheck.map((c) => c.status)).toEqual(['lower', 'consistent']);
    expect(r.warnings.join(' ')).toMatch(/ellipsoidal amplitude .* lower than the 60.0/);
  });

  it('reports a curve with no points in the eclipse as a degenerate fit', () => {
    const s = spec({ seed: 12 });
    const curve = syntheticTimeSeries(s);
    const phase = curve.x.map((t) => { const c = (t - s.epochDays) / s.periodDays; return c - Math.floor(c); });
    const keep = Array.from(phase.keys()).filter((i) => Math.abs(phase[i]! - 0.5) > 0.1);
    const cut: LightCurve = { column: 'time', x: Float64Array.from(keep, (i) => curve.x[i]!), flux: Float64Array.from(keep, (i) => curve.flux[i]!), fluxErr: Float64Array.from(keep, (i) => curve.fluxErr[i]!) };
    try {
      decompose(cut, options(s));
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(HesperError);
      expect((e as HesperError).code).toBe('degenerate-fit');
      expect((e as HesperError).issues[0]!.path).toBe('model.eclipse');
    }
  });

  it('rejects bad geometry and predictions by field name', () => {
    const s = spec();
    const c = syntheticTimeSeries({ ...s, points: 50 });
    expect(() => decompose(c, options(s, { geometry: { ...GEOMETRY, radiusRatio: 1.3 } }))).toThrow(/radiusRatio = 1.3/);
    expect(() => decompose(c, options(s, { geometry: { ...GEOMETRY, scaledSemiMajorAxis: 0.9 } }))).toThrow(/scaledSemiMajorAxis = 0.9/);
    expect(() => decompose(c, options(s, { geometry: { kind: 'window', durationHours: -1 } }))).toThrow(/durationHours/);
    expect(() => decompose(c, options(s, { geometry: { kind: 'window', durationHours: 20 } }))).toThrow(/durationHours/);
    expect(() => decompose(c, options(s, { predicted: { beamingPpm: { value: 1, sigma: -1 } } }))).toThrow(/predicted.beamingPpm.sigma/);
    expect(() => decompose(c, { ...options(s), epochDays: undefined })).toThrow(/epoch/);
  });
});
