// Test fixture: the committed ring-notch example configuration (a 6-unit ring on a radius-2 chip, ports "in" and "out").
import { type ConfigurationFile, configurationSchema, type SpectrumFile } from '@hexloom/contracts';
import committed from '../../../../../../examples/solver/ring-notch.configuration.json';

/** The example configuration, checked by the configuration schema. */
export const ringNotchContent = (): ConfigurationFile => configurationSchema.parse(committed);

/** A spectrum file with the given offsets (Hz from `referenceFrequencyHz`) and complex response; other fields plain. */
export function syntheticSpectrum(input: { offsetsHz: number[]; re: number[]; im: number[]; groupDelayPs?: number[]; fromName?: string; toName?: string; referenceFrequencyHz?: number }): SpectrumFile {
  const ref = input.referenceFrequencyHz ?? 193.4e12;
  const n = input.offsetsHz.length;
  const power = input.re.map((r, i) => r * r + (input.im[i] ?? 0) ** 2);
  return {
    schemaVersion: 1,
    kind: 'hexloom-spectrum',
    from: 'p-in',
    to: 'p-out',
    fromName: input.fromName ?? 'W11',
    toName: input.toName ?? 'E14',
    referenceFrequencyHz: ref,
    unitDelayS: 9.1e-12,
    method: 'direct-sum',
    run: { inputPort: 'p-in', steps: 10, residualEnergy: 0, converged: true, warning: null },
    powerBalance: { inputPort: 'p-in', chosen: {}, leakage: {}, lost: 0, residual: 0 },
    points: {
      frequencyHz: input.offsetsHz.map((f) => ref + f),
      offsetHz: [...input.offsetsHz],
      amplitudeDb: power.map((p) => (p > 0 ? 10 * Math.log10(p) : null)),
      phaseDeg: input.re.map((r, i) => (Math.atan2(input.im[i] ?? 0, r) * 180) / Math.PI),
      groupDelayPs: input.groupDelayPs ?? Array.from({ length: n }, () => 0),
      dispersionPsPerNm: Array.from({ length: n }, () => 0),
      re: [...input.re],
      im: [...input.im],
    },
  };
}
