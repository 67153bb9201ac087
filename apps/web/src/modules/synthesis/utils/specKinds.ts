// The spec kinds the drawer offers, in words, in the order of the contract.
import type { FilterSpecKind } from '@hexloom/contracts';

/** Each kind with a short label and a one-line description of what the server builds for it. */
export const SPEC_KINDS: { kind: FilterSpecKind; label: string; description: string }[] = [
  { kind: 'delay-line', label: 'Delay line', description: 'A path of a whole number of units between two ports.' },
  { kind: 'ttd-set', label: 'True-time-delay set', description: 'A splitter tree whose outputs are delayed by equal steps.' },
  { kind: 'ring-notch', label: 'Ring notch', description: 'An all-pass ring on a bus: one notch per FSR.' },
  { kind: 'add-drop', label: 'Add-drop ring', description: 'A ring between two buses: a band dropped to a second port.' },
  { kind: 'coupled-ring-bandpass', label: 'Coupled-ring band-pass', description: 'A chain of adjacent single-cell rings (Butterworth or Chebyshev).' },
  { kind: 'mzi-lattice', label: 'Mach–Zehnder lattice', description: 'N + 1 couplers and N arm pairs, designed by layer peeling.' },
  { kind: 'transversal', label: 'Transversal filter', description: 'The lattice with the polynomial of the given tap weights.' },
  { kind: 'allpass-equaliser', label: 'All-pass delay equaliser', description: 'All-pass rings in series on one bus, fitted to a delay target.' },
];
