// Matches the ports a spec names (by id or label) to the free ports the user may pick.

/** The chip's ports as the drawer receives them. */
export type ChipPort = { id: string; label: string; wiredTo: string; free: boolean };

/**
 * A resolver for one spec: a ref naming a free port (by label or id) gives that port's ref; any other ref gives
 * the first free port not handed out yet, or '' when none is left. Each call marks its answer as used.
 */
export function portResolver(ports: readonly ChipPort[]): (ref: string) => string {
  const options = ports.filter((p) => p.free);
  const used = new Set<string>();
  const refOf = (p: ChipPort) => p.label || p.id;
  return (ref) => {
    const named = options.find((p) => p.label === ref || p.id === ref);
    const picked = named && !used.has(refOf(named)) ? named : options.find((p) => !used.has(refOf(p)));
    if (!picked) return '';
    used.add(refOf(picked));
    return refOf(picked);
  };
}
