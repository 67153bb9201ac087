/** The diff of two configuration versions: gate settings, circuits, parked state and saved figures. */
import type { CircuitFigures, ConfigurationFile, GateChange, FigureChange, VersionDiff } from '@hexloom/contracts';

/** What a diff compares of a version. */
export type DiffSide = { number: number; content: ConfigurationFile; figures: CircuitFigures };

const same = (a: unknown, b: unknown): boolean => JSON.stringify(a) === JSON.stringify(b);

/** Every gate a circuit uses: the gates of its path steps and its couplers. */
const gatesOf = (c: ConfigurationFile['circuits'][number]): string[] => [...c.paths.flatMap((p) => p.steps.map((s) => s.gate)), ...c.couplers.map((k) => k.gate)];

/**
 * Gates whose setting differs (added, removed or changed); circuits added, removed, or changed — in their own
 * definition or in the setting of any gate they use (a circuit whose shared gate another edit moved is changed too);
 * figures changed.
 */
export function diffVersions(from: DiffSide, to: DiffSide): VersionDiff {
  const before = new Map(from.content.gates.map((g) => [g.gate, g]));
  const after = new Map(to.content.gates.map((g) => [g.gate, g]));
  const gatesChanged: GateChange[] = [];
  for (const gate of [...new Set([...before.keys(), ...after.keys()])].sort()) {
    const b = before.get(gate) ?? null;
    const a = after.get(gate) ?? null;
    if (!same(b, a)) gatesChanged.push({ gate, before: b, after: a });
  }
  const movedGates = new Set(gatesChanged.map((g) => g.gate));
  const circuitsBefore = new Map(from.content.circuits.map((c) => [c.id, c]));
  const circuitsAfter = new Map(to.content.circuits.map((c) => [c.id, c]));
  const figureChanges: FigureChange[] = [];
  for (const circuitId of [...new Set([...Object.keys(from.figures), ...Object.keys(to.figures)])].sort()) {
    const fb = from.figures[circuitId] ?? {};
    const fa = to.figures[circuitId] ?? {};
    for (const figure of [...new Set([...Object.keys(fb), ...Object.keys(fa)])].sort()) {
      const b = fb[figure] ?? null;
      const a = fa[figure] ?? null;
      if (b !== a) figureChanges.push({ circuitId, figure, before: b, after: a });
    }
  }
  return {
    from: from.number,
    to: to.number,
    gatesChanged,
    circuitsAdded: [...circuitsAfter.keys()].filter((id) => !circuitsBefore.has(id)).sort(),
    circuitsRemoved: [...circuitsBefore.keys()].filter((id) => !circuitsAfter.has(id)).sort(),
    circuitsChanged: [...circuitsAfter.keys()]
      .filter((id) => {
        const b = circuitsBefore.get(id);
        const a = circuitsAfter.get(id);
        if (!b || !a) return false;
        return !same(b, a) || [...new Set([...gatesOf(b), ...gatesOf(a)])].some((g) => movedGates.has(g));
      })
      .sort(),
    parkedStateChanged: from.content.parkedState !== to.content.parkedState,
    figureChanges,
  };
}
