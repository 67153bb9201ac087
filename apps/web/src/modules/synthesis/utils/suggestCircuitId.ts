// A free circuit id to start the form with, named after the spec kind ("ring-notch-1", "ring-notch-2"...).

/** The first `<kind>-<n>` not in `existing`. */
export function suggestCircuitId(kind: string, existing: readonly string[]): string {
  const taken = new Set(existing);
  let n = 1;
  while (taken.has(`${kind}-${n}`)) n += 1;
  return `${kind}-${n}`;
}
