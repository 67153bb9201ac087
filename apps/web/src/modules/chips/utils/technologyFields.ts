// The fields of the technology form: words, shown units and their scale to the SI values of the chip JSON.

/** Keys of the technology form, one per number of the technology profile. */
export type TechnologyFieldKey =
  | 'unitLengthUm'
  | 'groupIndex'
  | 'referenceFrequencyHz'
  | 'lossPerGateDb'
  | 'bendLossDb'
  | 'extinctionDb'
  | 'piPowerW'
  | 'resistanceOhm'
  | 'maxPowerW'
  | 'maxVoltageV'
  | 'couplerSigmaRad'
  | 'phaseSigmaRad';

/** One field: `path` in the technology profile, `scale` SI units per shown unit (1e12 for THz). */
export type TechnologyField = { key: TechnologyFieldKey; label: string; unit: string; scale: number; path: string; optional?: boolean; help?: string };

/** Every field, grouped in reading order: waveguide, losses, phase shifters, tolerances. */
export const TECHNOLOGY_FIELDS: readonly TechnologyField[] = [
  { key: 'unitLengthUm', label: 'Unit length', unit: 'µm', scale: 1, path: 'unitLengthUm', help: 'One gate plus its corner bend.' },
  { key: 'groupIndex', label: 'Group index', unit: '', scale: 1, path: 'groupIndex' },
  { key: 'referenceFrequencyHz', label: 'Reference (carrier) frequency', unit: 'THz', scale: 1e12, path: 'referenceFrequencyHz' },
  { key: 'lossPerGateDb', label: 'Insertion loss per gate', unit: 'dB', scale: 1, path: 'lossPerGateDb' },
  { key: 'bendLossDb', label: 'Extra loss of a boundary bend', unit: 'dB', scale: 1, path: 'bendLossDb' },
  { key: 'extinctionDb', label: 'Extinction in bar and cross', unit: 'dB', scale: 1, path: 'extinctionDb' },
  { key: 'piPowerW', label: 'Heater power for a π phase shift', unit: 'W', scale: 1, path: 'phaseShifter.piPowerW' },
  { key: 'resistanceOhm', label: 'Heater resistance', unit: 'Ω', scale: 1, path: 'phaseShifter.resistanceOhm' },
  { key: 'maxPowerW', label: 'Largest heater power', unit: 'W', scale: 1, path: 'phaseShifter.maxPowerW' },
  { key: 'maxVoltageV', label: 'Largest heater voltage', unit: 'V', scale: 1, path: 'phaseShifter.maxVoltageV' },
  { key: 'couplerSigmaRad', label: 'Coupler spread (standard deviation)', unit: 'rad', scale: 1, path: 'tolerance.couplerSigmaRad', optional: true, help: 'For yield studies; leave both spreads empty to omit them.' },
  { key: 'phaseSigmaRad', label: 'Phase spread (standard deviation)', unit: 'rad', scale: 1, path: 'tolerance.phaseSigmaRad', optional: true },
];
