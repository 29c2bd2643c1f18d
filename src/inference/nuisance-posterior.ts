/**
 * What the data say about the heat redistribution eps and the phase integral q: their
 * posteriors beside their priors (the nuisance draws are prior draws; the posterior
 * picks them by evidence weight), and a sentence on which q the data prefer, if any.
 * The data prefer a q when its posterior median moves by more than half the prior's
 * 68 % half-width or its 68 % interval is less than half as wide as the prior's (our
 * choice: a shift or narrowing a reader would notice).
 */
import type { Nuisance } from './nuisance.ts';
import { summarize, type Summary } from './summary.ts';

export interface NuisancePosterior {
  redistribution: { prior: Summary; posterior: Summary };
  phaseIntegral: { prior: Summary; posterior: Summary };
}

export function nuisancePosterior(draws: readonly Nuisance[], drawIndex: Int32Array): NuisancePosterior {
  const pick = (key: 'redistribution' | 'phaseIntegral') => {
    const prior = new Float64Array(draws.length);
    for (let i = 0; i < draws.length; i++) prior[i] = draws[i]![key];
    const posterior = new Float64Array(drawIndex.length);
    for (let k = 0; k < drawIndex.length; k++) posterior[k] = prior[drawIndex[k]!]!;
    return { prior: summarize(prior), posterior: summarize(posterior) };
  };
  return { redistribution: pick('redistribution'), phaseIntegral: pick('phaseIntegral') };
}

const f = (x: number) => Number(x.toPrecision(3)).toString();

/** Whether the posterior of a nuisance parameter differs from its prior (see the file comment). */
export function preferred(p: { prior: Summary; posterior: Summary }): boolean {
  const priorHalf = (p.prior.upper68 - p.prior.lower68) / 2;
  if (!(priorHalf > 0)) return false;
  const shift = Math.abs(p.posterior.median - p.prior.median);
  const narrower = p.posterior.upper68 - p.posterior.lower68 < priorHalf;
  return shift > 0.5 * priorHalf || narrower;
}

export function phaseIntegralSentence(n: NuisancePosterior): string {
  const q = n.phaseIntegral;
  const post = `${f(q.posterior.lower68)}-${f(q.posterior.upper68)}`;
  const prior = `${f(q.prior.lower68)}-${f(q.prior.upper68)}`;
  if (q.prior.upper68 - q.prior.lower68 <= 0) return `phase integral: fixed at q = ${f(q.prior.median)} by the assumptions.`;
  return preferred(q)
    ? `phase integral: the data prefer q = ${f(q.posterior.median)} (68 %: ${post}) over the prior's ${prior}.`
    : `phase integral: the data do not prefer any q within the prior (posterior 68 % ${post}, prior ${prior}).`;
}
