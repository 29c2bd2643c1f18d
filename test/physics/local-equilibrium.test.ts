import { describe, expect, it } from 'vitest';
import { getBandTable, resolveBand } from '../../src/physics/bandpass.ts';
import { integrateGaussLegendre } from '../../src/physics/integrate.ts';
import {
  localEquilibriumFactorAt, localEquilibriumFluxFactor, localEquilibriumShape4, localEquilibriumTable, localEquilibriumTemperatureK,
} from '../../src/physics/local-equilibrium.ts';
import { daysideTemperatureK, nightsideTemperatureK } from '../../src/physics/temperature.ts';

describe('the local-equilibrium dayside map', () => {
  it('has the bolometric dayside and nightside of Cowan & Agol 2011 at every eps', () => {
    // derived: 2 int_0^1 s(mu)^4 mu dmu = 1, so the map's full-phase bolometric flux equals sigma T_day^4;
    // its uniform part eps/4 is the nightside T_night^4 / (T0^4 (1 - A_B)).
    for (const eps of [0, 0.2, 0.5, 0.8, 1]) {
      expect(2 * integrateGaussLegendre((mu) => localEquilibriumShape4(mu, eps) * mu, 0, 1, 20)).toBeCloseTo(1, 12);
      const tDay = daysideTemperatureK(6000, 5, 0.2, eps);
      const tNight = nightsideTemperatureK(6000, 5, 0.2, eps);
      // at the limb (mu = 0) only the redistributed share is left: the nightside temperature.
      if (eps > 0) expect(localEquilibriumTemperatureK(tDay, eps, 0) / tNight).toBeCloseTo(1, 12);
    }
    // eps = 0: T = T0 (1 - A_B)^(1/4) cos^(1/4) theta, with T_day = (2/3)^(1/4) T0 (1 - A_B)^(1/4) (Cowan & Agol 2011).
    const t0 = 6000 / Math.sqrt(5);
    expect(localEquilibriumTemperatureK(daysideTemperatureK(6000, 5, 0, 0), 0, 1) / t0).toBeCloseTo(1, 12);
  });

  it('is brighter than a uniform dayside in the optical Wien tail, and equal at full redistribution', () => {
    const tess = getBandTable(resolveBand('tess'), 'photon');
    const kepler = getBandTable(resolveBand('kepler'), 'photon');
    expect(localEquilibriumFluxFactor(tess, 2000, 1)).toBeCloseTo(1, 9);
    // Hot Jupiter daysides of 1500-3000 K at eps = 0: a few to a few tens of percent brighter (derived here:
    // TESS 1.24 at 1500 K to 1.03 at 3000 K; Kepler 1.34 to 1.07; the brightening falls as the Wien tail flattens).
    const f = [1500, 2000, 2500, 3000].map((t) => localEquilibriumFluxFactor(tess, t, 0));
    for (let k = 1; k < f.length; k++) expect(f[k]!).toBeLessThan(f[k - 1]!);
    expect(f[0]!).toBeGreaterThan(1.2);
    expect(f[3]!).toBeGreaterThan(1.02);
    expect(localEquilibriumFluxFactor(kepler, 2000, 0)).toBeGreaterThan(localEquilibriumFluxFactor(tess, 2000, 0));
  });

  it('agrees with direct quadrature through its table (worst case reported)', () => {
    let worst = 0;
    let where = '';
    for (const id of ['kepler', 'tess', 'cheops']) {
      const band = getBandTable(resolveBand(id), 'photon');
      const table = localEquilibriumTable(band);
      for (let t = 800; t < 5000; t *= 1.0731) {
        for (let eps = 0; eps <= 1; eps += 0.0473) {
          const e = Math.abs(localEquilibriumFactorAt(table, Math.log(t), eps) / localEquilibriumFluxFactor(band, t, eps) - 1);
          if (e > worst) {
            worst = e;
            where = `${id} ${t.toFixed(0)} K eps ${eps.toFixed(3)}`;
          }
        }
      }
    }
    expect(worst, where).toBeLessThan(1e-3);
  });
});
