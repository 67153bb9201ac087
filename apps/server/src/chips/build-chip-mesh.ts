/** Builds the mesh of a chip definition, or names why it cannot be built (a 422). */
import type { MeshDefinitionFile } from '@hexloom/contracts';
import { buildMesh, type Mesh } from '@hexloom/mesh';
import { InvalidChipError } from './chip-errors.js';
import { checkChipSize } from './chip-size.js';

/** Builds the mesh of a definition or throws a 422 naming why it cannot be built (too large, bad ids or shape). */
export function buildChipMesh(definition: MeshDefinitionFile): Mesh {
  checkChipSize(definition);
  try {
    return buildMesh(definition);
  } catch (error) {
    throw new InvalidChipError(error instanceof Error ? error.message : String(error));
  }
}
