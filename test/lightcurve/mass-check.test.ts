import { describe, expect, it } from 'vitest';
import { checkMassEffects } from '../../src/lightcurve/mass-check.ts';

// Amplitudes here are invented test inputs; the check is a comparison, so only the
// differences in sigma matter (derived by hand beside each case).
describe('checkMassEffects', () => {
  it('is quiet when fit and prediction agree within 3 sigma', () => {
    const r = checkMassEffects({
      fitted: { ellipsoidalPpm: { value: 12, sigma: 2 }, beamingPpm: { value: 3, sigma: 1.5 } },
      predicted: { ellipsoidalPpm: { value: 10, sigma: 1 }, beamingPpm: { value: 2, sigma: 0.3 } },
    });
    expect(r.warnings).toEqual([]);
    expect(r.checks.map((c) => c.status)).toEqual(['consistent', 'consistent']);
    // derived: (12 - 10) / sqrt(2^2 + 1^2) = 0.894
    expect(r.checks[0]!.differenceSigma).toBeCloseTo(2 / Math.sqrt(5), 12);
  });

  it('names the mass first when both signals are off in the same direction', () => {
    const r = checkMassEffects({
      fitted: { ellipsoidalPpm: { value: 30, sigma: 2 }, beamingPpm: { value: 8, sigma: 1 } },
      predicted: { ellipsoidalPpm: { value: 10, sigma: 1 }, beamingPpm: { value: 2, sigma: 0.3 } },
    });
    expect(r.checks.map((c) => c.status)).toEqual(['higher', 'higher']);
    expect(r.checks[0]!.causes[0]).toMatch(/planet mass larger/);
    expect(r.checks[1]!.causes[0]).toMatch(/planet mass larger/);
    expect(r.warnings).toHaveLength(2);
    expect(r.warnings[0]).toMatch(/ellipsoidal amplitude 30.0 \+- 2.0 ppm is higher than the 10.0 \+- 1.0 ppm predicted/);
  });

  it('names limb or gravity darkening first when only the ellipsoidal signal is off', () => {
    const r = checkMassEffects({
      fitted: { ellipsoidalPpm: { value: 2, sigma: 1 }, beamingPpm: { value: 2, sigma: 1 } },
      predicted: { ellipsoidalPpm: { value: 10, sigma: 1 }, beamingPpm: { value: 2, sigma: 0.3 } },
    });
    // derived: (2 - 10)/sqrt(2) = -5.7 sigma
    expect(r.checks[0]!.status).toBe('lower');
    expect(r.checks[0]!.causes[0]).toMatch(/limb or gravity darkening/);
    expect(r.checks[0]!.causes.join(' ')).toMatch(/blended companion/);
    expect(r.checks[0]!.causes.join(' ')).toMatch(/mass smaller/);
  });

  it('names the phase offset first when only the beaming is off and no offset was fitted', () => {
    const input = {
      fitted: { ellipsoidalPpm: { value: 10, sigma: 1 }, beamingPpm: { value: 12, sigma: 1 } },
      predicted: { ellipsoidalPpm: { value: 10, sigma: 1 }, beamingPpm: { value: 2, sigma: 0.3 } },
    };
    const r = checkMassEffects(input);
    expect(r.checks[1]!.causes[0]).toMatch(/eastward phase offset/);
    const withOffset = checkMassEffects({ ...input, offsetFitted: true });
    expect(withOffset.checks[1]!.causes.join(' ')).not.toMatch(/phase offset/);
    expect(withOffset.checks[1]!.causes[0]).toMatch(/mass larger/);
  });

  it('checks only what has both a fit and a prediction, and honours the threshold', () => {
    const r = checkMassEffects({ fitted: { ellipsoidalPpm: { value: 14, sigma: 1 } }, predicted: { ellipsoidalPpm: { value: 10, sigma: 0 }, beamingPpm: { value: 1, sigma: 0 } } });
    expect(r.checks).toHaveLength(1);
    expect(r.checks[0]!.status).toBe('higher');
    const lax = checkMassEffects({ fitted: { ellipsoidalPpm: { value: 14, sigma: 1 } }, predicted: { ellipsoidalPpm: { value: 10, sigma: 0 } }, thresholdSigma: 5 });
    expect(lax.checks[0]!.status).toBe('consistent');
    expect(() => checkMassEffects({ fitted: { ellipsoidalPpm: { value: Number.NaN, sigma: 1 } }, predicted: { ellipsoidalPpm: { value: 1, sigma: 1 } } })).toThrow(/fitted.ellipsoidalPpm.value/);
  });
});
