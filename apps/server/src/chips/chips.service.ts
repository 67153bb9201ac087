/** Chips: create from a template or a chip JSON, edit, read; every chip belongs to one team. */
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Chip, CreateChip, MeshDefinitionFile, UpdateChip, User } from '@hexloom/contracts';
import { deadGatesInUse, makeMeshDefinition, MESH_SCHEMA_VERSION } from '@hexloom/mesh';
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DATABASE, type Database } from '../db/database.js';
import { loginMap } from '../db/login-map.js';
import { calibrations, chips, type ChipRow, configurations, configurationVersions } from '../db/schema/index.js';
import { buildChipMesh } from './build-chip-mesh.js';

export { buildChipMesh } from './build-chip-mesh.js';

/** Chip operations; the team role was checked by TeamRolesGuard, the chip's team is checked here. */
@Injectable()
export class ChipsService {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly audit: AuditService,
  ) {}

  /** The row of chip `chipId` of team `teamId`, or 404 (a chip of another team is unknown here). */
  async findRowOrFail(teamId: string, chipId: string): Promise<ChipRow> {
    const [row] = await this.db.select().from(chips).where(and(eq(chips.id, chipId), eq(chips.teamId, teamId)));
    if (!row) throw new NotFoundException(`Chip "${chipId}" not found in this team`);
    return row;
  }

  /** Chip `chipId` in the API shape, or 404. */
  async findOrFail(teamId: string, chipId: string): Promise<Chip> {
    return (await this.toChips([await this.findRowOrFail(teamId, chipId)]))[0] as Chip;
  }

  /** Every chip of the team, by name. */
  async list(teamId: string): Promise<Chip[]> {
    return this.toChips(await this.db.select().from(chips).where(eq(chips.teamId, teamId)).orderBy(asc(chips.name)));
  }

  /** Creates a chip from a template size and technology, or from an uploaded chip JSON (422 if it cannot be built). */
  async create(actor: User, teamId: string, body: CreateChip): Promise<Chip> {
    const definition: MeshDefinitionFile =
      'definition' in body
        ? body.definition
        : (makeMeshDefinition({
            name: body.name,
            shape: { kind: 'rectangle', rows: body.template.rows, columns: body.template.columns },
            technology: body.technology,
            io: body.template.io,
          }) as MeshDefinitionFile);
    buildChipMesh(definition);
    const created = await this.db.transaction(async (tx) => {
      const [row] = await tx.insert(chips).values({ teamId, name: definition.name, definition, createdBy: actor.id }).returning();
      if (!row) throw new Error(`ChipsService.create: insert of "${definition.name}" returned no row`);
      await this.audit.record({ action: 'chip.created', teamId, actorId: actor.id, target: row.name, detail: { chipId: row.id } }, tx);
      return row;
    });
    // Read after the transaction: PGlite has one connection, so a query outside `tx` would wait on it.
    return (await this.toChips([created]))[0] as Chip;
  }

  /** Edits name, technology, port wiring or dead gates; the result must still build (422). */
  async update(actor: User, teamId: string, chipId: string, body: UpdateChip): Promise<Chip> {
    const current = await this.findRowOrFail(teamId, chipId);
    const definition: MeshDefinitionFile = {
      ...current.definition,
      schemaVersion: MESH_SCHEMA_VERSION as 1,
      ...(body.name !== undefined ? { name: body.name } : {}),
      ...(body.technology !== undefined ? { technology: body.technology } : {}),
      ...(body.ports !== undefined ? { ports: body.ports } : {}),
      ...(body.deadGates !== undefined ? { deadGates: body.deadGates } : {}),
    };
    buildChipMesh(definition);
    const updated = await this.db.transaction(async (tx) => {
      const [row] = await tx
        .update(chips)
        .set({ name: definition.name, definition, revision: sql`${chips.revision} + 1`, updatedAt: sql`now()` })
        .where(eq(chips.id, chipId))
        .returning();
      if (!row) throw new NotFoundException(`Chip "${chipId}" not found in this team`);
      await this.audit.record(
        { action: 'chip.updated', teamId, actorId: actor.id, target: row.name, detail: { chipId, revision: row.revision, fields: Object.keys(body) } },
        tx,
      );
      return row;
    });
    return (await this.toChips([updated]))[0] as Chip;
  }

  private async toChips(rows: ChipRow[]): Promise<Chip[]> {
    const logins = await loginMap(this.db, rows.map((r) => r.createdBy));
    const calibrated = new Set(
      rows.length === 0 ? [] : (await this.db.selectDistinct({ chipId: calibrations.chipId }).from(calibrations)).map((r) => r.chipId),
    );
    const chipIds = rows.map((r) => r.id);
    const versions =
      chipIds.length === 0
        ? []
        : await this.db
            .select({ chipId: configurations.chipId, configurationId: configurations.id, name: configurations.name, number: configurationVersions.number, status: configurationVersions.status, content: configurationVersions.content })
            .from(configurationVersions)
            .innerJoin(configurations, eq(configurations.id, configurationVersions.configurationId))
            .where(inArray(configurations.chipId, chipIds));
    const affected = (r: ChipRow) =>
      versions
        .filter((v) => v.chipId === r.id)
        .map((v) => ({ configurationId: v.configurationId, configurationName: v.name, number: v.number, status: v.status, deadGates: deadGatesInUse(v.content, r.definition.deadGates) }))
        .filter((v) => v.deadGates.length > 0)
        .sort((a, b) => a.configurationName.localeCompare(b.configurationName) || a.number - b.number);
    return rows.map((r) => ({
      affectedVersions: affected(r),
      id: r.id,
      name: r.name,
      definition: r.definition,
      revision: r.revision,
      createdBy: logins.get(r.createdBy) ?? '',
      createdAt: r.createdAt.toISOString(),
      updatedAt: r.updatedAt.toISOString(),
      hasCalibration: calibrated.has(r.id),
    }));
  }
}
