// The libs/mesh README example: make a mesh, place a notch ring and a delay line, check the result.
import { buildMesh, checkConfiguration, DEMO_TECHNOLOGY, emptyConfiguration, makeMeshDefinition, placeCircuit, type Configuration } from '@hexloom/mesh';

/** Runs the example; returns the configuration, the checker's answer and the ring's perimeter. */
export function readmeExample(): { configuration: Configuration; violations: number; ringUnits: number; delayUnits: number } {
  const definition = makeMeshDefinition({
    name: 'demo',
    shape: { kind: 'rectangle', rows: 8, columns: 12 },
    io: 'left-right',
    technology: DEMO_TECHNOLOGY,
  });
  const mesh = buildMesh(definition);
  let configuration = emptyConfiguration(definition, 'bar');

  const ring = placeCircuit(configuration, { kind: 'ring', id: 'notch', from: 'v(-1,2)n/g(-1,1)e', to: 'v(11,2)n/g(11,1)e', perimeterUnits: 10, kappa: 0.15 }, mesh);
  if (!ring.ok) throw new Error(`${ring.reason}: ${ring.message}`);
  configuration = ring.configuration;

  const delay = placeCircuit(configuration, { kind: 'delay-line', id: 'delay', from: 'v(-2,4)n/g(-2,3)e', to: 'v(10,4)n/g(10,3)e', lengthUnits: 40 }, mesh);
  if (!delay.ok) throw new Error(`${delay.reason}: ${delay.message}`);
  configuration = delay.configuration;

  const check = checkConfiguration(mesh, configuration);
  const ringPath = ring.circuit.paths.find((p) => p.role === 'ring')!;
  return { configuration, violations: check.violations.length, ringUnits: ringPath.steps.length + 1, delayUnits: delay.pathLengthsUnits[0]! };
}
