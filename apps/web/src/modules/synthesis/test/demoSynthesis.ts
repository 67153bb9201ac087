// Invented fixtures for the synthesis drawer tests: the chip's ports, an accepted and a refused proposal.
import type { Proposal } from '@hexloom/contracts';
import { demoVersion } from '../../../test/demoChip.js';
import { DEMO_TEAM_ID } from '../../../test/demoTeam.js';
import type { ChipPort } from '../utils/portResolver.js';

export const SYNTH_CONFIGURATION_ID = '8b2c3d4e-5f6a-4b7c-9d8e-0f1a2b3c4d5e';
export const SYNTHESISE_ROUTE = `POST /api/teams/${DEMO_TEAM_ID}/configurations/${SYNTH_CONFIGURATION_ID}/versions/2/synthesise`;

const two = (k: number) => String(k).padStart(2, '0');

/** West ports W01..W34 and east ports E01..E34 of an invented 12 x 8 mesh; W02 and E02 are taken by another circuit. */
export const demoPorts: ChipPort[] = [
  ...Array.from({ length: 34 }, (_, k) => ({ id: `v(-1,${k})n/g(-1,${k})e`, label: `W${two(k + 1)}`, wiredTo: 'fibre', free: k !== 1 })),
  ...Array.from({ length: 34 }, (_, k) => ({ id: `v(12,${k})n/g(11,${k})e`, label: `E${two(k + 1)}`, wiredTo: k === 0 ? 'detector' : 'fibre', free: k !== 1 })),
];

const IN = 'v(0,0)n/g(0,0)ne';
const OUT = 'v(1,0)n/g(1,0)ne';

/** A ring notch of 6 units placed on a 6-unit bus, one output, one failed check of three, one note. */
export const acceptedProposal: Extract<Proposal, { ok: true }> = {
  ok: true,
  basedOnVersion: 2,
  content: { ...demoVersion.content, circuits: [] },
  circuit: {
    id: 'ring-notch-1',
    kind: 'ring',
    ports: [IN, OUT],
    paths: [
      { role: 'bus', from: { port: IN }, to: { port: OUT }, steps: ['g(0,0)e', 'g(1,0)e', 'g(2,0)e', 'g(3,0)e', 'g(4,0)e', 'g(5,0)e'].map((gate) => ({ gate, in: 'a0' as const, out: 'a1' as const })) },
    ],
    couplers: [{ gate: 'g(2,0)e', role: 'ring-coupler', kappa: 0.12, phaseRad: 0.4 }],
  },
  notes: [{ quantity: 'ring FSR', requested: 20e9, achieved: 18.3e9, unit: 'Hz', note: 'nearest realisable ring is 6 units (5.49 units asked)' }],
  design: { kind: 'ring-notch', perimeterUnits: 6, centreOffsetHz: 3e9 },
  verification: [
    {
      from: IN,
      fromName: 'W03',
      to: OUT,
      toName: 'E03',
      role: 'main',
      pass: false,
      checks: [
        { kind: 'target', quantity: 'notch depth', limit: 19, measured: 17.5, direction: 'at-least', margin: -1.5, pass: false, worstFrequencyHz: 3.01e9, unit: 'dB' },
        { kind: 'stop', quantity: 'rejection', limit: 15, measured: 17.5, direction: 'at-least', margin: 2.5, pass: true, worstFrequencyHz: 2.98e9, unit: 'dB' },
      ],
      figures: { notchDepthDb: 17.5, notchWidthHz: 1.291e9, insertionLossDb: 1.75 },
    },
  ],
  verdict: { pass: false, checks: 3, failed: 1 },
  others: [{ circuitId: 'delay-a', pass: true, failed: [] }],
  figures: {},
  specs: [],
};

/** The server could not place the circuit. */
export const refusedProposal: Extract<Proposal, { ok: false }> = {
  ok: false,
  reason: 'not-enough-free-area',
  message: 'mesh: no free ring of 6 units touches the bus between W03 and E03',
  notes: [],
};
