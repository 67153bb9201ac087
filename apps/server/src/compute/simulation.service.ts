/** Simulation of a version on worker threads: port-to-port spectra (cached per team), mask checks, S-matrices. */
import { Inject, Injectable } from '@nestjs/common';
import type { ConfigurationFile, FrequencyGridBody, MaskCheckAnswer, MaskCheckBody, SimulateBody, SpectrumFile } from '@hexloom/contracts';
import { canonicalJson, sha256Hex } from '@hexloom/bench';
import type { SMatrix } from '@hexloom/solver';
import type { Transmission } from '@hexloom/synth';
import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import { DATABASE, type Database } from '../db/database.js';
import { simulationCache } from '../db/schema/index.js';
import { ComputePoolService } from './compute-pool.service.js';
import { gridOffsets } from './simulation-tasks.js';

/** Version of the cached answer layout; bump it when the solver's answer changes meaning. */
const CACHE_LAYOUT = 3;

/** Cached answers kept per team; the least recently used beyond this are evicted. */
export const CACHE_ENTRIES_PER_TEAM = 64;

/** A spectrum answer and whether it came from the team's cache. */
export type CachedSpectrum = { spectrum: SpectrumFile; cached: boolean; hash: string };

/** Solver calls on a version's content, run on the compute workers; only the cache touches the database. */
@Injectable()
export class SimulationService {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly compute: ComputePoolService,
  ) {}

  /** Spectrum from `from` to `to` on `grid`; equal content, ports and grid of one team share one cached answer. */
  async simulate(teamId: string, content: ConfigurationFile, body: SimulateBody): Promise<CachedSpectrum> {
    const hash = await sha256Hex(canonicalJson({ layout: CACHE_LAYOUT, teamId, content, from: body.from, to: body.to, grid: body.grid }));
    const [hit] = await this.db.select().from(simulationCache).where(and(eq(simulationCache.hash, hash), eq(simulationCache.teamId, teamId)));
    if (hit) {
      await this.db.update(simulationCache).set({ usedAt: sql`now()` }).where(eq(simulationCache.hash, hash));
      return { spectrum: hit.answer as SpectrumFile, cached: true, hash };
    }
    const spectrum = await this.compute.run({ kind: 'simulate', content, body });
    await this.db.insert(simulationCache).values({ hash, teamId, answer: spectrum }).onConflictDoNothing();
    await this.evict(teamId);
    return { spectrum, cached: false, hash };
  }

  /** Power and group delay of the whole chip from `fromRef` to `toRef` at the given offsets (Hz from f0). */
  transmission(content: ConfigurationFile, fromRef: string, toRef: string, offsetsHz: readonly number[]): Promise<Transmission> {
    return this.compute.run({ kind: 'transmission', content, from: fromRef, to: toRef, offsetsHz: [...offsetsHz] });
  }

  /** Mask report and the quoted figures of the response on the grid. */
  maskCheck(content: ConfigurationFile, body: MaskCheckBody): Promise<MaskCheckAnswer> {
    return this.compute.run({ kind: 'mask-check', content, body });
  }

  /** S-matrix between ports (ids or labels) on a grid, each port described by label, id and wiring. */
  sMatrix(content: ConfigurationFile, portRefs: readonly string[], grid: FrequencyGridBody): Promise<{ matrix: SMatrix; described: string[] }> {
    return this.compute.run({ kind: 's-matrix', content, ports: [...portRefs], grid });
  }

  /** Offsets (Hz from f0) of a grid on this chip. */
  offsets(content: ConfigurationFile, grid: FrequencyGridBody): number[] {
    return gridOffsets(content, grid);
  }

  /** Drops the team's least recently used answers beyond `CACHE_ENTRIES_PER_TEAM`. */
  private async evict(teamId: string): Promise<void> {
    const stale = await this.db
      .select({ hash: simulationCache.hash })
      .from(simulationCache)
      .where(eq(simulationCache.teamId, teamId))
      .orderBy(desc(simulationCache.usedAt), desc(simulationCache.createdAt))
      .offset(CACHE_ENTRIES_PER_TEAM);
    if (stale.length > 0) await this.db.delete(simulationCache).where(inArray(simulationCache.hash, stale.map((s) => s.hash)));
  }
}
