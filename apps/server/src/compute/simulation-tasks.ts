/** Solver work on a version's content as pure functions of plain data: spectra, mask checks, S-matrices, transmissions. */
import type { ConfigurationFile, FrequencyGridBody, MaskCheckAnswer, MaskCheckBody, SimulateBody, SpectrumFile } from '@hexloom/contracts';
import { gridOffsetsHz, netlistFromMesh, sMatrix, type SMatrix, unitDelayS } from '@hexloom/solver';
import { checkMask, responseFigures, simulateConfiguration, simulateTransmission, type Transmission } from '@hexloom/synth';
import { buildChipMesh } from '../chips/build-chip-mesh.js';
import { resolvePort } from './resolve-port.js';

/** Unit-delay steps a server impulse run may take: a loop that decays slower is answered with the solver's warning. */
export const SERVER_MAX_IMPULSE_STEPS = 20_000;

/** The spectrum file of `body.from` -> `body.to` on `body.grid`, ports named by the chip's labels (the browser's worker runs the same function). */
export function simulateSpectrum(content: ConfigurationFile, body: SimulateBody): SpectrumFile {
  const mesh = buildChipMesh(content.mesh);
  // Resolved here first so an unknown port is the server's 422 naming the body field.
  const pair = { from: resolvePort(mesh, body.from, 'from'), to: resolvePort(mesh, body.to, 'to') };
  const [spectrum] = simulateConfiguration({ content, mesh, pairs: [pair], grid: body.grid, maxImpulseSteps: SERVER_MAX_IMPULSE_STEPS });
  if (!spectrum) throw new Error('simulateSpectrum: the solver answered no spectrum');
  return spectrum;
}

/** Offsets (Hz from f0) of a grid on this chip. */
export function gridOffsets(content: ConfigurationFile, grid: FrequencyGridBody): number[] {
  const { unitLengthUm, groupIndex } = content.mesh.technology;
  return Array.from(gridOffsetsHz(grid, unitDelayS({ unitLengthUm, groupIndex })));
}

/** Power and group delay of the whole chip from `fromRef` to `toRef` at the given offsets (Hz from f0). */
export function transmission(content: ConfigurationFile, fromRef: string, toRef: string, offsetsHz: readonly number[]): Transmission {
  const mesh = buildChipMesh(content.mesh);
  return simulateTransmission({ mesh, configuration: content, from: resolvePort(mesh, fromRef, 'from'), to: resolvePort(mesh, toRef, 'to'), offsetsHz, impulse: { maxSteps: SERVER_MAX_IMPULSE_STEPS } });
}

/** Mask report and the quoted figures of the response on the grid. */
export function maskCheckAnswer(content: ConfigurationFile, body: MaskCheckBody): MaskCheckAnswer {
  const response = transmission(content, body.from, body.to, gridOffsets(content, body.grid));
  const report = checkMask(response, body.mask.regions);
  const f = responseFigures(response);
  return {
    ...report,
    figures: { insertionLossDb: f.insertionLossDb, peakFrequencyHz: f.peakFrequencyHz, bandwidth3dBHz: f.bandwidth3dBHz, rejectionDb: f.rejectionDb, delayRippleIn3dBBandPs: f.delayRippleIn3dBBandPs },
  };
}

/** S-matrix between ports (ids or labels) on a grid, with each port described by label, id and wiring. */
export function sMatrixOf(content: ConfigurationFile, portRefs: readonly string[], grid: FrequencyGridBody): { matrix: SMatrix; described: string[] } {
  const mesh = buildChipMesh(content.mesh);
  const ports = portRefs.map((p, i) => resolvePort(mesh, p, `ports.${i}`));
  const chip = netlistFromMesh({ mesh, configuration: content });
  const matrix = sMatrix(chip.netlist, { ports, grid, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz, impulse: { maxSteps: SERVER_MAX_IMPULSE_STEPS } });
  const described = ports.map((id) => {
    const port = mesh.ports[mesh.portIndex.get(id) ?? -1];
    return port ? `${port.label ?? port.id} (${port.id}, ${port.wiredTo})` : id;
  });
  return { matrix, described };
}
