import { describe, expect, it } from 'vitest';
import { KG_PER_MEARTH, KG_PER_MSUN, M_PER_AU, M_PER_RSUN, S_PER_DAY } from '../../src/physics/constants.ts';
import { periodFromSemiMajorAxisS, scaledSemiMajorAxis, semiMajorAxisFromPeriodM } from '../../src/physics/orbit.ts';

describe("Kepler's third law", () => {
  it("gives Earth's orbit about 1 au for one sidereal year", () => {
    // Sidereal year 365.256363 d (IAU / Astronomical Almanac, from memory); Earth's semi-major axis
    // about 1.000001 au (J2000 mean orbital elements, from memory): agreement to 1e-5 relative.
    const a = semiMajorAxisFromPeriodM(365.256363 * S_PER_DAY, KG_PER_MSUN, KG_PER_MEARTH);
    expect(Math.abs(a / M_PER_AU - 1)).toBeLessThan(1e-5);
  });

  it('inverts period and semi-major axis, and scales by the stellar radius', () => {
    const a = semiMajorAxisFromPeriodM(3 * S_PER_DAY, KG_PER_MSUN);
    expect(periodFromSemiMajorAxisS(a, KG_PER_MSUN) / (3 * S_PER_DAY)).toBeCloseTo(1, 13);
    expect(scaledSemiMajorAxis(M_PER_AU, M_PER_RSUN)).toBeCloseTo(215.032, 3); // derived: au / R_sun
    expect(() => semiMajorAxisFromPeriodM(-1, KG_PER_MSUN)).toThrowError(/periodS/);
  });
});
