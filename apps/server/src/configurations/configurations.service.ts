/** Configurations of a chip and their immutable versions: create, save with optimistic concurrency, duplicate, diff. */
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type {
  CircuitFigures, CircuitSpec, ConfigurationDetail, ConfigurationFile, ConfigurationSummary, ConfigurationVersion, CreateConfiguration, DuplicateConfiguration, SaveVersion, User, VersionDiff, VersionSummary,
} from '@hexloom/contracts';
import { checkConfiguration, deadGatesInUse, emptyConfiguration } from '@hexloom/mesh';
import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { ComputePoolService } from '../compute/compute-pool.service.js';
import { buildChipMesh, ChipsService } from '../chips/chips.service.js';
import { DATABASE, type Database, type DbExecutor } from '../db/database.js';
import { loginMap } from '../db/login-map.js';
import { type ChipRow, chips, configurations, type ConfigurationRow, configurationVersions, type ConfigurationVersionRow } from '../db/schema/index.js';
import { InvalidContentError, StaleVersionError } from './configuration-errors.js';
import { diffVersions } from './diff-versions.js';

/** A version with the configuration and chip it belongs to. */
export type VersionRef = { chip: ChipRow; configuration: ConfigurationRow; version: ConfigurationVersionRow };

/** Configuration operations; every lookup checks that the configuration belongs to the caller's team. */
@Injectable()
export class ConfigurationsService {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly chips: ChipsService,
    private readonly audit: AuditService,
    private readonly compute: ComputePoolService,
  ) {}

  /** Configuration `configurationId` of team `teamId`, or 404. */
  async findRowOrFail(teamId: string, configurationId: string, executor: DbExecutor = this.db): Promise<ConfigurationRow> {
    const [row] = await executor.select().from(configurations).where(and(eq(configurations.id, configurationId), eq(configurations.teamId, teamId)));
    if (!row) throw new NotFoundException(`Configuration "${configurationId}" not found in this team`);
    return row;
  }

  /** Version `number` of a configuration of the team, with its chip, or 404. */
  async findVersionOrFail(teamId: string, configurationId: string, number: number): Promise<VersionRef> {
    const configuration = await this.findRowOrFail(teamId, configurationId);
    const [version] = await this.db
      .select()
      .from(configurationVersions)
      .where(and(eq(configurationVersions.configurationId, configurationId), eq(configurationVersions.number, number)));
    if (!version) throw new NotFoundException(`Configuration "${configuration.name}" has no version ${number}`);
    const [chip] = await this.db.select().from(chips).where(eq(chips.id, configuration.chipId));
    if (!chip) throw new NotFoundException(`Chip "${configuration.chipId}" not found`);
    return { chip, configuration, version };
  }

  /** Configurations of a chip, by name. */
  async list(teamId: string, chipId: string): Promise<ConfigurationSummary[]> {
    await this.chips.findRowOrFail(teamId, chipId);
    const rows = await this.db.select().from(configurations).where(eq(configurations.chipId, chipId)).orderBy(asc(configurations.name));
    return this.summaries(rows);
  }

  /** A configuration with every version (newest first). */
  async detail(teamId: string, configurationId: string): Promise<ConfigurationDetail> {
    const row = await this.findRowOrFail(teamId, configurationId);
    const versions = await this.db.select().from(configurationVersions).where(eq(configurationVersions.configurationId, configurationId)).orderBy(desc(configurationVersions.number));
    const [summary] = await this.summaries([row]);
    const full = await this.toVersions(versions);
    return { ...(summary as ConfigurationSummary), versions: full.map(({ content: _c, specs: _s, figures: _f, ...rest }): VersionSummary => rest) };
  }

  /** One version in the API shape. */
  async version(teamId: string, configurationId: string, number: number): Promise<ConfigurationVersion> {
    const ref = await this.findVersionOrFail(teamId, configurationId, number);
    return (await this.toVersions([ref.version]))[0] as ConfigurationVersion;
  }

  /** Creates a named configuration with version 1 (every gate parked when no content is given). */
  async create(actor: User, teamId: string, chipId: string, body: CreateConfiguration): Promise<ConfigurationDetail> {
    const chip = await this.chips.findRowOrFail(teamId, chipId);
    const content = body.content ?? (emptyConfiguration(chip.definition, 'bar') as ConfigurationFile);
    const figures = await this.checkContent(content, chip, body.specs);
    const id = await this.db.transaction(async (tx) => {
      const [row] = await tx.insert(configurations).values({ teamId, chipId, name: body.name, createdBy: actor.id }).returning();
      if (!row) throw new Error(`ConfigurationsService.create: insert of "${body.name}" returned no row`);
      await tx.insert(configurationVersions).values({ configurationId: row.id, number: 1, content, specs: body.specs, figures, note: body.note, authorId: actor.id });
      await this.audit.record({ action: 'configuration.created', teamId, actorId: actor.id, target: body.name, detail: { configurationId: row.id, chipId } }, tx);
      return row.id;
    });
    return this.detail(teamId, id);
  }

  /**
   * Saves a new immutable version based on `baseVersion`. The head number is bumped with a compare-and-set,
   * so of two saves based on the same version one wins and the other gets 409 with the newer version.
   */
  async save(actor: User, teamId: string, configurationId: string, body: SaveVersion): Promise<ConfigurationVersion> {
    const configuration = await this.findRowOrFail(teamId, configurationId);
    const figures = await this.checkContent(body.content, await this.chips.findRowOrFail(teamId, configuration.chipId), body.specs);
    const saved = await this.db.transaction(async (tx) => {
      const [bumped] = await tx
        .update(configurations)
        .set({ headVersion: body.baseVersion + 1, updatedAt: sql`now()` })
        .where(and(eq(configurations.id, configurationId), eq(configurations.headVersion, body.baseVersion)))
        .returning();
      if (!bumped) return null;
      const [row] = await tx
        .insert(configurationVersions)
        .values({ configurationId, number: body.baseVersion + 1, content: body.content, specs: body.specs, figures, note: body.note, authorId: actor.id })
        .returning();
      if (!row) throw new Error(`ConfigurationsService.save: insert of version ${body.baseVersion + 1} returned no row`);
      await this.audit.record({ action: 'version.saved', teamId, actorId: actor.id, target: configuration.name, detail: { configurationId, version: row.number } }, tx);
      return row;
    });
    if (saved) return (await this.toVersions([saved]))[0] as ConfigurationVersion;
    const head = await this.findRowOrFail(teamId, configurationId);
    if (body.baseVersion > head.headVersion) throw new NotFoundException(`Configuration "${configuration.name}" has no version ${body.baseVersion}`);
    throw new StaleVersionError(body.baseVersion, await this.version(teamId, configurationId, head.headVersion));
  }

  /** Copies one version (default: the newest) into a new configuration of the same chip, as its version 1. */
  async duplicate(actor: User, teamId: string, configurationId: string, body: DuplicateConfiguration): Promise<ConfigurationDetail> {
    const source = await this.findRowOrFail(teamId, configurationId);
    const ref = await this.findVersionOrFail(teamId, configurationId, body.fromVersion ?? source.headVersion);
    const id = await this.db.transaction(async (tx) => {
      const [row] = await tx.insert(configurations).values({ teamId, chipId: source.chipId, name: body.name, createdBy: actor.id }).returning();
      if (!row) throw new Error(`ConfigurationsService.duplicate: insert of "${body.name}" returned no row`);
      const v = ref.version;
      await tx.insert(configurationVersions).values({
        configurationId: row.id, number: 1, content: v.content, specs: v.specs, figures: v.figures, note: `Copy of ${source.name} version ${v.number}`, authorId: actor.id,
      });
      await this.audit.record(
        { action: 'configuration.duplicated', teamId, actorId: actor.id, target: body.name, detail: { configurationId: row.id, from: configurationId, fromVersion: v.number } },
        tx,
      );
      return row.id;
    });
    return this.detail(teamId, id);
  }

  /** The diff from version `from` to version `to`. */
  async diff(teamId: string, configurationId: string, from: number, to: number): Promise<VersionDiff> {
    const a = await this.findVersionOrFail(teamId, configurationId, from);
    const b = await this.findVersionOrFail(teamId, configurationId, to);
    return diffVersions(a.version, b.version);
  }

  /** Version rows in the API shape (logins resolved; dead gates in use read from each configuration's chip as it is now). */
  async toVersions(rows: ConfigurationVersionRow[]): Promise<ConfigurationVersion[]> {
    const logins = await loginMap(this.db, rows.flatMap((r) => [r.authorId, r.approvedBy]));
    const ids = [...new Set(rows.map((r) => r.configurationId))];
    const owners = ids.length === 0 ? [] : await this.db.select({ id: configurations.id, dead: chips.definition }).from(configurations).innerJoin(chips, eq(chips.id, configurations.chipId)).where(inArray(configurations.id, ids));
    const deadOf = new Map(owners.map((o) => [o.id, o.dead.deadGates]));
    return rows.map((r) => ({
      id: r.id,
      configurationId: r.configurationId,
      number: r.number,
      status: r.status,
      author: logins.get(r.authorId) ?? '',
      note: r.note,
      createdAt: r.createdAt.toISOString(),
      content: r.content,
      specs: r.specs,
      figures: r.figures,
      approvedBy: r.approvedBy ? (logins.get(r.approvedBy) ?? null) : null,
      approvedAt: r.approvedAt?.toISOString() ?? null,
      deadGatesInUse: deadGatesInUse(r.content, deadOf.get(r.configurationId) ?? []),
    }));
  }

  /**
   * 422 when the content is for a chip of another shape, its mesh cannot be built, it breaks the mesh rules, or a spec
   * names a circuit it does not have; otherwise the figures to save, recomputed from the content and its specs.
   */
  private async checkContent(content: ConfigurationFile, chip: ChipRow, specs: CircuitSpec[]): Promise<CircuitFigures> {
    if (JSON.stringify(content.mesh.shape) !== JSON.stringify(chip.definition.shape)) {
      throw new InvalidContentError(`The content is for a mesh of shape ${JSON.stringify(content.mesh.shape)}, but chip "${chip.name}" has ${JSON.stringify(chip.definition.shape)}`, [
        { path: 'content.mesh.shape', message: 'not the chip\'s shape' },
      ]);
    }
    const mesh = buildChipMesh(content.mesh);
    const check = checkConfiguration(mesh, content);
    if (!check.ok) {
      throw new InvalidContentError(
        `The configuration breaks ${check.violations.length} rule(s): ${check.violations.map((v) => v.message).join('; ')}`,
        check.violations.map((v) => ({ path: v.code, message: v.message })),
      );
    }
    const ids = new Set(content.circuits.map((c) => c.id));
    const orphans = specs.filter((s) => !ids.has(s.circuitId));
    if (orphans.length > 0)
      throw new InvalidContentError(`A spec names circuit ${orphans.map((s) => `"${s.circuitId}"`).join(', ')}, which the content does not have`, orphans.map((s) => ({ path: 'specs', message: `no circuit ${s.circuitId}` })));
    return specs.length === 0 ? {} : this.compute.run({ kind: 'figures', content, specs });
  }

  private async summaries(rows: ConfigurationRow[]): Promise<ConfigurationSummary[]> {
    const logins = await loginMap(this.db, rows.map((r) => r.createdBy));
    const out: ConfigurationSummary[] = [];
    for (const r of rows) {
      const [head] = await this.db
        .select({ status: configurationVersions.status })
        .from(configurationVersions)
        .where(and(eq(configurationVersions.configurationId, r.id), eq(configurationVersions.number, r.headVersion)));
      out.push({
        id: r.id, chipId: r.chipId, name: r.name, headVersion: r.headVersion, headStatus: head?.status ?? 'draft',
        createdBy: logins.get(r.createdBy) ?? '', createdAt: r.createdAt.toISOString(), updatedAt: r.updatedAt.toISOString(),
      });
    }
    return out;
  }
}
