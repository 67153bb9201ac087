/** Reads an uploaded chip JSON file into a mesh definition, or a 422 naming what is wrong. */
import { type MeshDefinitionFile, meshDefinitionSchema } from '@hexloom/contracts';
import { InvalidChipError } from './chip-errors.js';

/** Parses the text and checks it against the mesh definition schema (schema version 1). */
export function parseChipJson(file: { text: string; fileName: string }): MeshDefinitionFile {
  let value: unknown;
  try {
    value = JSON.parse(file.text);
  } catch (error) {
    throw new InvalidChipError(`"${file.fileName}" is not JSON (${error instanceof Error ? error.message : String(error)})`);
  }
  const parsed = meshDefinitionSchema.safeParse(value);
  if (!parsed.success) {
    throw new InvalidChipError(`"${file.fileName}" is not a chip definition: ${parsed.error.issues.map((i) => `${i.path.join('.') || 'file'}: ${i.message}`).join('; ')}`);
  }
  return parsed.data;
}
