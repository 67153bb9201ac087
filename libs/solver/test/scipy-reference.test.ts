// Frequency response and group delay against scipy.signal.freqz and scipy.signal.group_delay on the same h[n].
import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { impulseResponse, spectrumFromImpulse } from '../src/index.js';
import { addDropRing, allPassRing } from './fixtures.js';

const T_U = 9.1063e-12;
const F0 = 193.4e12;

/** Runs Debian's scipy (python3-scipy 1.10) on h[n] at angular frequencies w (rad/sample). */
function scipyResponse(re: Float64Array, im: Float64Array, w: number[]): { hRe: number[]; hIm: number[]; gd: number[] } {
  const script = [
    'import json, sys, numpy as np',
    'from scipy import signal',
    'd = json.load(sys.stdin)',
    'h = np.array(d["re"]) + 1j * np.array(d["im"])',
    'w = np.array(d["w"])',
    '_, H = signal.freqz(h, 1, worN=w)',
    '_, gd = signal.group_delay((h, [1.0]), w=w)',
    'json.dump({"hRe": H.real.tolist(), "hIm": H.imag.tolist(), "gd": gd.tolist()}, sys.stdout)',
  ].join('\n');
  const out = execFileSync('/usr/bin/python3', ['-c', script], { input: JSON.stringify({ re: [...re], im: [...im], w }), encoding: 'utf8' });
  return JSON.parse(out) as { hRe: number[]; hIm: number[]; gd: number[] };
}

describe('against scipy.signal', () => {
  for (const [name, net, port] of [
    ['an under-coupled all-pass ring', allPassRing(0.1, 0.25), 0],
    ['the drop port of an add-drop ring', addDropRing(0.2, 0.15, 0.1), 1],
  ] as const) {
    it(`matches freqz and group_delay for ${name}, by FFT and by direct sum`, () => {
      const ir = impulseResponse(net, 'in', { energyTolerance: 1e-20 });
      const h = ir.outputs[port]!;
      const fft = spectrumFromImpulse({ impulse: h, grid: { kind: 'fsr', points: 512 }, unitDelayS: T_U, referenceFrequencyHz: F0 });
      const span = spectrumFromImpulse({ impulse: h, grid: { kind: 'span', startOffsetHz: -2e9, stopOffsetHz: 3e9, points: 101 }, unitDelayS: T_U, referenceFrequencyHz: F0 });
      // One scipy run for both grids: starting Python and importing scipy is most of the cost.
      const w = [fft, span].flatMap((s) => [...s.offsetsHz].map((f) => 2 * Math.PI * f * T_U));
      const ref = scipyResponse(h.re, h.im, w);
      let k = 0;
      for (const s of [fft, span]) {
        s.offsetsHz.forEach((_, i) => {
          // scipy.signal.freqz evaluates sum h[n] e^{-j w n}; group_delay returns samples (units of T_u).
          expect(Math.hypot(s.re[i]! - ref.hRe[k]!, s.im[i]! - ref.hIm[k]!)).toBeLessThan(1e-11);
          expect(s.groupDelayS[i]! / T_U).toBeCloseTo(ref.gd[k]!, 7);
          k++;
        });
      }
    });
  }
});
