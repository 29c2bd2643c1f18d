import { describe, expect, it } from 'vitest';
import { bandFlux, bandFluxDirect, bandFluxRatio, resolveBand, type Band } from '../../src/physics/bandpass.ts';
import { H_J_S, C_M_PER_S } from '../../src/physics/constants.ts';
import { integrateAdaptive } from '../../src/physics/integrate.ts';
import { planckLambda, type Weighting } from '../../src/physics/planck.ts';
import { thermalEclipseDepth } from '../../src/physics/thermal.ts';

// An invented, bumpy response curve (60 points, 400-990 nm), labelled as invented test data.
const INVENTED_CURVE_NM: Array<[number, number]> = Array.from({ length: 60 }, (_, i) => [
  400 + 10 * i,
  Math.exp(-(((i - 28) / 14) ** 2)) * (1 + 0.2 * Math.sin(i / 3)),
]);

/** Independent reference: adaptive quadrature of B_lambda R (lambda/hc) in wavelength, piece by piece. */
function referenceFlux(pointsNm: Array<[number, number]>, temperatureK: number, weighting: Weighting): number {
  let sum = 0;
  for (let i = 0; i + 1 < pointsNm.length; i++) {
    const [l0, w0] = pointsNm[i]!;
    const [l1, w1] = pointsNm[i + 1]!;
    const f = (lm: number): number => {
      const r = w0 + ((w1 - w0) * (lm * 1e9 - l0)) / (l1 - l0);
      const b = planckLambda(lm, temperatureK) * r;
      return weighting === 'photon' ? (b * lm) / (H_J_S * C_M_PER_S) : b;
    };
    sum += integrateAdaptive(f, l0 * 1e-9, l1 * 1e-9, { relTol: 1e-13 });
  }
  return sum;
}

/** Worst relative difference table vs direct on 1500 log-spaced temperatures from 100 K to 15000 K. */
function worstTableError(band: Band, weighting: Weighting): number {
  let worst = 0;
  const n = 1500;
  for (let k = 0; k < n; k++) {
    const t = 100 * 150 ** (k / (n - 1));
    worst = Math.max(worst, Math.abs(bandFlux(band, t, weighting) / bandFluxDirect(band, t, weighting) - 1));
  }
  return worst;
}

describe('direct band integration', () => {
  it('agrees with adaptive quadrature in wavelength for a built-in shape and a user curve', () => {
    // Two implementations (x-substitution with Gauss-Legendre panels vs adaptive in lambda): derived.
    const kepler: Array<[number, number]> = [[420, 0], [440, 1], [780, 1], [900, 0]];
    const cases: Array<[Band, Array<[number, number]>]> = [
      [resolveBand('kepler'), kepler],
      [resolveBand({ response: INVENTED_CURVE_NM }), INVENTED_CURVE_NM],
    ];
    let worst = 0;
    for (const [band, pts] of cases) {
      for (const w of ['photon', 'energy'] as const) {
        for (const t of [100, 300, 1500, 5772, 15000]) {
          worst = Math.max(worst, Math.abs(bandFluxDirect(band, t, w) / referenceFlux(pts, t, w) - 1));
        }
      }
    }
    expect(worst, `worst relative difference ${worst.toExponential(2)}`).toBeLessThan(1e-10);
  });
});

describe('band table vs direct integration (required: 1e-5 relative, 100 K to 15000 K)', () => {
  it('holds for every built-in band and both weightings', () => {
    for (const id of ['kepler', 'tess', 'cheops', 'most', 'corot', 'V', 'R', 'I']) {
      for (const w of ['photon', 'energy'] as const) {
        const worst = worstTableError(resolveBand(id), w);
        expect(worst, `${id} ${w}: worst relative error ${worst.toExponential(2)}`).toBeLessThan(1e-5);
      }
    }
  });

  it('holds for a user curve and a narrow blue top-hat (the hardest case for the grid)', () => {
    const curve = worstTableError(resolveBand({ response: INVENTED_CURVE_NM }), 'photon');
    expect(curve, `user curve: worst relative error ${curve.toExponential(2)}`).toBeLessThan(1e-5);
    // 300-320 nm: largest x = hc / (lambda k T) at the red edge, so the most curved ln F(ln T).
    const blue = worstTableError(resolveBand({ tophatNm: [300, 320] }), 'photon');
    expect(blue, `300-320 nm top-hat: worst relative error ${blue.toExponential(2)}`).toBeLessThan(1e-5);
  });
});

