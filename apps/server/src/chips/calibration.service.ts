/** Calibration of a chip: upload a CSV (all rows valid or nothing stored), read the current one. */
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Calibration, User } from '@hexloom/contracts';
import { CalibrationCsvError, parseCalibrationCsv, type ShifterCalibration } from '@hexloom/bench';
import { desc, eq } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DATABASE, type Database } from '../db/database.js';
import { loginMap } from '../db/login-map.js';
import { calibrations, type CalibrationRow } from '../db/schema/index.js';
import { InvalidCalibrationError } from './chip-errors.js';
import { buildChipMesh, ChipsService } from './chips.service.js';

/** Calibration operations. */
@Injectable()
export class CalibrationService {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly chips: ChipsService,
    private readonly audit: AuditService,
  ) {}

  /** The newest calibration of the chip, or null. */
  async current(chipId: string): Promise<CalibrationRow | null> {
    const [row] = await this.db.select().from(calibrations).where(eq(calibrations.chipId, chipId)).orderBy(desc(calibrations.uploadedAt)).limit(1);
    return row ?? null;
  }

  /** The newest calibration in the API shape, or 404 when none was uploaded. */
  async currentOrFail(teamId: string, chipId: string): Promise<Calibration> {
    await this.chips.findRowOrFail(teamId, chipId);
    const row = await this.current(chipId);
    if (!row) throw new NotFoundException(`Chip "${chipId}" has no calibration yet`);
    return this.toCalibration(row);
  }

  /** The shifters of the current calibration (empty when there is none). */
  async shiftersOf(chipId: string): Promise<ShifterCalibration[]> {
    return (await this.current(chipId))?.shifters ?? [];
  }

  /** Parses and stores a calibration CSV; 422 listing each bad line, and nothing stored, if any row is bad. */
  async upload(actor: User, teamId: string, chipId: string, file: { text: string; fileName: string }): Promise<Calibration> {
    const chip = await this.chips.findRowOrFail(teamId, chipId);
    const knownGates = new Set(buildChipMesh(chip.definition).gates.map((g) => g.id));
    let shifters: ShifterCalibration[];
    try {
      shifters = parseCalibrationCsv(file.text, { knownGates });
    } catch (error) {
      if (error instanceof CalibrationCsvError) throw new InvalidCalibrationError(`Calibration "${file.fileName}" has bad rows: ${error.message}`, [...error.issues]);
      throw error;
    }
    const stored = await this.db.transaction(async (tx) => {
      const [row] = await tx.insert(calibrations).values({ chipId, fileName: file.fileName, shifters, uploadedBy: actor.id }).returning();
      if (!row) throw new Error(`CalibrationService.upload: insert for chip "${chipId}" returned no row`);
      await this.audit.record(
        { action: 'calibration.uploaded', teamId, actorId: actor.id, target: chip.name, detail: { chipId, fileName: file.fileName, shifters: shifters.length } },
        tx,
      );
      return row;
    });
    return this.toCalibration(stored);
  }

  private async toCalibration(row: CalibrationRow): Promise<Calibration> {
    const logins = await loginMap(this.db, [row.uploadedBy]);
    return { id: row.id, chipId: row.chipId, fileName: row.fileName, uploadedBy: logins.get(row.uploadedBy) ?? '', uploadedAt: row.uploadedAt.toISOString(), shifters: row.shifters };
  }
}
