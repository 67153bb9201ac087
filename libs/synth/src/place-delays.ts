/** Places delay lines and true-time-delay sets: whole-unit lengths of the right parity, balanced splitters. */
import { placeCircuit, routeCircuit, vertexPosition, type Circuit, type Configuration, type Mesh } from '@hexloom/mesh';
import { balanceSplitters } from './balance-splitters.js';
import { chooseDelayUnits } from './delay-design.js';
import type { CircuitDesign } from './design-circuit.js';
import { lengthenPlan, planDelaySet } from './plan-delay-set.js';
import type { RealisationNote } from './realisation-note.js';

type DelayLine = Extract<CircuitDesign, { kind: 'delay-line' }>;
type DelaySet = Extract<CircuitDesign, { kind: 'ttd-set' }>;

/** A placed delay circuit, or why it cannot be placed (with notes such as the nearest realisable set). */
export type DelayPlacement = { ok: true; configuration: Configuration; circuit: Circuit; notes: RealisationNote[] } | { ok: false; reason: string; message: string; notes: RealisationNote[] };

type PlaceArgs = { mesh: Mesh; configuration: Configuration; circuitId: string; region: { region?: string[] }; unitDelayS: number };

const ps = (s: number): string => `${(s * 1e12).toFixed(2)} ps`;

/** A delay line of the whole number of units nearest the request, of the parity of every path between its ports. */
export function placeDelayLine(args: PlaceArgs, design: DelayLine, from: string, to: string): DelayPlacement {
  const { mesh, configuration, circuitId, region, unitDelayS } = args;
  const notes: RealisationNote[] = [];
  const shortest = routeCircuit(mesh, configuration.circuits, { kind: 'path', id: circuitId, from, to, ...region });
  if (!shortest.ok) return { ...shortest, notes };
  const minUnits = shortest.pathLengthsUnits[0] ?? 0;
  const choice = chooseDelayUnits({ requestedS: design.delayS, unitDelayS, minUnits, toleranceS: design.toleranceS });
  if (choice.errorS !== 0) notes.push({ quantity: 'delay', requested: design.delayS * 1e12, achieved: choice.achievedS * 1e12, unit: 'ps', note: `${choice.units} units: paths between these ports have ${minUnits % 2 === 0 ? 'even' : 'odd'} lengths of at least ${minUnits} units${choice.withinTolerance ? '' : '; outside the tolerance'}` });
  const r = placeCircuit(configuration, { kind: 'delay-line', id: circuitId, from, to, lengthUnits: choice.units, ...region }, mesh);
  if (!r.ok) return { ...r, notes };
  return { ok: true, configuration: r.configuration, circuit: r.circuit, notes };
}

/** Free ports of the wanted parity nearest `port` on the chip (to suggest instead of an output of the other parity). */
function portsOfParityNear(args: PlaceArgs, from: string, port: string, parity: number, taken: ReadonlySet<string>): string[] {
  const { mesh } = args;
  const at = vertexPosition(mesh.ports[mesh.portIndex.get(port) ?? -1]?.site ?? '');
  const used = new Set(args.configuration.circuits.flatMap((c) => c.ports));
  return mesh.ports
    .filter((p) => !used.has(p.id) && !taken.has(p.id) && p.id !== mesh.ports[mesh.portIndex.get(from) ?? -1]?.id)
    .map((p) => ({ p, d: Math.hypot(vertexPosition(p.site).x - at.x, vertexPosition(p.site).y - at.y) }))
    .sort((a, b) => a.d - b.d)
    .slice(0, 12)
    .filter(({ p }) => {
      const r = routeCircuit(mesh, args.configuration.circuits, { kind: 'path', id: 'parity-probe', from, to: p.id });
      return r.ok && (r.pathLengthsUnits[0] ?? 0) % 2 === parity;
    })
    .slice(0, 2)
    .map(({ p }) => p.label ?? p.id);
}

