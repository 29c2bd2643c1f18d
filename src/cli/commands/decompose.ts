/**
 * `hesper decompose CURVE... --period DAYS --epoch BJD`: read one or several light-curve
 * files (CSV or FITS binary tables), fold them, mask the transit and separate the planet's phase term and eclipse from the star's ellipsoidal
 * and beaming signals (src/lightcurve/decompose.ts). Readable report by default, the
 * decomposition JSON with --json, and --system-out writes the
 * measurement block of a system file.
 */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import type { Command } from 'commander';
import { Option } from 'commander';
import { inputError } from '../../errors.ts';
import { ALL_QUALITY_BITS, DEFAULT_FLUX_COLUMNS, type CurveFileSummary } from '../../io/curve-fits.ts';
import { readLightCurveFiles, type CurveColumnOptions } from '../../io/curve-files.ts';
import { decompose, type Decomposition } from '../../lightcurve/decompose.ts';
import { DEFAULT_GAP_DAYS, DEFAULT_TREND_ORDER, MAX_TREND_ORDER } from '../../lightcurve/segments.ts';
import { loadSystemFile } from '../../io/system-file.ts';
import { type CurveOptions, type FileDecomposition, decomposeWithSystem } from '../curve-route.ts';
import type { EclipseGeometry, PhaseModel, ValueSigma } from '../../lightcurve/types.ts';
import type { CliIo } from '../io.ts';
import { intOption, numberOption } from '../options.ts';

interface DecomposeCliOptions {
  period?: number;
  system?: string;
  epoch?: number;
  radiusRatio?: number;
  scaledSemiMajorAxis?: number;
  inclination?: number;
  duration?: number;
  bins?: number;
  phaseModel: PhaseModel;
  offset?: boolean;
  predictedBeaming?: ValueSigma;
  predictedEllipsoidal?: ValueSigma;
  scaleErrors?: boolean;
  systemOut?: string;
  json?: boolean;
  trendOrder: number;
  gap: number;
  extension?: string;
  timeColumn?: string;
  fluxColumn?: string;
  fluxErrorColumn?: string;
  qualityColumn?: string;
  qualityMask?: number;
}

const HELP_AFTER = () => `
Model (flux normalised to the star, phase 0 at mid-transit, 0.5 at mid-eclipse):
  F = c0 + Ap L(phi) + S sin(2 pi phi) - E cos(4 pi phi) - D h(phi)
  Ap  planet's phase term, peak-to-trough (L: -cos(2 pi phi)/2, or the Lambert
      phase function scaled to unit peak-to-trough)
  S   sine term: Doppler beaming and/or the planet's phase offset
  E   ellipsoidal semi-amplitude;  D  eclipse depth, h the hidden fraction of the
      planet (two uniform disks, or a box of the given duration)
  The transit is masked. Each file, and each stretch of a file between gaps longer
  than --gap, is a segment with its own normalisation and a polynomial trend in time
  (Legendre terms up to --trend-order), fitted jointly with the signals above.

The sine term is one function for two signals: the star's beaming and the planet's
first-harmonic sine (its phase offset). Without --offset it is reported as beaming
and the planet's peak is held at eclipse. With --offset it is the planet's offset:
the beaming is fixed at --predicted-beaming if given (its sigma is carried into the
offset), otherwise the beaming term is absent and any real beaming shows up as an
eastward offset. The output says which was done.

Files: CSV (time,flux,flux_err or phase,flux,flux_err) or FITS binary tables as the
missions distribute them. FITS defaults: time TIME, as BJD = TIME + BJDREFI + BJDREFF
(or + BJDREF) from the header; flux ${DEFAULT_FLUX_COLUMNS.join(', else ')}; its error
the same name + _ERR; points with QUALITY & --quality-mask != 0 masked (every bit by
default); NaN rows dropped and counted; the flux divided by its median per file.

Geometry: --radius-ratio, --scaled-semi-major-axis and --inclination together, or
--duration (first to fourth contact) alone (--inclination may be added for the
Lambert term). Times and --epoch in days, one time system (e.g. BJD_TDB).
Exit codes: 0 success, 2 bad input (the message names the line or option), 1 other.`;

