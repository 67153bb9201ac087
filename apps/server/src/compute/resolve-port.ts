/** Resolves a port reference (id or label) to the mesh port id the solver names ports by. */
import type { Mesh } from '@hexloom/mesh';
import { resolveMeshPort } from '@hexloom/synth';
import { UnknownPortError } from './compute-errors.js';

/** The port id of `ref` on `mesh`; 422 naming `field` when there is no such port. */
export function resolvePort(mesh: Mesh, ref: string, field: string): string {
  const id = resolveMeshPort(mesh, ref);
  if (id === null) throw new UnknownPortError(ref, field);
  return id;
}
