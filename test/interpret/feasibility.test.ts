import { describe, expect, it } from 'vitest';
import type { CondensateCurve } from '../../src/catalog/index.ts';
import { checkTemperature, condensationRangeK, curveMap } from '../../src/interpret/feasibility.ts';
import { condensationTemperatureK } from '../../src/physics/condensation.ts';
import { entry, temperatures } from './helpers.ts';

const mgsio3Cloud = entry({ id: 'mgsio3-cloud', category: 'cloud', quantity: 'single-scattering', condensate: 'MgSiO3', valueMin: 0.99, valueNominal: 0.995, valueMax: 1 });
const waterIceCloud = entry({ id: 'water-ice-cloud', category: 'cloud', quantity: 'single-scattering', condensate: 'H2O', valueMin: 1, valueNominal: 1, valueMax: 1 });
const iceSurface = entry({ id: 'ice-surface', category: 'ice', quantity: 'surface', temperatureMinK: null, temperatureMaxK: 273, valueMin: 0.7, valueNominal: 0.8, valueMax: 0.9 });

describe('temperature feasibility from condensation curves', () => {
  it('takes the window of a cloud from its curve between 1e-3 and 1 bar', () => {
    // derived from the curve of src/physics (Visscher et al. 2010 form, coefficients from memory):
    // the feasible layer is bounded by T_cond(1e-3 bar) and T_cond(1 bar) at the given metallicity.
    const range = condensationRangeK('MgSiO3', { curves: curveMap([]), metallicityDex: 0 })!;
    expect(range[0]).toBe(condensationTemperatureK('MgSiO3', 1e-3, 0));
    expect(range[1]).toBe(condensationTemperatureK('MgSiO3', 1, 0));
  });

  it('MgSiO3 clouds are feasible at 1400 K and excluded at 2600 K', () => {
    // From the curve, not from a list. T_cond(MgSiO3, 1 bar, solar) = 1e4 / 6.26 = 1597 K
    // (derived from a = 6.26, Visscher et al. 2010, from memory), T_cond(1e-3 bar) = 1e4 / (6.26 + 3 * 0.35) = 1368 K.
    const at1400 = checkTemperature(mgsio3Cloud, temperatures([1380, 1420]));
    expect(at1400.kind).toBe('condensation');
    expect(at1400.grade).toBe('ok');
    const at2600 = checkTemperature(mgsio3Cloud, temperatures([2550, 2650]));
    expect(at2600.grade).toBe('excluded');
    expect(at2600.text).toMatch(/^too hot: MgSiO3 does not condense above about 1600 K at 1 bar \(1370 K at 1e-3 bar, \[M\/H\] = 0\), T_day here is 2600 \+- 34 K/);
  });

  it('follows the curve it is given: a catalog curve replaces the built-in one', () => {
    // An invented curve 1e4/T = 3.5 (T_cond = 2857 K at any pressure) makes 2600 K feasible.
    const invented: CondensateCurve = {
      species: 'MgSiO3', a: 3.5, b: 0, c: 0, d: 0, validPressureBar: [1e-4, 100], validMetallicityDex: [-1, 1],
      sourceKey: 'Invented2026', provenance: 'memory', note: 'invented for a test',
    };
    const ctx = { ...temperatures([2550, 2650]), curves: curveMap([invented]) };
    expect(checkTemperature(mgsio3Cloud, ctx).grade).not.toBe('excluded');
  });

  it('a higher metallicity raises the condensation temperature (c > 0 in the fit)', () => {
    const solar = condensationRangeK('MgSiO3', { curves: curveMap([]), metallicityDex: 0 })!;
    const rich = condensationRangeK('MgSiO3', { curves: curveMap([]), metallicityDex: 0.5 })!;
    expect(rich[1]).toBeGreaterThan(solar[1]);
  });

  it('water ice is excluded on a 1500 K planet, as a cloud (saturation curve) and as a surface (window)', () => {
    // H2O condenses near 260 K at 1 bar for solar water (Buck 1981 vapour pressure; src/physics).
    const ctx = temperatures([1450, 1550]);
    expect(checkTemperature(waterIceCloud, ctx).grade).toBe('excluded');
    const surface = checkTemperature(iceSurface, ctx);
    expect(surface.kind).toBe('window');
    expect(surface.grade).toBe('excluded');
    expect(surface.text).toMatch(/^too hot: .* applies only below 273 K/);
  });

  it('a cloud whose species condenses deep below 1 bar is marginal (cold trap)', () => {
    const cold = checkTemperature(mgsio3Cloud, temperatures([850, 950]));
    expect(cold.grade).toBe('marginal');
    expect(cold.text).toMatch(/cold trap/);
  });

  it('is marginal when only the equilibrium temperature allows the entry', () => {
    // T_day 1800-1900 K is above T_cond(1 bar) = 1597 K, T_eq 1400-1500 K below it.
    const r = checkTemperature(mgsio3Cloud, temperatures([1800, 1900], [1400, 1500]));
    expect(r.grade).toBe('marginal');
    expect(r.probabilityDayside).toBe(0);
    expect(r.probabilityEquilibrium).toBe(1);
  });
});