/** "VALUE" or "VALUE,SIGMA" in ppm. */
function valueSigmaOption(name: string): (text: string) => ValueSigma {
  return (text: string) => {
    const parts = text.split(',').map((s) => s.trim());
    const nums = parts.map(Number);
    if (parts.length > 2 || parts.some((p) => p === '') || nums.some((x) => !Number.isFinite(x)) || (nums[1] ?? 0) < 0) {
      throw inputError('invalid-input', `--${name}`, `--${name} ${text}: give PPM or PPM,SIGMA (finite numbers, sigma >= 0)`, text);
    }
    return { value: nums[0]!, sigma: nums[1] ?? 0 };
  };
}

function geometryFrom(o: DecomposeCliOptions): EclipseGeometry {
  const disks = { '--radius-ratio': o.radiusRatio, '--scaled-semi-major-axis': o.scaledSemiMajorAxis, '--inclination': o.inclination };
  if (o.duration !== undefined) {
    if (o.radiusRatio !== undefined || o.scaledSemiMajorAxis !== undefined) {
      throw inputError('invalid-input', '--duration', 'give either --duration or --radius-ratio with --scaled-semi-major-axis and --inclination, not both');
    }
    return o.inclination === undefined ? { kind: 'window', durationHours: o.duration } : { kind: 'window', durationHours: o.duration, inclinationDeg: o.inclination };
  }
  const missing = Object.entries(disks).filter(([, v]) => v === undefined).map(([k]) => k);
  if (missing.length > 0) {
    throw inputError('invalid-input', missing[0]!, `the eclipse geometry needs ${missing.join(', ')} (or give --duration HOURS instead)`);
  }
  return { kind: 'disks', radiusRatio: o.radiusRatio!, scaledSemiMajorAxis: o.scaledSemiMajorAxis!, inclinationDeg: o.inclination! };
}

export function registerDecompose(program: Command, io: CliIo): void {
  program
    .command('decompose')
    .description("fold a light curve and separate the planet's phase term and eclipse from the star's ellipsoidal and beaming signals")
    .argument('<curves...>', 'light-curve files, one per sector or quarter: CSV with a header time,flux,flux_err (days) or phase,flux,flux_err (folded), or FITS binary tables')
    .option('--period <days>', 'orbital period [days] (default with --system: planet.periodDays)', numberOption('period'))
    .option('--system <file>', 'system file: geometry, period and the predicted ellipsoidal and beaming signals come from it')
    .option('--epoch <bjd>', 'mid-transit time [days, same system as the time column]; not needed for a folded curve', numberOption('epoch'))
    .option('--radius-ratio <k>', 'Rp/R*', numberOption('radius-ratio'))
    .option('--scaled-semi-major-axis <a>', 'a/R*', numberOption('scaled-semi-major-axis'))
    .option('--inclination <deg>', 'orbital inclination [deg]', numberOption('inclination'))
    .option('--duration <hours>', 'total transit/eclipse duration [hours], instead of the disk geometry', numberOption('duration'))
    .option('--bins <n>', 'fit the curve binned into N equal phase bins (per segment, and per orbital cycle when a trend is fitted)', intOption('bins', 10, 1_000_000))
    .addOption(new Option('--phase-model <model>', "planet's phase term").choices(['cosine', 'lambert']).default('cosine'))
    .option('--offset', "fit the planet's phase offset (first-harmonic sine); see the beaming note below")
    .option('--predicted-beaming <ppm[,sigma]>', 'beaming predicted from the masses: fixes the beaming with --offset, else checked against the fit', valueSigmaOption('predicted-beaming'))
    .option('--predicted-ellipsoidal <ppm[,sigma]>', 'ellipsoidal amplitude predicted from the masses, checked against the fit', valueSigmaOption('predicted-ellipsoidal'))
    .option('--scale-errors', 'multiply the uncertainties by sqrt(reduced chi-square) when it exceeds 1')
    .option('--trend-order <n>', `order of each segment's polynomial trend in time (0 = normalisation only)`, intOption('trend-order', 0, MAX_TREND_ORDER), DEFAULT_TREND_ORDER)
    .option('--gap <days>', 'a gap longer than this starts a new segment [days]', numberOption('gap', 0), DEFAULT_GAP_DAYS)
    .option('--extension <name|n>', 'FITS: the extension holding the table (EXTNAME or number; default the first binary table with the time column)')
    .option('--time-column <name>', 'FITS: time column (default TIME)')
    .option('--flux-column <name>', `FITS: flux column (default ${DEFAULT_FLUX_COLUMNS.join(', else ')})`)
    .option('--flux-error-column <name>', 'FITS: flux-error column (default: the flux column + _ERR)')
    .option('--quality-column <name|none>', 'FITS: quality-flag column (default QUALITY when present; none = no masking)')
    .option('--quality-mask <bits>', 'FITS: a point is masked when QUALITY & BITS != 0 (decimal or 0x hex; default every bit; 0 = none)', qualityMaskOption)
    .option('--system-out <file>', 'write the measurement block of a system file (JSON) to FILE')
    .option('--json', 'print the decomposition JSON instead of the readable report')
    .addHelpText('after', HELP_AFTER())
    .action((files: string[], opts: DecomposeCliOptions) => {
      if (!(opts.gap > 0)) throw inputError('out-of-range', '--gap', `--gap ${opts.gap}: must be > 0 days`, opts.gap, '(0, inf)');
      const result = opts.system ? fromSystem(files, opts, io) : fromOptions(files, opts, io);
      if (opts.systemOut) {
        const target = path.resolve(io.cwd, opts.systemOut);
        try {
          writeFileSync(target, `${JSON.stringify(measurementBlock(result), null, 2)}\n`);
        } catch (e) {
          throw inputError('file-unreadable', '--system-out', `cannot write "${opts.systemOut}": ${(e as NodeJS.ErrnoException).code ?? 'error'}`, opts.systemOut);
        }
        io.err(`wrote the measurement block to ${opts.systemOut}`);
      }
      io.out(opts.json ? JSON.stringify(result, null, 2) : textReport(files.join(', '), result));
    });
}

