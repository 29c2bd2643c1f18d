/**
 * A catalog value as a geometric-albedo interval:
 * - geometric: as is;
 * - bond, spherical: divided by the phase integral q over the system's q range
 *   (A_B = q A_g): [min / q_max, max / q_min];
 * - surface (hemispherical) reflectance r: a Lambert sphere, A_g = 2 r / 3 (Lambert
 *   sphere A_g = 2/3 for r = 1, exact: integrate the Lambert phase function);
 * - single-scattering albedo w: A_g(w) of a semi-infinite isotropic atmosphere
 *   (Chandrasekhar H-function, src/physics/h-function.ts); A_g rises with w.
 */
import type { CatalogEntry } from '../catalog/index.ts';
import type { Dist } from '../io/distribution.ts';
import { isotropicGeometricAlbedo } from '../physics/h-function.ts';

export interface ConvertedValue {
  range: [number, number];
  nominal: number;
  conversion: string;
}

/** Lower/upper ends of a distribution: the 95 % range for Gaussian forms (+-1.96 sigma), the support otherwise. */
export function distRange(d: Dist): { min: number; max: number; central: number } {
  const Z95 = 1.959963984540054; // Phi^-1(0.975), common practice
  switch (d.kind) {
    case 'fixed': return { min: d.value, max: d.value, central: d.value };
    case 'normal': return { min: d.mean - Z95 * d.sigma, max: d.mean + Z95 * d.sigma, central: d.mean };
    case 'split-normal': return { min: d.mode - Z95 * d.minus, max: d.mode + Z95 * d.plus, central: d.mode };
    case 'uniform': return { min: d.min, max: d.max, central: 0.5 * (d.min + d.max) };
    case 'upper-limit': return { min: 0, max: d.limit, central: 0.5 * d.limit };
    case 'samples': {
      const s = [...d.values].sort((a, b) => a - b);
      return { min: s[0]!, max: s[s.length - 1]!, central: s[Math.floor(s.length / 2)]! };
    }
  }
}

/** The phase-integral range used for Bond and spherical values, inside the file's allowed [0.5, 2]. */
export function phaseIntegralRange(q: Dist): { min: number; max: number; central: number } {
  const r = distRange(q);
  const clip = (x: number) => Math.min(2, Math.max(0.5, x));
  return { min: clip(r.min), max: clip(r.max), central: clip(r.central) };
}

const f2 = (x: number) => Number(x.toPrecision(3)).toString();

export function toGeometricAlbedo(entry: CatalogEntry, phaseIntegral: Dist): ConvertedValue {
  const { valueMin: lo, valueMax: hi, valueNominal: nom } = entry;
  switch (entry.quantity) {
    case 'geometric':
      return { range: [lo, hi], nominal: nom, conversion: 'geometric albedo as given' };
    case 'bond':
    case 'spherical': {
      const q = phaseIntegralRange(phaseIntegral);
      const qText = q.min === q.max ? `q = ${f2(q.min)}` : `q = ${f2(q.min)}-${f2(q.max)}`;
      return {
        range: [lo / q.max, hi / q.min],
        nominal: nom / q.central,
        conversion: `${entry.quantity === 'bond' ? 'Bond' : 'spherical'} albedo divided by the phase integral, ${qText}`,
      };
    }
    case 'surface':
      return { range: [(2 * lo) / 3, (2 * hi) / 3], nominal: (2 * nom) / 3, conversion: 'surface reflectance r as a Lambert sphere, A_g = 2r/3' };
    case 'single-scattering': {
      const g = (w: number) => isotropicGeometricAlbedo(Math.min(1, Math.max(0, w)));
      return {
        range: [g(lo), g(hi)],
        nominal: g(nom),
        conversion: 'single-scattering albedo w through A_g(w) of a semi-infinite isotropic-scattering atmosphere (Chandrasekhar H-function)',
      };
    }
  }
}