describe('band flux invariants', () => {
  it('gives the same flux for a curve given in nm and in um', () => {
    const nm = resolveBand({ response: INVENTED_CURVE_NM, unit: 'nm' });
    const um = resolveBand({ response: INVENTED_CURVE_NM.map(([w, r]) => [w / 1000, r] as [number, number]), unit: 'um' });
    for (const t of [300, 1500, 5800]) {
      expect(bandFlux(um, t) / bandFlux(nm, t) - 1).toBeCloseTo(0, 12);
    }
  });

  it('changes no flux ratio when the response is scaled by a constant', () => {
    const base = resolveBand({ response: INVENTED_CURVE_NM });
    const scaled = resolveBand({ response: INVENTED_CURVE_NM.map(([w, r]) => [w, 37.5 * r] as [number, number]) });
    for (const w of ['photon', 'energy'] as const) {
      expect(bandFlux(scaled, 2000, w) / bandFlux(base, 2000, w)).toBeCloseTo(37.5, 9); // fluxes scale
      expect(bandFluxRatio(scaled, 2000, 5800, w) / bandFluxRatio(base, 2000, 5800, w) - 1).toBeCloseTo(0, 12);
    }
  });
});

describe('photon vs energy weighting', () => {
  // Derived by direct integration (top-hat bands, T* = 5800 K), computed independently of the table:
  // ratio photon/energy of the thermal eclipse depth, printed to 2 decimals; tolerance 1 %.
  const table: Array<[[number, number], number[]]> = [
    [[430, 840], [1.24, 1.19, 1.15, 1.12]],
    [[600, 1000], [1.15, 1.11, 1.08, 1.06]],
    [[400, 1050], [1.38, 1.32, 1.26, 1.2]],
  ];
  const planetTemps = [1500, 2000, 2500, 3000];

  it('reproduces the independently derived depth ratios within 1 %', () => {
    let worst = 0;
    for (const [coverage, ratios] of table) {
      const band = resolveBand({ tophatNm: coverage });
      planetTemps.forEach((tp, i) => {
        const r = thermalEclipseDepth(0.1, tp, 5800, band, 'photon') / thermalEclipseDepth(0.1, tp, 5800, band, 'energy');
        worst = Math.max(worst, Math.abs(r / ratios[i]! - 1));
      });
    }
    expect(worst, `worst relative difference ${(100 * worst).toFixed(2)} %`).toBeLessThan(0.01);
  });
});

describe('table slope d ln F / d ln T', () => {
  it('agrees with direct integration of the slope (the beaming-factor integral)', async () => {
    const { bandLogSlope, resolveBand } = await import('../../src/physics/bandpass.ts');
    const { bandMoments } = await import('../../src/physics/band-integral.ts');
    let worst = 0;
    for (const name of ['kepler', 'tess', 'cheops', 'V']) {
      const band = resolveBand(name);
      for (let t = 100; t <= 15000; t *= 1.37) {
        const direct = bandMoments(band.response, t, 'photon').logSlope;
        worst = Math.max(worst, Math.abs(bandLogSlope(band, t, 'photon') / direct - 1));
      }
    }
    // derived: the derivative of a cubic Hermite interpolant with exact node slopes errs
    // by O(h^3); observed worst case 6.2e-8 relative, tolerance just above it.
    expect(worst).toBeLessThan(1e-7);
  });
});