/** "255", "0x3ff" or "all": the quality bits that mask a point. */
function qualityMaskOption(text: string): number {
  const t = text.trim().toLowerCase();
  if (t === 'all') return ALL_QUALITY_BITS;
  const n = /^0x[0-9a-f]+$/.test(t) ? Number.parseInt(t.slice(2), 16) : /^\d+$/.test(t) ? Number(t) : NaN;
  if (!Number.isSafeInteger(n)) throw inputError('invalid-input', '--quality-mask', `--quality-mask ${text}: give the bits as a whole number (decimal or 0x hex, e.g. 0x1bf), or all`, text);
  return n;
}

function columnOptions(o: DecomposeCliOptions): CurveColumnOptions {
  const c: CurveColumnOptions = {};
  if (o.extension !== undefined) c.extension = /^\d+$/.test(o.extension.trim()) ? Number(o.extension) : o.extension;
  if (o.timeColumn !== undefined) c.timeColumn = o.timeColumn;
  if (o.fluxColumn !== undefined) c.fluxColumn = o.fluxColumn;
  if (o.fluxErrorColumn !== undefined) c.fluxErrColumn = o.fluxErrorColumn;
  if (o.qualityColumn !== undefined) c.qualityColumn = o.qualityColumn.trim().toLowerCase() === 'none' ? null : o.qualityColumn;
  if (o.qualityMask !== undefined) c.qualityMask = o.qualityMask;
  return c;
}

function fromSystem(file: string[], opts: DecomposeCliOptions, io: CliIo): FileDecomposition {
  for (const [flag, v] of [['--radius-ratio', opts.radiusRatio], ['--scaled-semi-major-axis', opts.scaledSemiMajorAxis], ['--inclination', opts.inclination], ['--duration', opts.duration]] as const) {
    if (v !== undefined) throw inputError('invalid-input', flag, `${flag} and --system both give the geometry: use one`);
  }
  if (opts.predictedBeaming || opts.predictedEllipsoidal) {
    throw inputError('invalid-input', '--system', 'with --system the predicted signals come from the system masses; drop --predicted-beaming / --predicted-ellipsoidal');
  }
  const system = loadSystemFile(opts.system!, io.cwd);
  const curveOptions: CurveOptions = {
    phaseModel: opts.phaseModel, offset: opts.offset ?? false, columns: columnOptions(opts), trendOrder: opts.trendOrder, gapDays: opts.gap,
  };
  if (opts.period !== undefined) curveOptions.period = opts.period;
  if (opts.epoch !== undefined) curveOptions.epoch = opts.epoch;
  if (opts.bins !== undefined) curveOptions.bins = opts.bins;
  return decomposeWithSystem(system, file, curveOptions, io);
}

