/** A problem the configuration checker reports, with the ids involved. */

export type ViolationCode =
  | 'unknown-id'
  | 'duplicate-circuit'
  | 'invalid-step'
  | 'circuit-disconnected'
  | 'waveguide-used-twice'
  | 'inconsistent-state'
  | 'dead-gate-used'
  | 'port-used-twice'
  | 'coupler-misuse'
  | 'outside-region'
  | 'stale-setting'
  | 'shared-gate-conflict'
  | 'ineffective-phase';

/** One violation: a code, a sentence, and the circuits, gates and ports involved. */
export type Violation = {
  readonly code: ViolationCode;
  readonly message: string;
  readonly circuits: readonly string[];
  readonly gates: readonly string[];
  readonly ports: readonly string[];
};

export function violation(code: ViolationCode, message: string, ids: { circuits?: string[]; gates?: string[]; ports?: string[] } = {}): Violation {
  return { code, message, circuits: ids.circuits ?? [], gates: ids.gates ?? [], ports: ids.ports ?? [] };
}
