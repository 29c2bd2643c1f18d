/**
 * Errors are data: a machine `code`, and one or more issues that
 * each name the path of the offending field, the value and what is allowed.
 *
 * This file is the lowest layer: every other layer may import it, it imports nothing.
 * Every code raised anywhere in src/ must be listed in ERROR_CODES with its meaning
 * and the fix, so that the error catalogue in the README stays complete.
 */

export interface Issue {
  /** Dotted path of the field, e.g. "planet.radiusRatio" or "argument teffK". */
  path: string;
  /** Readable sentence: what is wrong and what is allowed. */
  message: string;
  /** The offending value, when there is one. */
  value?: unknown;
  /** The allowed range or set, in words, e.g. "(0, 1)" or "one of kepler, tess". */
  allowed?: string;
}

/** What kind of failure this is; decides the exit code and HTTP status. */
export type ErrorKind = 'input' | 'not-found' | 'conflict' | 'forbidden' | 'internal';

export class HesperError extends Error {
  readonly code: ErrorCode;
  readonly kind: ErrorKind;
  readonly issues: Issue[];

  constructor(code: ErrorCode, message: string, issues: Issue[] = [], kind: ErrorKind = 'input') {
    super(message);
    this.name = 'HesperError';
    this.code = code;
    this.kind = kind;
    this.issues = issues;
  }

  toJSON(): { code: string; message: string; issues: Issue[] } {
    return { code: this.code, message: this.message, issues: this.issues };
  }
}

/**
 * The error catalogue: every code with its meaning and the fix. Add a code here
 * before raising it; test/errors.test.ts checks that every code used in src/ is here.
 */
export const ERROR_CODES = {
  'not-finite': {
    meaning: 'A number was NaN or infinite.',
    fix: 'Give a finite number; check for empty cells or division by zero upstream.',
  },
  'out-of-range': {
    meaning: 'A number lies outside the range the formula or field allows.',
    fix: 'Check the value and its unit against the allowed range printed with the error.',
  },
  'invalid-input': {
    meaning: 'The input does not match the expected format (wrong type, missing field, unknown key).',
    fix: 'Correct the field named in the issue path; `hesper` prints each problem on its own line.',
  },
  'unknown-band': {
    meaning: 'The band name is not one of the built-in bands.',
    fix: 'Run `hesper bands` for the list, or give { "tophatNm": [min, max] } or a response curve.',
  },
  'bad-response-curve': {
    meaning: 'A band response curve is empty, not increasing in wavelength, or has negative or non-finite weights.',
    fix: 'Give at least two rows of wavelength_nm,weight with strictly increasing wavelengths and weights >= 0.',
  },
  'unknown-species': {
    meaning: 'The species has no condensation curve.',
    fix: 'Use one of the species listed in the message (e.g. Fe, Mg2SiO4, MgSiO3, Al2O3, H2O).',
  },
  'bad-unit': {
    meaning: 'A unit string could not be parsed or has the wrong dimension for the field.',
    fix: 'Use a unit of the right dimension, e.g. "au", "Rsun", "Rjup", "Rearth", "K", "ppm".',
  },
  'file-unreadable': {
    meaning: 'A file named in the input could not be read, or is not a regular file.',
    fix: 'Check the path (relative paths resolve against the system file) and the permissions.',
  },
  'file-unwritable': {
    meaning: 'An output file could not be written (missing folder, no permission, or it is the input file).',
    fix: 'Check the output path and its folder; give an output file other than the input.',
  },
  'bad-light-curve': {
    meaning: 'A light-curve file has a missing column (CSV or FITS), a non-numeric cell, a non-positive flux_err, a phase outside [-1, 1], times that are not strictly increasing, or no usable point.',
    fix: 'CSV: a header time,flux,flux_err (or phase,flux,flux_err) and one row per point with strictly increasing times; lines starting with # are skipped; the message names the line. FITS: name the columns to use (the message lists those present).',
  },
  'bad-fits': {
    meaning: 'A FITS file is malformed: truncated, a header card that is not 80-character ASCII, a missing END card or mandatory keyword, or sizes that do not fit the file.',
    fix: 'Download the file again or check that it is FITS; the message names the header, the card or keyword, and the problem.',
  },
  'bad-star-spectrum': {
    meaning: 'A stellar spectrum has a negative or non-finite flux, too few points, wavelengths that do not increase, or does not cover the band.',
    fix: 'Give rows wavelength_nm,flux (or wavelength_um,flux) with strictly increasing wavelengths, fluxes >= 0 in any flux-density unit, covering the whole band.',
  },
  'degenerate-fit': {
    meaning: 'A term of the light-curve model has no data (e.g. no points in the eclipse) or is a combination of the other terms.',
    fix: 'Check the phase coverage, the period, the epoch and the geometry; use fewer bins or drop the term named in the message.',
  },
  'no-convergence': {
    meaning: 'An iterative solver stopped at its iteration cap without reaching its tolerance.',
    fix: 'Report the input that caused it; the message gives the last residual.',
  },
  'no-posterior-support': {
    meaning: 'No nuisance draw reproduces the measurements: every likelihood is zero.',
    fix: 'Check the measurement and its uncertainty (a {min, max} measurement that no model reaches gives this), or widen the priors.',
  },
  'not-found': {
    meaning: 'No catalog entry or source has the id or key given.',
    fix: 'Run `hesper catalog list` (entries) or `hesper catalog bib` (sources) for the ids and keys that exist.',
  },
  'curated-row': {
    meaning: 'The catalog row is curated (from seeds/*.json) and cannot be edited or removed.',
    fix: 'Add a user entry with another id instead; curated rows change only through the seed files and `hesper catalog seed`.',
  },
  'duplicate-id': {
    meaning: 'An entry id or source key is already taken (in the catalog or earlier in the same input).',
    fix: 'Choose another id or key, or refer to the existing source by its key.',
  },
  'unknown-source': {
    meaning: 'An entry cites a source key that is not in the catalog.',
    fix: 'Cite an existing key (`hesper catalog bib` lists them) or give the full source record in the entry file.',
  },
  'bad-csv': {
    meaning: 'A catalog CSV file has a malformed header or rows; nothing was imported.',
    fix: 'Correct every row listed (by line number and column) and import again; `hesper catalog import --help` lists the columns.',
  },
  'bad-seed': {
    meaning: 'A curated seed file (seeds/*.json) is malformed; the catalog was not changed.',
    fix: 'Correct the field named in the issue (file, row id and field) and run `hesper catalog seed`.',
  },
  'bad-database': {
    meaning: 'The database file is not a hesper catalog, or was written by a newer hesper with migrations this one lacks.',
    fix: 'Point --db or HESPER_DB at another file, or update hesper; the file was not changed.',
  },
  'bad-json': {
    meaning: 'An HTTP request body is not valid JSON.',
    fix: 'Send one JSON value (UTF-8) with Content-Type: application/json; the message gives the position of the first fault.',
  },
  'unsupported-media-type': {
    meaning: 'An HTTP request body has a content type the route does not take.',
    fix: 'Send the body as JSON with the header Content-Type: application/json.',
  },
  'payload-too-large': {
    meaning: 'An HTTP request body is larger than the server accepts (1 MB).',
    fix: 'Send a smaller body: thin long sample lists or response curves; use `hesper interpret` or `hesper batch` for large inputs.',
  },
  'unknown-route': {
    meaning: 'No HTTP route has this method and path.',
    fix: 'See GET /api/openapi.json for the routes and their methods.',
  },
  'bad-host': {
    meaning: "An HTTP request names a Host the server does not answer for (a guard against DNS rebinding of the loopback server).",
    fix: 'Open the page at the address `hesper serve` printed (http://127.0.0.1:PORT or http://localhost:PORT).',
  },
  'cannot-listen': {
    meaning: 'The server could not listen on the host and port given (the port is in use, or the host is not an address of this machine).',
    fix: 'Choose another --port (0 picks a free one) or a --host this machine has (127.0.0.1 by default).',
  },
  'bad-batch-csv': {
    meaning: 'A batch CSV file has a malformed header (unknown, repeated or unpaired columns) or no rows.',
    fix: 'Correct the header as listed in `hesper batch --help`; rows with bad values are reported in the error column instead.',
  },
  'internal': {
    meaning: 'An unexpected failure inside hesper.',
    fix: 'Report it with the input that caused it; no data was changed.',
  },
} as const satisfies Record<string, { meaning: string; fix: string }>;

