/** Measured spectra attached to a version, and their comparison with the simulation on a common grid. */
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Comparison, Measurement, MeasurementUploadFields, User } from '@hexloom/contracts';
import { compareSpectra } from '@hexloom/bench';
import { and, asc, eq } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { buildChipMesh } from '../chips/chips.service.js';
import { resolvePort } from '../compute/resolve-port.js';
import { SimulationService } from '../compute/simulation.service.js';
import { ConfigurationsService } from '../configurations/configurations.service.js';
import { DATABASE, type Database } from '../db/database.js';
import { loginMap } from '../db/login-map.js';
import { measurements, type MeasurementRow } from '../db/schema/index.js';
import { readMeasuredPoints } from './read-measured-points.js';

/** Measurement operations; a refused upload stores nothing. */
@Injectable()
export class MeasurementsService {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly configurations: ConfigurationsService,
    private readonly simulation: SimulationService,
    private readonly audit: AuditService,
  ) {}

  /** Measurements of a version, oldest first. */
  async list(teamId: string, configurationId: string, number: number): Promise<Measurement[]> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const rows = await this.db.select().from(measurements).where(eq(measurements.versionId, ref.version.id)).orderBy(asc(measurements.uploadedAt));
    return this.toMeasurements(rows, number);
  }

  /** Parses, checks and stores an upload (the ports must be ports of the version's chip). */
  async upload(actor: User, teamId: string, configurationId: string, number: number, fields: MeasurementUploadFields, file: { text: string; fileName: string; sizeBytes: number }): Promise<Measurement> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const mesh = buildChipMesh(ref.version.content.mesh);
    const fromPort = resolvePort(mesh, fields.from, 'from');
    const toPort = resolvePort(mesh, fields.to, 'to');
    const { format, points } = readMeasuredPoints(file.text, file.fileName, ref.version.content.mesh.technology.referenceFrequencyHz);
    const row = await this.db.transaction(async (tx) => {
      const [inserted] = await tx
        .insert(measurements)
        .values({ versionId: ref.version.id, fileName: file.fileName, format, sizeBytes: file.sizeBytes, fromPort, toPort, label: fields.label, text: file.text, points, uploadedBy: actor.id })
        .returning();
      if (!inserted) throw new Error('MeasurementsService.upload: insert returned no row');
      await this.audit.record(
        { action: 'measurement.uploaded', teamId, actorId: actor.id, target: file.fileName, detail: { configurationId, version: number, measurementId: inserted.id, points: points.frequencyHz.length } },
        tx,
      );
      return inserted;
    });
    return (await this.toMeasurements([row], number))[0] as Measurement;
  }

  /** Simulated versus measured power at the measured frequencies (inside the measured span), with residual figures. */
  async compare(teamId: string, configurationId: string, number: number, measurementId: string): Promise<Comparison> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const [row] = await this.db.select().from(measurements).where(and(eq(measurements.id, measurementId), eq(measurements.versionId, ref.version.id)));
    if (!row) throw new NotFoundException(`Measurement "${measurementId}" not found on version ${number}`);
    const f0 = ref.version.content.mesh.technology.referenceFrequencyHz;
    const offsetHz = row.points.frequencyHz.map((f) => f - f0);
    const simulated = await this.simulation.transmission(ref.version.content, row.fromPort, row.toPort, offsetHz);
    const comparison = compareSpectra({ offsetHz: simulated.frequencyHz, powerDb: simulated.powerDb }, { offsetHz, powerDb: row.points.powerDb });
    return { measurementId, ...comparison };
  }

  private async toMeasurements(rows: MeasurementRow[], versionNumber: number): Promise<Measurement[]> {
    const logins = await loginMap(this.db, rows.map((r) => r.uploadedBy));
    return rows.map((r) => ({
      id: r.id,
      versionNumber,
      fileName: r.fileName,
      format: r.format,
      sizeBytes: r.sizeBytes,
      from: r.fromPort,
      to: r.toPort,
      label: r.label,
      points: r.points.frequencyHz.length,
      uploadedBy: logins.get(r.uploadedBy) ?? '',
      uploadedAt: r.uploadedAt.toISOString(),
    }));
  }
}
