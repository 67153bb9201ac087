/** Bench exports of a version: drive values from the chip's calibration (JSON or CSV), Touchstone of the simulation. */
import { Injectable } from '@nestjs/common';
import { BENCH_CAUTIONS, buildBenchExport, writeBenchExportCsv, type BenchExport } from '@hexloom/bench';
import { writeTouchstone } from '@hexloom/solver';
import { CalibrationService } from '../chips/calibration.service.js';
import { SimulationService } from '../compute/simulation.service.js';
import { ConfigurationsService } from '../configurations/configurations.service.js';
import { DriveLimitError } from './drive-limit.error.js';

/** A file to send: name, media type and text. */
export type ExportFile = { fileName: string; mediaType: string; text: string };

const safe = (name: string): string => name.replace(/[^A-Za-z0-9_-]+/g, '-');

/** Export operations; any version may be exported, marked "not approved" unless its status is approved. */
@Injectable()
export class BenchExportService {
  constructor(
    private readonly configurations: ConfigurationsService,
    private readonly calibration: CalibrationService,
    private readonly simulation: SimulationService,
  ) {}

  /** The bench export of a version; 422 listing every shifter beyond its limit. */
  async benchExport(teamId: string, configurationId: string, number: number): Promise<BenchExport> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const result = await buildBenchExport({
      configuration: ref.version.content,
      calibration: await this.calibration.shiftersOf(ref.chip.id),
      chip: ref.chip.name,
      configurationName: ref.configuration.name,
      version: number,
      approved: ref.version.status === 'approved',
    });
    if (!result.ok) throw new DriveLimitError(result.violations);
    return result.export;
  }

  /** The export as a CSV file. */
  async benchExportCsv(teamId: string, configurationId: string, number: number): Promise<ExportFile> {
    const exported = await this.benchExport(teamId, configurationId, number);
    return { fileName: `${safe(exported.configuration)}-v${number}.bench.csv`, mediaType: 'text/csv', text: writeBenchExportCsv(exported) };
  }

  /** Touchstone 1.1 (.sNp, RI, GHz) of the simulated S-parameters between `ports` on a span of offsets. */
  async touchstone(teamId: string, configurationId: string, number: number, q: { ports: string[]; startOffsetHz: number; stopOffsetHz: number; points: number }): Promise<ExportFile> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const { matrix, described } = await this.simulation.sMatrix(ref.version.content, q.ports, { kind: 'span', startOffsetHz: q.startOffsetHz, stopOffsetHz: q.stopOffsetHz, points: q.points });
    const approval = ref.version.status === 'approved' ? 'approved' : 'not approved';
    const text = writeTouchstone(
      { portCount: matrix.ports.length, frequenciesHz: matrix.offsetsHz.map((f) => matrix.referenceFrequencyHz + f), re: matrix.re, im: matrix.im, referenceOhm: 50 },
      {
        version: '1.1',
        format: 'RI',
        frequencyUnit: 'GHZ',
        comments: [
          `Hexloom simulated S-parameters: chip ${ref.chip.name}, configuration ${ref.configuration.name}, version ${number} (${approval})`,
          `ports: ${described.map((p, i) => `${i + 1}=${p}`).join(', ')}; optical frequencies around f0 = ${matrix.referenceFrequencyHz} Hz`,
          ...BENCH_CAUTIONS.map((c) => `caution: ${c}`),
        ],
      },
    );
    return { fileName: `${safe(ref.configuration.name)}-v${number}.s${matrix.ports.length}p`, mediaType: 'text/plain', text };
  }
}