function fromOptions(file: string[], opts: DecomposeCliOptions, io: CliIo): FileDecomposition {
  if (opts.period === undefined) throw inputError('invalid-input', '--period', 'missing: give --period DAYS (or --system FILE with planet.periodDays)');
  const geometry = geometryFrom(opts);
  const { curve, files } = readLightCurveFiles(io.cwd, file, columnOptions(opts));
  if (curve.column === 'phase' && opts.epoch !== undefined) io.err('note: --epoch is not used: the curve is already folded');
  const d = decompose(curve, {
    periodDays: opts.period,
    ...(opts.epoch !== undefined ? { epochDays: opts.epoch } : {}),
    geometry,
    phaseModel: opts.phaseModel,
    fitOffset: opts.offset ?? false,
    ...(opts.bins !== undefined ? { bins: opts.bins } : {}),
    predicted: {
      ...(opts.predictedBeaming ? { beamingPpm: opts.predictedBeaming } : {}),
      ...(opts.predictedEllipsoidal ? { ellipsoidalPpm: opts.predictedEllipsoidal } : {}),
    },
    scaleErrors: opts.scaleErrors ?? false,
    trendOrder: opts.trendOrder,
    gapDays: opts.gap,
  });
  return { ...d, files };
}

const round = (x: number): number => Number(x.toPrecision(4));
const rounded = (q: ValueSigma): ValueSigma => ({ value: round(q.value), sigma: round(q.sigma) });

/**
 * The measurement block of a system file (its field names): only what the
 * fit measured. A beaming fixed from a prediction is an input, so it is left out.
 */
export function measurementBlock(r: Decomposition): { measurements: Record<string, ValueSigma> } {
  const m: Record<string, ValueSigma> = {};
  if (r.eclipseDepthPpm) m.eclipseDepthPpm = rounded(r.eclipseDepthPpm);
  m.phaseAmplitudePpm = rounded(r.phaseAmplitudePpm);
  if (r.phaseOffsetDeg) m.phaseOffsetDeg = rounded(r.phaseOffsetDeg);
  m.ellipsoidalAmplitudePpm = rounded(r.ellipsoidalAmplitudePpm);
  if (r.beamingAmplitudePpm && r.model.sineTerm === 'beaming') m.beamingAmplitudePpm = rounded(r.beamingAmplitudePpm);
  return { measurements: m };
}

function pm(q: ValueSigma | null, unit: string, digits = 1): string {
  if (!q) return 'not measured';
  const s = Number.isFinite(q.sigma) ? q.sigma.toFixed(digits) : 'unconstrained';
  return `${q.value.toFixed(digits)} +- ${s} ${unit}`.trimEnd();
}

function fileLine(f: CurveFileSummary): string {
  const drop = f.dropped;
  const parts = [`${f.points} of ${f.rows} rows used`];
  if (drop.quality > 0) parts.push(`${drop.quality} masked by ${f.columns?.quality ?? 'quality'} flags`);
  if (drop.nonFinite > 0) parts.push(`${drop.nonFinite} with NaN dropped`);
  if (drop.nonPositiveError > 0) parts.push(`${drop.nonPositiveError} with error <= 0 dropped`);
  if (f.format === 'fits' && f.columns) {
    parts.push(`${f.columns.time} + ${f.timeOffsetDays} d${f.timeSystem ? ` (${f.timeSystem})` : ''}, ${f.columns.flux} / median ${f.medianFlux!.toPrecision(6)}`);
  }
  return `  ${f.file} (${f.format === 'fits' ? `FITS ${f.extension}` : 'CSV'}): ${parts.join('; ')}`;
}

function segmentLine(k: number, s: Decomposition['segments'][number]): string {
  const span = s.start !== null && s.end !== null ? `${s.start.toFixed(3)}-${s.end.toFixed(3)}` : 'folded';
  const norm = s.normalisation ? `normalisation ${s.normalisation.value.toFixed(6)} +- ${s.normalisation.sigma.toExponential(1)}` : 'not fitted (no point left)';
  return `  ${String(k + 1).padStart(2)} ${s.file}  ${span}  ${s.points} points  trend order ${Math.max(s.trendOrder, 0)}  ${norm}`;
}