/**
 * A 1xN delay set: lengths planned for every output's parity (or a refusal naming the nearest realisable set and
 * ports of the right parity), a splitter tree routed with common extra length until it fits, and split ratios
 * balanced for each branch's loss.
 */
export function placeDelaySet(args: PlaceArgs, design: DelaySet, from: string, outputs: readonly string[]): DelayPlacement {
  const { mesh, configuration, circuitId, region, unitDelayS } = args;
  const notes: RealisationNote[] = [];
  const minima: number[] = [];
  for (const port of outputs) {
    const r = routeCircuit(mesh, configuration.circuits, { kind: 'path', id: circuitId, from, to: port, ...region });
    if (!r.ok) return { ...r, notes };
    minima.push(r.pathLengthsUnits[0] ?? 0);
  }
  const plan = planDelaySet({ stepS: design.stepS, baseS: design.baseS, toleranceS: design.toleranceS, unitDelayS, minima });
  const realised = plan.units.map((u, k) => `${outputs[k]} ${u} units = ${ps(u * unitDelayS)} (asked ${ps(plan.requestedS[k] as number)})`).join(', ');
  if (!plan.withinTolerance) {
    const parities = minima.map((m) => m % 2);
    const even = outputs.filter((_o, k) => parities[k] === 0);
    const odd = outputs.filter((_o, k) => parities[k] === 1);
    let hint = '';
    if (even.length > 0 && odd.length > 0) {
      const [minority, parity] = even.length < odd.length ? [even, 1] : [odd, 0];
      const taken = new Set(outputs.map((o) => mesh.ports[mesh.portIndex.get(o) ?? -1]?.id ?? o));
      const swaps = minority.map((o) => `${o} -> ${portsOfParityNear(args, from, o, parity, taken).join(' or ') || 'none free'}`);
      hint = ` Paths from ${from} to ${even.join(', ')} have even lengths and to ${odd.join(', ')} odd ones (the lattice is bipartite), so steps of ${ps(design.stepS)} cannot all be met; ports of the other parity near them: ${swaps.join('; ')}.`;
    }
    notes.push(...plan.units.map((u, k) => ({ quantity: `nearest realisable delay to ${outputs[k]}`, requested: (plan.requestedS[k] as number) * 1e12, achieved: u * unitDelayS * 1e12, unit: 'ps', note: `${u} units` })));
    return { ok: false, reason: 'delay-set-unrealisable', message: `the nearest realisable set misses the requests by up to ${ps(plan.maxErrorS)}, more than the ${ps(design.toleranceS)} tolerance: ${realised}.${hint}`, notes };
  }
  notes.push(...plan.units.flatMap((u, k) => (Math.abs(plan.errorsS[k] as number) > 1e-15 ? [{ quantity: `delay to ${outputs[k]}`, requested: (plan.requestedS[k] as number) * 1e12, achieved: u * unitDelayS * 1e12, unit: 'ps', note: `${u} units (whole units of the parity of every path to this port)` }] : [])));
  let lastFailure: DelayPlacement | undefined;
  for (const extra of design.baseS !== undefined ? [0] : [0, 2, 4, 6, 10, 16, 24, 34, 48]) {
    const lengths = lengthenPlan(plan, extra, unitDelayS);
    const r = placeCircuit(configuration, { kind: 'splitter-tree', id: circuitId, from, outputs: outputs.map((port, k) => ({ port, delayUnits: lengths.units[k] as number })), ...region }, mesh);
    if (!r.ok) {
      lastFailure = { ...r, notes };
      continue;
    }
    if (extra > 0) notes.push({ quantity: 'common delay', requested: null, achieved: extra * unitDelayS * 1e12, unit: 'ps', note: `${extra} more units on every output so that the splitter tree fits next to the other circuits (the steps are unchanged)` });
    const balanced = balanceSplitters(mesh, r.configuration, r.circuit);
    return { ok: true, configuration: balanced.configuration, circuit: balanced.circuit, notes };
  }
  return lastFailure ?? { ok: false, reason: 'not-enough-free-area', message: 'no splitter tree tried', notes };
}