export type ErrorCode = keyof typeof ERROR_CODES;

/** One bad field, as an input error. */
export function inputError(code: ErrorCode, path: string, message: string, value?: unknown, allowed?: string): HesperError {
  const issue: Issue = { path, message };
  if (value !== undefined) issue.value = value;
  if (allowed !== undefined) issue.allowed = allowed;
  return new HesperError(code, `${path}: ${message}`, [issue], 'input');
}

function describe(value: number): string {
  return Number.isNaN(value) ? 'NaN' : String(value);
}

/** Reject NaN and +-Infinity. Returns the value for chaining. */
export function requireFinite(name: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw inputError('not-finite', name, `${name} = ${describe(value)}: must be a finite number`, describe(value), 'finite numbers');
  }
  return value;
}

export interface RangeBounds {
  min?: number;
  max?: number;
  /** Exclude the bound itself (open interval at that end). */
  minExclusive?: boolean;
  maxExclusive?: boolean;
}

function rangeText(b: RangeBounds): string {
  const lo = b.min === undefined ? '(-inf' : `${b.minExclusive ? '(' : '['}${b.min}`;
  const hi = b.max === undefined ? 'inf)' : `${b.max}${b.maxExclusive ? ')' : ']'}`;
  return `${lo}, ${hi}`;
}

/** Reject values that are not finite or lie outside the bounds. */
export function requireInRange(name: string, value: number, bounds: RangeBounds): number {
  requireFinite(name, value);
  const { min, max, minExclusive, maxExclusive } = bounds;
  const belowMin = min !== undefined && (minExclusive ? value <= min : value < min);
  const aboveMax = max !== undefined && (maxExclusive ? value >= max : value > max);
  if (belowMin || aboveMax) {
    const allowed = rangeText(bounds);
    throw inputError('out-of-range', name, `${name} = ${value}: must be in ${allowed}`, value, allowed);
  }
  return value;
}

/** Strictly positive and finite. */
export function requirePositive(name: string, value: number): number {
  return requireInRange(name, value, { min: 0, minExclusive: true });
}

/** Zero or positive and finite. */
export function requireNonNegative(name: string, value: number): number {
  return requireInRange(name, value, { min: 0 });
}
