// What the synthesised circuit is made of: each path's length in units and millimetres, ring or arm sizes, the FSR.
import type { Proposal } from '@hexloom/contracts';
import { loopFsrHz } from '@hexloom/solver';

type Accepted = Extract<Proposal, { ok: true }>;

const ROLE_WORDS: Record<string, string> = { bus: 'Bus', ring: 'Ring', arm: 'Arm', branch: 'Branch', feed: 'Feed' };

/** Realised sizes of a proposal's circuit. */
export type RealisedLengths = {
  paths: { label: string; units: number; lengthMm: number }[];
  /** Ring perimeter of ring designs, units. */
  perimeterUnits: number | undefined;
  /** Arm length difference of a lattice stage, units. */
  armDifferenceUnits: number | undefined;
  /** Period of the circuit's response: the ring's or lattice's FSR, or the unit FSR of the mesh. */
  fsrHz: number;
  fsrOf: 'ring' | 'lattice' | 'unit';
};

const positiveInteger = (x: unknown): number | undefined => (typeof x === 'number' && Number.isInteger(x) && x > 0 ? x : undefined);

/** Reads the circuit's paths (one unit per gate crossed) and the design's sizes; FSR = 1 / (L T_u), T_u = n_g L_u / c (common practice). */
export function realisedLengths(proposal: Accepted): RealisedLengths {
  const technology = proposal.content.mesh.technology;
  const unitLengthUm = technology.unitLengthUm;
  const counts = new Map<string, number>();
  const paths = (proposal.circuit?.paths ?? []).map((path) => {
    const n = (counts.get(path.role) ?? 0) + 1;
    counts.set(path.role, n);
    return { label: `${ROLE_WORDS[path.role] ?? path.role} ${n}`, units: path.steps.length, lengthMm: (path.steps.length * unitLengthUm) / 1000 };
  });
  const design = proposal.design ?? {};
  const perimeterUnits = positiveInteger(design.perimeterUnits);
  const armDifferenceUnits = positiveInteger(design.armDifferenceUnits);
  const latticeFsrHz = typeof design.latticeFsrHz === 'number' && design.latticeFsrHz > 0 ? design.latticeFsrHz : undefined;
  const input = { unitLengthUm, groupIndex: technology.groupIndex };
  if (perimeterUnits !== undefined) return { paths, perimeterUnits, armDifferenceUnits, fsrHz: loopFsrHz({ ...input, lengthUnits: perimeterUnits }), fsrOf: 'ring' };
  if (latticeFsrHz !== undefined) return { paths, perimeterUnits, armDifferenceUnits, fsrHz: latticeFsrHz, fsrOf: 'lattice' };
  return { paths, perimeterUnits, armDifferenceUnits, fsrHz: loopFsrHz({ ...input, lengthUnits: 1 }), fsrOf: 'unit' };
}
