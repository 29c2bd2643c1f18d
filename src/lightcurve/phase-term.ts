/**
 * The planet's phase term as a column of the linear model, scaled so that its
 * coefficient is the peak-to-trough amplitude: L(phi) has its maximum at full phase
 * (phi = 0.5), its minimum at transit (phi = 0) and L(0.5) - L(0) = 1.
 *
 * - cosine: L = -cos(2 pi phi) / 2 (a first harmonic; common practice).
 * - lambert: L = Phi(alpha(phi)) / [Phi(90 deg - i) - Phi(90 deg + i)], with the Lambert
 *   phase function Phi and cos alpha = -sin i cos(2 pi phi) from src/physics/reflection.ts.
 *
 * For the offset and the brightness map the first-harmonic content of L is needed:
 * L(phi) = mean - h1 cos(2 pi phi) + (higher even terms), h1 = -2 integral_0^1 L cos(2 pi phi) dphi.
 * For the cosine h1 = 1/2 exactly; for the Lambert term it is integrated numerically.
 */
import { lambertPhaseFunction, phaseAngleRad } from '../physics/reflection.ts';
import type { PhaseModel } from './types.ts';

export interface PhaseTermShape {
  model: PhaseModel;
  /** L(phi): unit peak-to-trough, maximum at phi = 0.5. */
  value(phase: number): number;
  /** L(0.5), the value at full phase. */
  atFullPhase: number;
  /** Orbit average of L. */
  mean: number;
  /** h1: coefficient of -cos(2 pi phi) in the Fourier series of L. */
  firstHarmonic: number;
}

/** Midpoint nodes for the orbit averages; L is smooth and periodic, so this converges fast. */
const QUADRATURE_NODES = 4096;

export function phaseTermShape(model: PhaseModel, inclinationRad: number): PhaseTermShape {
  if (model === 'cosine') {
    return { model, value: (phase) => -0.5 * Math.cos(2 * Math.PI * phase), atFullPhase: 0.5, mean: 0, firstHarmonic: 0.5 };
  }
  const full = lambertPhaseFunction(phaseAngleRad(0.5, inclinationRad));
  const range = full - lambertPhaseFunction(phaseAngleRad(0, inclinationRad));
  const value = (phase: number): number => lambertPhaseFunction(phaseAngleRad(phase, inclinationRad)) / range;
  let sum = 0;
  let sumCos = 0;
  for (let j = 0; j < QUADRATURE_NODES; j++) {
    const phase = (j + 0.5) / QUADRATURE_NODES;
    const v = value(phase);
    sum += v;
    sumCos += v * Math.cos(2 * Math.PI * phase);
  }
  return { model, value, atFullPhase: full / range, mean: sum / QUADRATURE_NODES, firstHarmonic: (-2 * sumCos) / QUADRATURE_NODES };
}
