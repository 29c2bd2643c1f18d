/**
 * `hesper decompose CURVE.csv --period DAYS --epoch BJD`: fold a light curve, mask the
 * transit and separate the planet's phase term and eclipse from the star's ellipsoidal
 * and beaming signals (src/lightcurve/decompose.ts). Readable report by default, the
 * decomposition JSON with --json, and --system-out writes the
 * measurement block of a system file.
 */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import type { Command } from 'commander';
import { Option } from 'commander';
import { inputError } from '../../errors.ts';
import { readCurveCsv } from '../../io/curve-csv.ts';
import { decompose, type Decomposition } from '../../lightcurve/decompose.ts';
import { loadSystemFile } from '../../io/system-file.ts';
import { type CurveOptions, decomposeWithSystem } from '../curve-route.ts';
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
}

const HELP_AFTER = `
Model (flux normalised to the star, phase 0 at mid-transit, 0.5 at mid-eclipse):
  F = c0 + Ap L(phi) + S sin(2 pi phi) - E cos(4 pi phi) - D h(phi)
  Ap  planet's phase term, peak-to-trough (L: -cos(2 pi phi)/2, or the Lambert
      phase function scaled to unit peak-to-trough)
  S   sine term: Doppler beaming and/or the planet's phase offset
  E   ellipsoidal semi-amplitude;  D  eclipse depth, h the hidden fraction of the
      planet (two uniform disks, or a box of the given duration)
  The transit is masked.

The sine term is one function for two signals: the star's beaming and the planet's
first-harmonic sine (its phase offset). Without --offset it is reported as beaming
and the planet's peak is held at eclipse. With --offset it is the planet's offset:
the beaming is fixed at --predicted-beaming if given (its sigma is carried into the
offset), otherwise the beaming term is absent and any real beaming shows up as an
eastward offset. The output says which was done.

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
    .argument('<curve>', 'CSV with a header time,flux,flux_err (days) or phase,flux,flux_err (folded); # lines are comments')
    .option('--period <days>', 'orbital period [days] (default with --system: planet.periodDays)', numberOption('period'))
    .option('--system <file>', 'system file: geometry, period and the predicted ellipsoidal and beaming signals come from it')
    .option('--epoch <bjd>', 'mid-transit time [days, same system as the time column]; not needed for a folded curve', numberOption('epoch'))
    .option('--radius-ratio <k>', 'Rp/R*', numberOption('radius-ratio'))
    .option('--scaled-semi-major-axis <a>', 'a/R*', numberOption('scaled-semi-major-axis'))
    .option('--inclination <deg>', 'orbital inclination [deg]', numberOption('inclination'))
    .option('--duration <hours>', 'total transit/eclipse duration [hours], instead of the disk geometry', numberOption('duration'))
    .option('--bins <n>', 'fit the curve binned into N equal phase bins', intOption('bins', 10, 1_000_000))
    .addOption(new Option('--phase-model <model>', "planet's phase term").choices(['cosine', 'lambert']).default('cosine'))
    .option('--offset', "fit the planet's phase offset (first-harmonic sine); see the beaming note below")
    .option('--predicted-beaming <ppm[,sigma]>', 'beaming predicted from the masses: fixes the beaming with --offset, else checked against the fit', valueSigmaOption('predicted-beaming'))
    .option('--predicted-ellipsoidal <ppm[,sigma]>', 'ellipsoidal amplitude predicted from the masses, checked against the fit', valueSigmaOption('predicted-ellipsoidal'))
    .option('--scale-errors', 'multiply the uncertainties by sqrt(reduced chi-square) when it exceeds 1')
    .option('--system-out <file>', 'write the measurement block of a system file (JSON) to FILE')
    .option('--json', 'print the decomposition JSON instead of the readable report')
    .addHelpText('after', HELP_AFTER)
    .action((file: string, opts: DecomposeCliOptions) => {
      const result = opts.system ? fromSystem(file, opts, io) : fromOptions(file, opts, io);
      if (opts.systemOut) {
        const target = path.resolve(io.cwd, opts.systemOut);
        try {
          writeFileSync(target, `${JSON.stringify(measurementBlock(result), null, 2)}\n`);
        } catch (e) {
          throw inputError('file-unreadable', '--system-out', `cannot write "${opts.systemOut}": ${(e as NodeJS.ErrnoException).code ?? 'error'}`, opts.systemOut);
        }
        io.err(`wrote the measurement block to ${opts.systemOut}`);
      }
      io.out(opts.json ? JSON.stringify(result, null, 2) : textReport(file, result));
    });
}

function fromSystem(file: string, opts: DecomposeCliOptions, io: CliIo): Decomposition {
  for (const [flag, v] of [['--radius-ratio', opts.radiusRatio], ['--scaled-semi-major-axis', opts.scaledSemiMajorAxis], ['--inclination', opts.inclination], ['--duration', opts.duration]] as const) {
    if (v !== undefined) throw inputError('invalid-input', flag, `${flag} and --system both give the geometry: use one`);
  }
  if (opts.predictedBeaming || opts.predictedEllipsoidal) {
    throw inputError('invalid-input', '--system', 'with --system the predicted signals come from the system masses; drop --predicted-beaming / --predicted-ellipsoidal');
  }
  const system = loadSystemFile(opts.system!, io.cwd);
  const curveOptions: CurveOptions = { phaseModel: opts.phaseModel, offset: opts.offset ?? false };
  if (opts.period !== undefined) curveOptions.period = opts.period;
  if (opts.epoch !== undefined) curveOptions.epoch = opts.epoch;
  if (opts.bins !== undefined) curveOptions.bins = opts.bins;
  return decomposeWithSystem(system, file, curveOptions, io);
}

function fromOptions(file: string, opts: DecomposeCliOptions, io: CliIo): Decomposition {
  if (opts.period === undefined) throw inputError('invalid-input', '--period', 'missing: give --period DAYS (or --system FILE with planet.periodDays)');
  const geometry = geometryFrom(opts);
  const curve = readCurveCsv(io.cwd, file);
  if (curve.column === 'phase' && opts.epoch !== undefined) io.err('note: --epoch is not used: the curve is already folded');
  return decompose(curve, {
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
  });
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

function textReport(file: string, r: Decomposition): string {
  const d = r.data;
  const lines: string[] = [];
  lines.push(`decomposition of ${file}: ${d.inputPoints} points, ${d.maskedTransitPoints} masked in transit, ${d.inEclipsePoints} in eclipse${d.bins !== null ? `, fitted in ${d.bins} bins` : ''}`);
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
  if (r.warnings.length > 0) {
    lines.push('warnings:');
    for (const w of r.warnings) lines.push(`  - ${w}`);
  }
  return lines.join('\n');
}
