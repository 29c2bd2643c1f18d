import { describe, expect, it } from 'vitest';
import { bandFluxRatio, resolveBand } from '../../src/physics/bandpass.ts';
import {
  brightnessTemperatureK, nightsideFluxRatio, thermalEclipseDepth, thermalFluxRatioAtPhase, thermalPhaseAmplitude,
} from '../../src/physics/thermal.ts';

const DEG = Math.PI / 180;
const tess = resolveBand('tess');

describe('thermal eclipse depth', () => {
  it('is k^2 F_band(T_day) / F_band(T*)', () => {
    // derived from the band-flux ratio k^2 F(T_day) / F(T*)
    expect(thermalEclipseDepth(0.1, 2000, 5800, tess)).toBeCloseTo(0.01 * bandFluxRatio(tess, 2000, 5800), 18);
  });

  it('tends to the Rayleigh-Jeans ratio k^2 T_day / T* in a far-infrared band', () => {
    // Textbook Rayleigh-Jeans limit (B proportional to T for hc/lambda kT << 1); first correction
    // (x_p - x_*)/2 with x = hc/(lambda k T) (derived): at 1 mm, 1500 K vs 6000 K it is -3.6e-3.
    const mm = resolveBand({ tophatNm: [999000, 1000000] });
    const r = thermalEclipseDepth(0.1, 1500, 6000, mm) / (0.01 * (1500 / 6000));
    expect(r).toBeCloseTo(1 - 3.6e-3, 4);
  });

  it('gives a phase amplitude of (F_d - F_n) sin i, zero for a uniform planet', () => {
    const day = thermalEclipseDepth(0.1, 2200, 5800, tess);
    const night = nightsideFluxRatio(0.1, 1200, 5800, tess);
    expect(thermalPhaseAmplitude(0.1, 2200, 1200, 5800, 80 * DEG, tess)).toBeCloseTo((day - night) * Math.sin(80 * DEG), 18);
    expect(thermalPhaseAmplitude(0.1, 1500, 1500, 5800, 90 * DEG, tess)).toBe(0);
    // two-hemisphere model (common practice): full dayside at eclipse, nightside at transit
    expect(thermalFluxRatioAtPhase(0.1, 2200, 1200, 5800, 90 * DEG, 0.5, tess)).toBeCloseTo(day, 15);
    expect(thermalFluxRatioAtPhase(0.1, 2200, 1200, 5800, 90 * DEG, 0, tess)).toBeCloseTo(night, 15);
  });

  it('is zero for a 0 K nightside (eps = 0)', () => {
    expect(nightsideFluxRatio(0.1, 0, 5800, tess)).toBe(0);
  });
});

describe('brightness temperature', () => {
  it('inverts the thermal eclipse depth', () => {
    for (const t of [800, 1500, 2500, 4000]) {
      const depth = thermalEclipseDepth(0.1, t, 5800, tess);
      expect(brightnessTemperatureK(0.1, depth, 5800, tess) / t - 1).toBeCloseTo(0, 9);
    }
  });

  it('rejects depths no blackbody up to 1e5 K can give', () => {
    expect(() => brightnessTemperatureK(0.1, 10, 5800, tess)).toThrowError(/eclipseDepth/);
    expect(() => brightnessTemperatureK(0.1, -1e-4, 5800, tess)).toThrowError(/eclipseDepth/);
  });
});

describe('guards', () => {
  it('rejects bad radius ratios and temperatures', () => {
    expect(() => thermalEclipseDepth(1.3, 2000, 5800, tess)).toThrowError('radiusRatio = 1.3: must be in (0, 1)');
    expect(() => thermalEclipseDepth(0.1, -5, 5800, tess)).toThrowError(/daysideTempK/);
    expect(() => thermalEclipseDepth(0.1, 2000, 0, tess)).toThrowError(/starTeffK/);
    expect(() => thermalPhaseAmplitude(0.1, 2000, 1000, 5800, 4, tess)).toThrowError(/inclinationRad/);
  });
});
