/** Which input-to-output pairs of a specification are verified, and which of them carry the spec's targets. */
import type { FilterSpecBody } from '@hexloom/contracts';

/** `main`: an output the spec asks something of (its targets and unported mask regions apply); `through`: the rest of the light. */
export type OutputRole = 'main' | 'through';

/** One verified pair, ports as the spec names them (id or label); `index` counts the spec's outputs from 0. */
export type CircuitOutput = { from: string; to: string; role: OutputRole; index: number };

/** The pairs a spec's circuit is verified on: every output of a delay set; drop before through for add-drop and band-pass. */
export function circuitOutputs(spec: FilterSpecBody): CircuitOutput[] {
  switch (spec.kind) {
    case 'ttd-set':
      return spec.outputs.map((to, index) => ({ from: spec.from, to, role: 'main', index }));
    case 'add-drop':
      return [
        { from: spec.from, to: spec.drop, role: 'main', index: 0 },
        { from: spec.from, to: spec.through, role: 'through', index: 1 },
      ];
    case 'coupled-ring-bandpass':
      return [
        { from: spec.from, to: spec.to, role: 'main', index: 0 },
        { from: spec.from, to: spec.through, role: 'through', index: 1 },
      ];
    default:
      return [{ from: spec.from, to: spec.to, role: 'main', index: 0 }];
  }
}
