/** The typed error of the mesh library, with a stable name and a code per kind of bad input. */

/** What kind of bad input a {@link MeshError} reports. */
export type MeshErrorCode =
  | 'invalid-shape'
  | 'duplicate-cell'
  | 'unknown-cell'
  | 'unknown-gate'
  | 'unknown-site'
  | 'unknown-port'
  | 'invalid-id'
  | 'invalid-technology'
  | 'invalid-request'
  | 'unknown-circuit'
  | 'duplicate-circuit';

/** Thrown for malformed input (a bad id, an impossible shape); impossible routes are answers, not errors. */
export class MeshError extends Error {
  override readonly name = 'MeshError';
  constructor(
    readonly code: MeshErrorCode,
    message: string,
  ) {
    super(`mesh: ${message}`);
  }
}
