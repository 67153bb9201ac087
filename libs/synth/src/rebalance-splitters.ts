/** Re-balances a splitter tree's ratios on the simulated chip, so leakage and loss leave every output the same power. */
import type { Circuit, Configuration, Mesh } from '@hexloom/mesh';
import { netlistFromMesh } from '@hexloom/solver';
import { balanceSplitters, combOutputs } from './balance-splitters.js';
import { transmissionsFrom } from './simulate-transmission.js';

/**
 * Simulates the power of every output at the carrier, reads each path's real transmission from it, sets the ratios
 * for equal power (see `balanceSplitters`) and repeats: the leakage each output sees changes a little with the ratios.
 */
export function rebalanceSplitters(mesh: Mesh, configuration: Configuration, circuit: Circuit, iterations = 3): { configuration: Configuration; circuit: Circuit } {
  const outputs = combOutputs(circuit);
  const input = circuit.paths[0]?.from;
  if (!input || !('port' in input) || outputs.length !== circuit.couplers.length + 1) return { configuration, circuit };
  let current = { configuration, circuit };
  for (let k = 0; k < iterations; k++) {
    const chip = netlistFromMesh({ mesh, configuration: current.configuration });
    const powers = transmissionsFrom(chip, chip.netlist, { from: input.port, to: outputs, offsetsHz: [0], impulse: { energyTolerance: 1e-14 } }).map((t) => t.powerDb[0] as number);
    const spread = Math.max(...powers) - Math.min(...powers);
    if (spread < 0.01) break;
    const next = balanceSplitters(mesh, current.configuration, current.circuit, powers);
    current = { configuration: next.configuration, circuit: next.circuit };
  }
  return current;
}
