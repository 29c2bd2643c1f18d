import { describe, expect, it } from 'vitest';
import { M_PER_AU, M_PER_RSUN, SOLAR_IRRADIANCE, SOLAR_LUMINOSITY, SOLAR_TEFF } from '../../src/physics/constants.ts';
import {
  daysideTemperatureK, equilibriumTemperatureFromIrradianceK, equilibriumTemperatureK, irradianceWPerM2,
  irradiationTemperatureK, nightsideTemperatureK, stellarLuminosityW,
} from '../../src/physics/temperature.ts';

describe('stellar energy balance', () => {
  it('gives the nominal solar luminosity from the nominal radius and 5772 K', () => {
    // IAU 2015 Resolution B3: L_sun = 3.828e26 W, R_sun = 6.957e8 m, Teff = 5772 K; within 0.01 %.
    const l = stellarLuminosityW(M_PER_RSUN, SOLAR_TEFF.value);
    expect(Math.abs(l / 3.828e26 - 1)).toBeLessThan(1e-4);
  });

  it('gives the nominal solar irradiance at 1 au', () => {
    // IAU 2015 B3 S = 1361 W/m^2 (memory); L/(4 pi au^2) = 1361.2 (derived): within 0.02 %.
    expect(Math.abs(irradianceWPerM2(SOLAR_LUMINOSITY.value, M_PER_AU) / SOLAR_IRRADIANCE.value - 1)).toBeLessThan(2e-4);
  });
});

describe('equilibrium temperatures', () => {
  it('gives Earth 254.0 K for A_B = 0.306 and 1361 W/m^2', () => {
    // NASA Earth fact sheet, "black-body temperature" 254.0 K (secondary); within 0.2 K.
    expect(Math.abs(equilibriumTemperatureFromIrradianceK(1361, 0.306) - 254.0)).toBeLessThan(0.2);
  });

  it('gives Jupiter 109.9 K for A_B = 0.343 at 5.2038 au', () => {
    // NASA Jupiter fact sheet 109.9 K (memory; Bond albedo 0.343 of Hanel et al. 1981); within 0.3 K.
    const s = irradianceWPerM2(SOLAR_LUMINOSITY.value, 5.2038 * M_PER_AU); // 50.26 W/m^2 (derived)
    expect(Math.abs(equilibriumTemperatureFromIrradianceK(s, 0.343) - 109.9)).toBeLessThan(0.3);
  });

  it('agrees between the irradiance and the T*, a/R* forms', () => {
    // derived: S = sigma T*^4 / aR^2, so both routes are the same energy balance.
    const aR = M_PER_AU / M_PER_RSUN;
    const s = irradianceWPerM2(stellarLuminosityW(M_PER_RSUN, 5772), M_PER_AU);
    expect(equilibriumTemperatureK(5772, aR, 0.306)).toBeCloseTo(equilibriumTemperatureFromIrradianceK(s, 0.306), 9);
  });
});

describe('Cowan & Agol 2011 temperatures', () => {
  const teff = 5800;
  const aR = 5;
  const t0 = teff / Math.sqrt(aR);

  it('uses T0 = T* (R*/a)^(1/2)', () => {
    expect(irradiationTemperatureK(teff, aR)).toBeCloseTo(t0, 10); // Cowan & Agol 2011 (checked)
  });

  it('gives (2/3)^(1/4) T0 on the dayside with no albedo and no redistribution', () => {
    // Cowan & Agol 2011, checked limit
    expect(daysideTemperatureK(teff, aR, 0, 0)).toBeCloseTo((2 / 3) ** 0.25 * t0, 9);
    expect(nightsideTemperatureK(teff, aR, 0, 0)).toBe(0);
  });

  it('gives a uniform planet at eps = 1, equal to the equilibrium temperature', () => {
    // derived: 2/3 - 5/12 = 1/4 = eps/4 at eps = 1
    const day = daysideTemperatureK(teff, aR, 0.3, 1);
    expect(nightsideTemperatureK(teff, aR, 0.3, 1)).toBeCloseTo(day, 10);
    expect(equilibriumTemperatureK(teff, aR, 0.3)).toBeCloseTo(day, 10);
  });

  it('combines as T_day^4 + T_night^4 = T0^4 (1 - A_B)(2/3 - eps/6)', () => {
    // derived from the two Cowan & Agol forms: (2/3 - 5 eps/12) + eps/4 = 2/3 - eps/6. (Not 1/2 for eps < 1:
    // the eps = 0 dayside value is the disc-integrated brightness seen from the star's direction.)
    for (const eps of [0, 0.25, 0.5, 1]) {
      const sum = daysideTemperatureK(teff, aR, 0.2, eps) ** 4 + nightsideTemperatureK(teff, aR, 0.2, eps) ** 4;
      expect(sum / (t0 ** 4 * 0.8)).toBeCloseTo(2 / 3 - eps / 6, 12);
    }
  });

  it('rejects Bond albedo and redistribution outside [0, 1] and a/R* <= 1', () => {
    expect(() => daysideTemperatureK(teff, aR, 1.2, 0.5)).toThrowError('bondAlbedo = 1.2: must be in [0, 1]');
    expect(() => nightsideTemperatureK(teff, aR, 0.2, -0.1)).toThrowError(/redistribution/);
    expect(() => irradiationTemperatureK(teff, 0.9)).toThrowError(/scaledSemiMajorAxis = 0.9: must be in \(1, inf\)/);
    expect(() => irradiationTemperatureK(-5, 5)).toThrowError(/teffK/);
    expect(() => equilibriumTemperatureFromIrradianceK(Number.NaN, 0.3)).toThrowError(/finite/);
  });
});
