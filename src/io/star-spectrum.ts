/**
 * `star.spectrum` of the system file: `{ "file": "s.csv" }` (CLI only; wavelength_nm,flux
 * or wavelength_um,flux) or `{ "table": [[nm, flux], ...] }`, validated and checked to
 * cover the band. Problems are added to the system file's issues under star.spectrum.
 */
import { HesperError, type Issue } from '../errors.ts';
import type { Band } from '../physics/bandpass.ts';
import {
  parseSpectrumCsv, requireSpectrumCoversBand, spectrumFromPairsNm, validateSpectrumTable, type StellarSpectrum,
} from '../physics/star-spectrum.ts';
import type { SystemFile } from './system-schema.ts';

type SpectrumSpec = NonNullable<SystemFile['star']['spectrum']>;

export function readStarSpectrum(
  spec: SpectrumSpec, band: Band, issues: Issue[], readText: ((fieldPath: string, file: string) => string) | undefined,
): StellarSpectrum | undefined {
  try {
    let spectrum: StellarSpectrum;
    if ('file' in spec) {
      if (!readText) {
        issues.push({ path: 'star.spectrum.file', message: 'spectrum files are read by the CLI only; give the spectrum inline as {"table": [[nm, flux], ...]}' });
        return undefined;
      }
      const text = readText('star.spectrum.file', spec.file);
      spectrum = spectrumFromPairsNm(parseSpectrumCsv(text, spec.file, 'star.spectrum.file'), spec.file);
    } else {
      spectrum = spectrumFromPairsNm(validateSpectrumTable(spec.table, spec.unit, 'star.spectrum.table'), 'inline table');
    }
    requireSpectrumCoversBand(spectrum, band, 'star.spectrum');
    return spectrum;
  } catch (e) {
    if (!(e instanceof HesperError)) throw e;
    issues.push(...e.issues);
    return undefined;
  }
}
