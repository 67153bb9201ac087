/** The mutable free/used state of gates, waveguides and ports that the router searches in. */
import type { Mesh } from './mesh.js';
import { stepStateAndChannel, type ResolvedCircuit, type ResolvedStep } from './resolve-circuit.js';

const SPLIT = 3;

/**
 * Occupancy of the chip while routing. `state[g]`: 0 free, 1 bar, 2 cross, 3 split (whole gate
 * taken); `channel[g * 2 + c]`: how many traversals use waveguide c (0 or 1 when valid).
 */
export class RouteSpace {
  readonly state: Uint8Array;
  readonly uses: Uint16Array;
  readonly channel: Uint8Array;
  readonly portUsed: Uint8Array;
  /** Gates the current request may use (region, dead gates and reserved gates applied). */
  readonly allowed: Uint8Array;

  constructor(
    readonly mesh: Mesh,
    circuits: readonly ResolvedCircuit[] = [],
    options: { region?: ReadonlySet<number> | undefined; ignoreDead?: boolean; reserved?: ReadonlySet<number> } = {},
  ) {
    const n = mesh.gates.length;
    this.state = new Uint8Array(n);
    this.uses = new Uint16Array(n);
    this.channel = new Uint8Array(n * 2);
    this.portUsed = new Uint8Array(mesh.ports.length);
    this.allowed = new Uint8Array(n);
    for (const g of mesh.gates) {
      const inRegion = !options.region || g.sideCells.some((c) => c >= 0 && options.region!.has(c));
      this.allowed[g.index] = inRegion && (options.ignoreDead || !g.dead) && !options.reserved?.has(g.index) ? 1 : 0;
    }
    for (const r of circuits) {
      for (const g of r.couplerGates) this.state[g] = SPLIT;
      for (const p of r.paths) {
        for (const t of [p.from, p.to]) if (t.kind === 'port') this.portUsed[t.port] = 1;
        for (const s of p.steps) if (this.state[s.gate] !== SPLIT) this.forceUse(s);
      }
      for (const id of r.circuit.ports) {
        const p = mesh.portIndex.get(id);
        if (p !== undefined) this.portUsed[p] = 1;
      }
    }
  }

  private forceUse(s: ResolvedStep): void {
    const { state, channel } = stepStateAndChannel(s.inPort, s.outPort);
    if (this.channel[s.gate * 2 + channel]! > 0 && this.state[s.gate] === state + 1) return; // a shared trunk
    this.channel[s.gate * 2 + channel]! += 1;
    this.uses[s.gate]! += 1;
    if (this.state[s.gate] === 0) this.state[s.gate] = state + 1;
  }

  /** Whether traversal (inPort -> outPort) fits: gate allowed, waveguide free, state compatible. */
  canUse(inPort: number, outPort: number): boolean {
    const g = inPort >> 2;
    if (this.allowed[g] === 0) return false;
    const { state, channel } = stepStateAndChannel(inPort, outPort);
    const st = this.state[g]!;
    return this.channel[g * 2 + channel] === 0 && (st === 0 || st === state + 1);
  }

  use(inPort: number, outPort: number): void {
    const g = inPort >> 2;
    const { state, channel } = stepStateAndChannel(inPort, outPort);
    this.channel[g * 2 + channel] = 1;
    this.uses[g]! += 1;
    if (this.state[g] === 0) this.state[g] = state + 1;
  }

  release(inPort: number, outPort: number): void {
    const g = inPort >> 2;
    const { channel } = stepStateAndChannel(inPort, outPort);
    this.channel[g * 2 + channel] = 0;
    this.uses[g]! -= 1;
    if (this.uses[g] === 0) this.state[g] = 0;
  }

  /** Whether a gate is wholly free (allowed, no traversal, not split): it can become a split gate. */
  canSplit(g: number): boolean {
    return this.allowed[g] === 1 && this.state[g] === 0 && this.uses[g] === 0;
  }

  claimSplit(g: number): void {
    this.state[g] = SPLIT;
  }

  releaseSplit(g: number): void {
    this.state[g] = 0;
  }

  /** Uses every step of a path (assumed to fit). */
  useAll(steps: readonly ResolvedStep[]): void {
    for (const s of steps) this.use(s.inPort, s.outPort);
  }

  releaseAll(steps: readonly ResolvedStep[]): void {
    for (const s of steps) this.release(s.inPort, s.outPort);
  }

  /** Number of free waveguides the request may still use (an upper bound on any new path length). */
  freeWaveguides(): number {
    let n = 0;
    for (let g = 0; g < this.state.length; g++) if (this.allowed[g] && this.state[g] !== SPLIT) n += 2 - this.channel[g * 2]! - this.channel[g * 2 + 1]!;
    return n;
  }
}