describe('temperature feasibility from windows', () => {
  it('reads a point window as a planet at that temperature, compared within +-15 %', () => {
    const planet = entry({ id: 'hot-planet', category: 'body', temperatureMinK: 1450, temperatureMaxK: 1450 });
    expect(checkTemperature(planet, temperatures([1400, 1500])).grade).toBe('ok');
    expect(checkTemperature(planet, temperatures([2550, 2650])).grade).toBe('excluded');
  });

  it('an entry with neither a window nor a curve is untested, never feasible', () => {
    const r = checkTemperature(entry({ id: 'no-limits', temperatureMinK: null, temperatureMaxK: null }), temperatures([2000, 2100]));
    expect(r).toMatchObject({ kind: 'none', grade: 'untested', probabilityDayside: null });
    expect(r.text).toMatch(/^temperature untested: .* cannot be shown to exist at this planet's temperature/);
    // A species without a curve and no window (soot, carbon) is untested too, even at 3300 K.
    const soot = entry({ id: 'soot', category: 'haze', condensate: 'carbon', quantity: 'single-scattering', temperatureMinK: null, temperatureMaxK: null });
    expect(checkTemperature(soot, temperatures([3200, 3400])).grade).toBe('untested');
  });

  it("keeps a user entry's own window over the condensation curve unless asked, and says which applied", () => {
    // An invented user entry: MgSiO3 grains said to hold at 1800-2400 K (a window the curve would not give:
    // T_cond(MgSiO3, 1 bar) = 1597 K, Visscher et al. 2010 form, from memory).
    const user = entry({ id: 'user-mgsio3', condensate: 'MgSiO3', quantity: 'single-scattering', temperatureMinK: 1800, temperatureMaxK: 2400, origin: 'user' });
    const ctx = temperatures([2000, 2100]);
    const own = checkTemperature(user, ctx);
    expect(own).toMatchObject({ kind: 'window', grade: 'ok' });
    expect(own.text).toMatch(/the entry's own temperature window applied, not the MgSiO3 condensation curve/);
    const curve = checkTemperature(user, { ...ctx, userEntryTemperature: 'condensation' });
    expect(curve).toMatchObject({ kind: 'condensation', grade: 'excluded' });
    expect(curve.text).toMatch(/the MgSiO3 condensation curve applied, as assumptions\.userEntryTemperature asks/);
    // A curated entry with a curve follows the curve.
    expect(checkTemperature({ ...user, origin: 'curated' }, ctx).kind).toBe('condensation');
  });

  it('a cloud with a species but no curve falls back to its window', () => {
    const tholin = entry({ id: 'tholin-haze', category: 'haze', condensate: 'tholin', temperatureMaxK: 950 });
    const r = checkTemperature(tholin, temperatures([1400, 1500]));
    expect(r.kind).toBe('window');
    expect(r.grade).toBe('excluded');
  });
});
