/** The spectra of a configuration between port pairs: the one simulation the server routes and the browser worker run. */
import type { ConfigurationFile, FrequencyGridBody, SpectrumFile } from '@hexloom/contracts';
import { buildMesh, type Mesh } from '@hexloom/mesh';
import { impulseResponse, type ImpulseResponse, netlistFromMesh, powerBalance, spectrumFromImpulse, toSpectrumFile, outputPortIndex } from '@hexloom/solver';
import { SynthInputError } from './synth-input-error.js';

/** Two ports of a chip, each by id or label. */
export type PortPair = { from: string; to: string };

export type SimulateConfigurationInput = {
  content: ConfigurationFile;
  pairs: readonly PortPair[];
  grid: FrequencyGridBody;
  /** The mesh of `content.mesh` when the caller has built it already (the server checks its size first; a worker keeps it between requests). */
  mesh?: Mesh;
  /** Most unit-delay steps of an impulse run; a loop that decays slower is answered with the solver's warning. */
  maxImpulseSteps?: number;
};

/** The port id of `ref` (a port id or a label) on `mesh`, or null when the chip has no such port. */
export function resolveMeshPort(mesh: Mesh, ref: string): string | null {
  const index = mesh.portIndex.get(ref);
  const port = index === undefined ? undefined : mesh.ports[index];
  return port ? port.id : null;
}

/**
 * One spectrum file per pair, in order, ports named by the chip's labels: the impulse response of each input port
 * is run once (fast route, unit-delay domain) and read at every output asked of it, then transformed on `grid`.
 * @throws SynthInputError naming the reference when a port is neither an id nor a label of the chip.
 */
export function simulateConfiguration(input: SimulateConfigurationInput): SpectrumFile[] {
  const { content, pairs, grid } = input;
  const mesh = input.mesh ?? buildMesh(content.mesh);
  const portOf = (ref: string, field: string): string => {
    const id = resolveMeshPort(mesh, ref);
    if (id === null) throw new SynthInputError(`synth: "${ref}" (${field}) is not a port id or label of this chip`);
    return id;
  };
  const resolved = pairs.map((p, i) => ({ from: portOf(p.from, `pairs.${i}.from`), to: portOf(p.to, `pairs.${i}.to`) }));
  const chip = netlistFromMesh({ mesh, configuration: content });
  const impulses = new Map<string, ImpulseResponse>();
  const name = (id: string): string => mesh.ports[mesh.portIndex.get(id) ?? -1]?.label ?? id;
  return resolved.map(({ from, to }) => {
    const ir = impulses.get(from) ?? impulseResponse(chip.netlist, from, input.maxImpulseSteps === undefined ? {} : { maxSteps: input.maxImpulseSteps });
    impulses.set(from, ir);
    const h = ir.outputs[outputPortIndex(chip.netlist, to)];
    if (!h) throw new SynthInputError(`synth: no impulse response for output ${to}`);
    const spectrum = spectrumFromImpulse({ impulse: h, grid, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
    const run = { inputPort: from, steps: ir.steps, residualEnergy: ir.residualEnergy, converged: ir.converged, warning: ir.warning };
    return toSpectrumFile({ from, to, spectrum, run, powerBalance: powerBalance(chip.netlist, ir, [to]) }, { from: name(from), to: name(to) }) as SpectrumFile;
  });
}
