/** The compute work the server sends to worker threads, as plain data in and out, and the dispatcher that runs it. */
import type { CircuitFigures, CircuitSpec, ConfigurationFile, FrequencyGridBody, MaskCheckAnswer, MaskCheckBody, MeshDefinitionFile, Proposal, RouteRequestFile, SimulateBody, SpectrumFile, SynthesiseBody } from '@hexloom/contracts';
import type { SMatrix } from '@hexloom/solver';
import type { Transmission } from '@hexloom/synth';
import { buildChipMesh } from '../chips/build-chip-mesh.js';
import { recomputeFigures } from '../configurations/recompute-figures.js';
import { placeProposal, type ProposalBase, removeProposal, rerouteProposal, synthesiseProposal } from './edit-proposals.js';
import { maskCheckAnswer, simulateSpectrum, sMatrixOf, transmission } from './simulation-tasks.js';

/** One piece of work; `kind` picks what runs. */
export type ComputeTask =
  | { kind: 'synthesise'; version: ProposalBase; chip: MeshDefinitionFile; body: SynthesiseBody }
  | { kind: 'place'; version: ProposalBase; chip: MeshDefinitionFile; request: RouteRequestFile }
  | { kind: 'remove'; version: ProposalBase; chip: MeshDefinitionFile; circuitId: string }
  | { kind: 'reroute'; version: ProposalBase; chip: MeshDefinitionFile; circuitId: string; request: RouteRequestFile | undefined }
  | { kind: 'simulate'; content: ConfigurationFile; body: SimulateBody }
  | { kind: 'mask-check'; content: ConfigurationFile; body: MaskCheckBody }
  | { kind: 's-matrix'; content: ConfigurationFile; ports: string[]; grid: FrequencyGridBody }
  | { kind: 'transmission'; content: ConfigurationFile; from: string; to: string; offsetsHz: number[] }
  | { kind: 'figures'; content: ConfigurationFile; specs: CircuitSpec[] };

/** What each kind of task answers. */
export type ComputeResult<K extends ComputeTask['kind']> = {
  synthesise: Proposal;
  place: Proposal;
  remove: Proposal;
  reroute: Proposal;
  simulate: SpectrumFile;
  'mask-check': MaskCheckAnswer;
  's-matrix': { matrix: SMatrix; described: string[] };
  transmission: Transmission;
  figures: CircuitFigures;
}[K];

/** Runs a task in this thread (the worker calls it; tests may too). */
export function runComputeTask(task: ComputeTask): ComputeResult<ComputeTask['kind']> {
  switch (task.kind) {
    case 'synthesise':
      return synthesiseProposal(task.version, task.chip, task.body);
    case 'place':
      return placeProposal(task.version, task.chip, task.request);
    case 'remove':
      return removeProposal(task.version, task.chip, task.circuitId);
    case 'reroute':
      return rerouteProposal(task.version, task.chip, task.circuitId, task.request);
    case 'simulate':
      return simulateSpectrum(task.content, task.body);
    case 'mask-check':
      return maskCheckAnswer(task.content, task.body);
    case 's-matrix':
      return sMatrixOf(task.content, task.ports, task.grid);
    case 'transmission':
      return transmission(task.content, task.from, task.to, task.offsetsHz);
    case 'figures':
      return recomputeFigures(buildChipMesh(task.content.mesh), task.content, task.specs).figures;
  }
}
