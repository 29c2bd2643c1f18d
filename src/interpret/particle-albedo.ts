/**
 * The single-scattering albedo a thick cloud would need: A_g(w) of a semi-infinite
 * isotropic-scattering atmosphere (src/physics/h-function.ts) inverted at the A_g
 * posterior's 16th, 50th and 84th percentiles (A_g(w) is monotonic, so these are the
 * percentiles of the required w). Set beside the catalog's particle (Mie)
 * single-scattering albedos: an entry "reaches" the requirement when its largest value
 * is at least the lower 68 % bound.
 * Real cloud grains scatter forward (asymmetry parameter g = 0.5-0.9 for micron-sized condensate grains in Mie calculations, e.g. Kitzmann & Heng 2018, MNRAS 475, 94),
 * which lowers A_g at a given w, so the isotropic requirement is a lower bound on w.
 */
import type { Summary } from '../inference/summary.ts';
import { conservativeIsotropicGeometricAlbedo, singleScatteringAlbedoFor } from '../physics/h-function.ts';
import type { MatchedEntry } from './match.ts';
import type { ParticleReach, RequiredSingleScatteringAlbedo } from './types.ts';

/** Categories whose single-scattering entries are free particles (not surface parameters such as Hapke's w of a regolith). */
const PARTICLE_CATEGORIES = new Set(['cloud', 'haze', 'ice']);

const round = (x: number) => Number(x.toPrecision(4));

export function requiredSingleScatteringAlbedo(ag: Summary, matched: readonly MatchedEntry[]): RequiredSingleScatteringAlbedo {
  const lo = singleScatteringAlbedoFor(ag.lower68);
  const mid = singleScatteringAlbedoFor(ag.median);
  const hi = singleScatteringAlbedoFor(ag.upper68);
  const top = conservativeIsotropicGeometricAlbedo();
  const particles = matched.filter((m) => m.entry.quantity === 'single-scattering' && (PARTICLE_CATEGORIES.has(m.entry.category) || m.entry.condensate !== null));
  const need = lo.singleScatteringAlbedo;
  const reach = (m: MatchedEntry): ParticleReach => ({
    id: m.entry.id,
    name: m.entry.name,
    condensate: m.entry.condensate,
    singleScatteringAlbedoMin: m.entry.valueMin,
    singleScatteringAlbedoMax: m.entry.valueMax,
    withinRange: m.entry.valueMax >= need && m.entry.valueMin <= hi.singleScatteringAlbedo,
    status: m.candidate.status,
  });
  const rank = { consistent: 0, marginal: 1, untested: 2, excluded: 3 } as const;
  const reachedBy = particles
    .filter((m) => m.entry.valueMax >= need)
    .map(reach)
    .sort((a, b) => Number(b.withinRange) - Number(a.withinRange) || rank[a.status] - rank[b.status] || b.singleScatteringAlbedoMax - a.singleScatteringAlbedoMax);
  const notReached = particles.filter((m) => m.entry.valueMax < need).map(reach);
  const above = ag.upper68 > top;
  const note = lo.aboveConservativeLimit
    ? `even conservative isotropic scatterers (w = 1) give only A_g = ${top.toFixed(3)}, below the whole 68 % interval: strongly backscattering particles, Rayleigh scattering or a bright surface are needed`
    : above
      ? `the upper part of the 68 % interval exceeds A_g = ${top.toFixed(3)} of conservative isotropic scatterers (w = 1)`
      : 'for a semi-infinite cloud of isotropic scatterers; forward-scattering grains need a higher w for the same A_g, so this is a lower bound';
  return {
    lower68: round(lo.singleScatteringAlbedo),
    median: round(mid.singleScatteringAlbedo),
    upper68: round(hi.singleScatteringAlbedo),
    aboveConservativeLimit: above,
    conservativeGeometricAlbedo: round(top),
    reachedBy,
    notReached,
    note,
  };
}
