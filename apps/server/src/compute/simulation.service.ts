/** Simulation of a version: port-to-port spectra (cached by content hash), mask checks, S-matrices. */
import { Inject, Injectable } from '@nestjs/common';
import type { ConfigurationFile, FrequencyGridBody, MaskCheckAnswer, MaskCheckBody, SimulateBody, SpectrumFile } from '@hexloom/contracts';
import { canonicalJson, sha256Hex } from '@hexloom/bench';
import type { Mesh } from '@hexloom/mesh';
import { gridOffsetsHz, netlistFromMesh, simulateConnection, sMatrix, type SMatrix, toSpectrumFile, unitDelayS } from '@hexloom/solver';
import { checkMask, responseFigures, simulateTransmission, type Transmission } from '@hexloom/synth';
import { eq } from 'drizzle-orm';
import { buildChipMesh } from '../chips/chips.service.js';
import { DATABASE, type Database } from '../db/database.js';
import { simulationCache } from '../db/schema/index.js';
import { resolvePort } from './resolve-port.js';

/** Version of the cached answer layout; bump it when the solver's answer changes meaning. */
const CACHE_LAYOUT = 2;

/** A spectrum answer and whether it came from the cache. */
export type CachedSpectrum = { spectrum: SpectrumFile; cached: boolean; hash: string };

/** Pure solver calls on a version's content; only the cache touches the database. */
@Injectable()
export class SimulationService {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /** Spectrum from `from` to `to` on `grid`; equal content, ports and grid share one cached answer. */
  async simulate(content: ConfigurationFile, body: SimulateBody): Promise<CachedSpectrum> {
    const mesh = buildChipMesh(content.mesh);
    const from = resolvePort(mesh, body.from, 'from');
    const to = resolvePort(mesh, body.to, 'to');
    const hash = await sha256Hex(canonicalJson({ layout: CACHE_LAYOUT, content, from, to, grid: body.grid }));
    const [hit] = await this.db.select().from(simulationCache).where(eq(simulationCache.hash, hash));
    if (hit) return { spectrum: hit.answer as SpectrumFile, cached: true, hash };
    const chip = netlistFromMesh({ mesh, configuration: content });
    const result = simulateConnection(chip.netlist, { from, to, grid: body.grid, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
    const name = (id: string) => mesh.ports[mesh.portIndex.get(id) ?? -1]?.label ?? id;
    const spectrum = toSpectrumFile(result, { from: name(from), to: name(to) });
    await this.db.insert(simulationCache).values({ hash, answer: spectrum }).onConflictDoNothing();
    return { spectrum, cached: false, hash };
  }

  /** Power and group delay of the whole chip from `from` to `to` at the given offsets (Hz from f0). */
  transmission(content: ConfigurationFile, fromRef: string, toRef: string, offsetsHz: readonly number[]): Transmission {
    const mesh = buildChipMesh(content.mesh);
    return simulateTransmission({ mesh, configuration: content, from: resolvePort(mesh, fromRef, 'from'), to: resolvePort(mesh, toRef, 'to'), offsetsHz });
  }

  /** Mask report and the quoted figures of the response on the grid. */
  maskCheck(content: ConfigurationFile, body: MaskCheckBody): MaskCheckAnswer {
    const offsets = this.offsets(content, body.grid);
    const response = this.transmission(content, body.from, body.to, offsets);
    const report = checkMask(response, body.mask.regions);
    const f = responseFigures(response);
    return {
      ...report,
      figures: { insertionLossDb: f.insertionLossDb, peakFrequencyHz: f.peakFrequencyHz, bandwidth3dBHz: f.bandwidth3dBHz, rejectionDb: f.rejectionDb, delayRippleIn3dBBandPs: f.delayRippleIn3dBBandPs },
    };
  }

  /** S-matrix between ports (ids or labels) on a grid. */
  sMatrix(content: ConfigurationFile, portRefs: readonly string[], grid: FrequencyGridBody): { matrix: SMatrix; mesh: Mesh } {
    const mesh = buildChipMesh(content.mesh);
    const ports = portRefs.map((p, i) => resolvePort(mesh, p, `ports.${i}`));
    const chip = netlistFromMesh({ mesh, configuration: content });
    return { matrix: sMatrix(chip.netlist, { ports, grid, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz }), mesh };
  }

  /** Offsets (Hz from f0) of a grid on this chip. */
  offsets(content: ConfigurationFile, grid: FrequencyGridBody): number[] {
    const { unitLengthUm, groupIndex } = content.mesh.technology;
    return Array.from(gridOffsetsHz(grid, unitDelayS({ unitLengthUm, groupIndex })));
  }
}
