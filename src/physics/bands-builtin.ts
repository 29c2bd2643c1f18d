/**
 * Built-in bands. None is a tabulated instrument response: each is a top-hat or a
 * trapezoid built from published coverage only, so every one is `approximate: true`
 * (the source and how far it was checked are given per band). For precise
 * work users give the tabulated response as a CSV file or an inline array.
 */

export type BandShape = 'top-hat' | 'trapezoid' | 'tabulated';
export type Provenance = 'checked' | 'secondary' | 'computed' | 'memory';

export interface BuiltinBandDef {
  readonly id: string;
  readonly label: string;
  readonly shape: BandShape;
  /** Response points [nm, weight]; zero outside the first and last point. */
  readonly pointsNm: ReadonlyArray<readonly [number, number]>;
  /** Half-maximum wavelengths [nm] where the shape has them. */
  readonly halfMaxNm: readonly [number, number];
  readonly source: string;
  readonly status: Provenance;
  readonly note: string;
}

function tophat(minNm: number, maxNm: number): Array<[number, number]> {
  return [[minNm, 1], [maxNm, 1]];
}

/** Top-hat spanning a filter's FWHM around its centre. */
function fwhmTophat(centreNm: number, fwhmNm: number): Array<[number, number]> {
  return tophat(centreNm - fwhmNm / 2, centreNm + fwhmNm / 2);
}

export const BUILTIN_BAND_DEFS: readonly BuiltinBandDef[] = [
  {
    id: 'kepler',
    label: 'Kepler',
    shape: 'trapezoid',
    // Zero at 420 and 900 nm, flat from 440 to 780 nm: half maximum at 430 and 840 nm.
    pointsNm: [[420, 0], [440, 1], [780, 1], [900, 0]],
    halfMaxNm: [430, 840],
    source: 'Van Cleve & Caldwell 2016, Kepler Instrument Handbook',
    status: 'checked',
    note: 'half-maximum 430-840 nm checked; total extent 420-900 nm from memory; trapezoid, not the tabulated response',
  },
  {
    id: 'tess',
    label: 'TESS',
    shape: 'top-hat',
    pointsNm: tophat(600, 1000),
    halfMaxNm: [600, 1000],
    source: 'Ricker et al. 2015, JATIS 1, 014003',
    status: 'checked',
    note: '600-1000 nm, centred near Cousins I; top-hat, not the tabulated response',
  },
  {
    id: 'cheops',
    label: 'CHEOPS',
    shape: 'top-hat',
    pointsNm: tophat(400, 1050),
    halfMaxNm: [400, 1050],
    source: 'ESA CHEOPS mission description; Benz et al. 2021, Exp. Astron. 51, 109',
    status: 'checked',
    note: '0.4-1.05 um checked (ESA); Benz et al. quote ~0.33-1.1 um (memory); top-hat',
  },
  {
    id: 'most',
    label: 'MOST',
    shape: 'top-hat',
    pointsNm: tophat(350, 750),
    halfMaxNm: [350, 750],
    source: 'Walker et al. 2003 (MOST mission paper)',
    status: 'memory',
    note: '~350-750 nm from memory (papers also quote 400-700 nm); top-hat',
  },
  {
    id: 'corot',
    label: 'CoRoT white light',
    shape: 'top-hat',
    pointsNm: tophat(400, 1000),
    halfMaxNm: [400, 1000],
    source: 'Auvergne et al. 2009 (CoRoT in-flight performance)',
    status: 'memory',
    note: '~400-1000 nm from memory; top-hat',
  },
  {
    id: 'V',
    label: 'Johnson V',
    shape: 'top-hat',
    pointsNm: fwhmTophat(551, 88),
    halfMaxNm: [507, 595],
    source: 'Bessell 1979; standard filter tables',
    status: 'checked',
    note: 'top-hat over the FWHM (88 nm) around 551 nm; approximate table values',
  },
  {
    id: 'R',
    label: 'Cousins R',
    shape: 'top-hat',
    pointsNm: fwhmTophat(658, 138),
    halfMaxNm: [589, 727],
    source: 'Bessell 1979; standard filter tables',
    status: 'checked',
    note: 'top-hat over the FWHM (138 nm) around 658 nm; approximate table values',
  },
  {
    id: 'I',
    label: 'Cousins I',
    shape: 'top-hat',
    pointsNm: fwhmTophat(806, 149),
    halfMaxNm: [731.5, 880.5],
    source: 'Bessell 1979; standard filter tables',
    status: 'checked',
    note: 'top-hat over the FWHM (149 nm) around 806 nm; approximate table values',
  },
];
