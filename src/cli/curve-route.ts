/**
 * The light-curve route shared by `decompose --system` and `interpret --curve`: the
 * system file gives the geometry, period and predicted mass signals; the curve gives
 * the measurements.
 */
import type { Command } from 'commander';
import { Option } from 'commander';
import { inputError } from '../errors.ts';
import { readLightCurveFiles, type CurveColumnOptions, type CurveFileSummary } from '../io/curve-files.ts';
import type { SystemInput } from '../io/system.ts';
import { predictFromSystem, withCurveMeasurements } from '../interpret/from-curve.ts';
import { decompose, type Decomposition } from '../lightcurve/decompose.ts';
import type { PhaseModel } from '../lightcurve/types.ts';
import type { CliIo } from './io.ts';
import { intOption, numberOption } from './options.ts';

export interface CurveOptions {
  curve?: string;
  period?: number;
  epoch?: number;
  bins?: number;
  phaseModel?: PhaseModel;
  offset?: boolean;
  /** FITS columns and quality mask. */
  columns?: CurveColumnOptions;
  trendOrder?: number;
  gapDays?: number;
}

/** A decomposition with what reading each light-curve file did. */
export type FileDecomposition = Decomposition & { files: CurveFileSummary[] };

/** Options of `interpret` for the light-curve route. */
export function addCurveOptions(cmd: Command): Command {
  return cmd
    .option('--curve <file>', 'light curve, CSV (time,flux,flux_err or phase,flux,flux_err) or a FITS binary table (mission defaults, as in decompose): its decomposition replaces the measurements')
    .option('--epoch <bjd>', 'mid-transit time for --curve [days, the time system of the curve] (default: planet.transitEpochBjd)', numberOption('epoch'))
    .option('--period <days>', 'orbital period for --curve [days] (default: planet.periodDays)', numberOption('period', 0))
    .option('--bins <n>', 'fit the --curve binned into N phase bins', intOption('bins', 10, 1_000_000))
    .addOption(new Option('--phase-model <model>', "planet's phase term for --curve").choices(['cosine', 'lambert']))
    .option('--offset', "fit the planet's phase offset in --curve (the beaming is then fixed at its prediction)");
}

/** Decomposes one or several light-curve files (CSV or FITS) with the geometry and mass predictions of a system. */
export function decomposeWithSystem(system: SystemInput, file: string | readonly string[], opts: CurveOptions, io: CliIo): FileDecomposition {
  const prediction = predictFromSystem(system);
  const periodDays = opts.period ?? prediction.periodDays;
  if (periodDays === undefined) {
    throw inputError('invalid-input', '--period', 'the light curve needs the orbital period: give --period DAYS or planet.periodDays in the system file');
  }
  const { curve, files } = readLightCurveFiles(io.cwd, typeof file === 'string' ? [file] : file, opts.columns ?? {});
  const epoch = opts.epoch ?? system.planet.transitEpochBjd;
  if (curve.column === 'time' && epoch === undefined) {
    throw inputError('invalid-input', '--epoch', 'a time series needs the mid-transit epoch: give --epoch BJD or planet.transitEpochBjd in the system file (or a folded phase,flux,flux_err curve)');
  }
  const d = decompose(curve, {
    periodDays,
    ...(epoch !== undefined ? { epochDays: epoch } : {}),
    geometry: prediction.geometry,
    phaseModel: opts.phaseModel ?? 'cosine',
    fitOffset: opts.offset ?? false,
    ...(opts.bins !== undefined ? { bins: opts.bins } : {}),
    ...(opts.trendOrder !== undefined ? { trendOrder: opts.trendOrder } : {}),
    ...(opts.gapDays !== undefined ? { gapDays: opts.gapDays } : {}),
    predicted: {
      ...(prediction.beamingPpm ? { beamingPpm: prediction.beamingPpm } : {}),
      ...(prediction.ellipsoidalPpm ? { ellipsoidalPpm: prediction.ellipsoidalPpm } : {}),
    },
  });
  return { ...d, files };
}

/** The system with the measurements of its light curve, and the decomposition's warnings on stderr. */
export function systemFromCurve(system: SystemInput, opts: CurveOptions, io: CliIo): SystemInput {
  if (!opts.curve) return system;
  const d = decomposeWithSystem(system, opts.curve, opts, io);
  for (const w of d.warnings) io.err(`light curve: ${w}`);
  return withCurveMeasurements(system, d, opts.curve);
}
