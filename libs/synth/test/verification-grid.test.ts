// The verification grid resolves narrow delay peaks at band edges: the figures read what a very fine grid reads.
import { describe, expect, it } from 'vitest';
import { simulateTransmission, statsWithin, synthesise, type SynthesisSuccess } from '../src/index.js';
import { demoChip, DEMO_TECHNOLOGY } from './demo-chip.js';

describe('the verification of an eighth-order coupled-ring band-pass', () => {
  const chip = demoChip({ ...DEMO_TECHNOLOGY, lossPerGateDb: 0.02, extinctionDb: 45 });
  const r = synthesise({
    mesh: chip.mesh,
    configuration: chip.configuration,
    circuitId: 'bp',
    spec: { schemaVersion: 1, name: 'bp', spec: { kind: 'coupled-ring-bandpass', from: chip.west[6]!, to: chip.east[6]!, through: chip.west[9]!, response: 'butterworth', order: 8, bandwidthHz: 0.6e9, centreOffsetHz: 2e9 }, mask: { regions: [] } },
  });

  it('reads the in-band delay ripple and the mean in-band delay within 1 % of a 40 001-point grid over the band', () => {
    if (!r.ok) throw new Error(`${r.reason}: ${r.message}`);
    const v = (r as SynthesisSuccess).verification[0]!;
    const low = v.figures.bandLowHz as number;
    const high = v.figures.bandHighHz as number;
    const fine = simulateTransmission({ mesh: chip.mesh, configuration: r.configuration, from: v.from, to: v.to, offsetsHz: Array.from({ length: 40_001 }, (_, i) => low + ((high - low) * i) / 40_000) });
    const truth = statsWithin(fine, fine.groupDelayPs, low, high);
    // The delay of a high-order Butterworth band-pass peaks sharply at its band edges (common practice): the figure
    // must catch those peaks, and average the delay over frequency, not over however the samples fall.
    expect(Math.abs((v.figures.delayRippleInBandPs as number) - (truth.max - truth.min)) / (truth.max - truth.min)).toBeLessThan(0.01);
    const mean = fine.groupDelayPs.reduce((s, d) => s + d, 0) / fine.groupDelayPs.length;
    expect(Math.abs((v.figures.meanDelayInBandPs as number) - mean) / mean).toBeLessThan(0.01);
  }, 60_000);
});
