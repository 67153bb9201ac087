// Paths of spec fields in the synthesise body, the keys of FieldErrors.

/** "spec.spec.<field>" for a field of the spec body. */
export function specPath(field: string): string {
  return `spec.spec.${field}`;
}

/** "spec.mask.regions.<row>.<field>" for a cell of the mask table. */
export function maskPath(row: number, field: string): string {
  return `spec.mask.regions.${row}.${field}`;
}