function textReport(file: string, r: FileDecomposition): string {
  const d = r.data;
  const lines: string[] = [];
  lines.push(`decomposition of ${file}: ${d.inputPoints} points, ${d.maskedTransitPoints} masked in transit, ${d.inEclipsePoints} in eclipse${d.bins !== null ? `, fitted in ${d.bins} bins` : ''}`);
  for (const f of r.files) lines.push(fileLine(f));
  lines.push(`baseline: ${r.segments.length} segment${r.segments.length === 1 ? '' : 's'}, ${r.trendTerms} trend term${r.trendTerms === 1 ? '' : 's'} (gap ${r.model.gapDays} d, trend order ${r.model.trendOrder})`);
  if (r.segments.length > 1) for (const [k, s] of r.segments.entries()) lines.push(segmentLine(k, s));
  lines.push(`model: ${r.model.phaseModel} phase term, ${r.model.offsetFitted ? 'offset fitted' : 'no offset'}, eclipse shape ${r.model.eclipseShape}, inclination ${r.model.inclinationDeg.toFixed(2)} deg`);
  lines.push('');
  const beamingLabel = r.model.sineTerm === 'offset-beaming-fixed' ? 'beaming (fixed)' : 'beaming';
  const rows: Array<[string, string, string]> = [
    ['eclipse depth', pm(r.eclipseDepthPpm, 'ppm'), ''],
    ['phase amplitude', pm(r.phaseAmplitudePpm, 'ppm'), 'peak-to-trough'],
    ['phase offset', pm(r.phaseOffsetDeg, 'deg'), r.phaseOffsetDeg ? 'positive = eastward, peak before eclipse' : 'held at 0 (no --offset)'],
    ['nightside flux', pm(r.nightsideFluxPpm, 'ppm'), 'eclipse depth minus peak-to-trough'],
    ['ellipsoidal', pm(r.ellipsoidalAmplitudePpm, 'ppm'), 'semi-amplitude'],
    [beamingLabel, r.beamingAmplitudePpm ? pm(r.beamingAmplitudePpm, 'ppm') : 'not fitted', r.beamingAmplitudePpm ? 'semi-amplitude' : 'absent: the sine term went to the offset'],
  ];
  for (const [name, value, note] of rows) lines.push(`  ${name.padEnd(18)} ${value.padEnd(24)} ${note}`.trimEnd());
  lines.push('');
  lines.push(`fit: reduced chi-square ${r.reducedChiSquare.toFixed(3)} (${r.degreesOfFreedom} dof), residual scatter ${r.residualPpm.toFixed(1)} ppm, ${r.points} points used`);
  lines.push('correlations:');
  const names = r.covariance.names;
  const m = r.covariance.matrix;
  names.forEach((n, i) => {
    const row = names.map((_, j) => {
      const c = m[i]![j]! / Math.sqrt(m[i]![i]! * m[j]![j]!);
      return (Number.isFinite(c) ? c.toFixed(2) : '-').padStart(6);
    });
    lines.push(`  ${n.padEnd(24)}${row.join('')}`);
  });
  const b = r.brightnessMap;
  lines.push('');
  lines.push('brightness map (first order, edge-on; Cowan & Agol 2008):');
  lines.push(`  hot-spot longitude  ${b.longitudeFitted ? pm(b.hotspotLongitudeDeg, 'deg east') : 'held at the substellar point (no --offset)'}`);
  lines.push(`  day-night contrast  ${b.dayNightContrast ? pm(b.dayNightContrast, '', 2) : 'not measured (no eclipse)'}`);
  if (b.maxBrightnessPpm && b.minBrightnessPpm) {
    lines.push(`  brightest/darkest   ${pm(b.maxBrightnessPpm, 'ppm')} / ${pm(b.minBrightnessPpm, 'ppm')} (as uniform-planet flux)`);
  }
  if (r.massCheck.length > 0) {
    lines.push('');
    lines.push('mass check (fitted vs predicted from the masses):');
    for (const c of r.massCheck) {
      lines.push(`  ${c.signal.padEnd(12)} ${pm(c.fittedPpm, 'ppm')} vs ${pm(c.predictedPpm, 'ppm')}: ${c.differenceSigma.toFixed(1)} sigma, ${c.status}`);
    }
  }
  lines.push('');
  lines.push('notes:');
  for (const n of r.notes) lines.push(`  - ${n}`);
  for (const f of r.files) for (const n of f.notes) lines.push(`  - ${f.file}: ${n}`);
  if (r.warnings.length > 0) {
    lines.push('warnings:');
    for (const w of r.warnings) lines.push(`  - ${w}`);
  }
  return lines.join('\n');
}
