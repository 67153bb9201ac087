/** Monte Carlo yield jobs: chunks run in a piscina worker pool, progress in the database, cancel by abort. */
import { Inject, Injectable, Logger, NotFoundException, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import type { StartYieldJob, User, YieldJob } from '@hexloom/contracts';
import { planMonteCarlo, summariseMonteCarlo, type MonteCarloRun } from '@hexloom/synth';
import { and, count, eq, lt, notInArray } from 'drizzle-orm';
import { Piscina } from 'piscina';
import { concat, finalize, type Observable, of, Subject, takeWhile } from 'rxjs';
import { AuditService } from '../audit/audit.service.js';
import { buildChipMesh } from '../chips/chips.service.js';
import { ConfigurationsService, type VersionRef } from '../configurations/configurations.service.js';
import { DATABASE, type Database } from '../db/database.js';
import { loginMap } from '../db/login-map.js';
import { configurations, configurationVersions, yieldJobs, type YieldJobRow } from '../db/schema/index.js';
import { OPEN_DATABASE } from '../db/database.module.js';
import type { OpenDatabase } from '../db/migrate.js';
import { YieldQueueService } from '../queue/yield-queue.service.js';

/** A running job of a shared database with no sign of life for this long belongs to a stopped server. */
const STALE_JOB_MS = 120_000;
import { TooManyJobsError } from './compute-errors.js';
import { resolvePort } from './resolve-port.js';
import { SimulationService } from './simulation.service.js';
import type { YieldChunkTask } from './yield-chunk.worker.js';

/** Progress is reported after each chunk; about this many chunks per job. */
const CHUNKS_PER_JOB = 20;
const THREADS = 2;

/** Yield jobs a team may have running at once (others wait their turn: the answer is a 429). */
export const MAX_RUNNING_JOBS_PER_TEAM = 2;
/** Event streams one user may hold open at once. */
export const MAX_STREAMS_PER_USER = 4;

/** The worker file next to this module (.ts under the test runner, .js when built); tsx loads either. */
const WORKER_FILE = new URL(`./yield-chunk.worker${import.meta.url.endsWith('.ts') ? '.ts' : '.js'}`, import.meta.url).href;

/** Yield job operations. */
@Injectable()
export class YieldJobsService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('YieldJobsService');
  private pool: Piscina | null = null;
  private readonly running = new Map<string, { abort: AbortController; teamId: string }>();
  /** Updates of each running job, pushed to its event streams as they happen (no stream polls the database). */
  private readonly updates = new Map<string, Subject<YieldJob>>();
  private readonly streams = new Map<string, number>();
  private sweeper: NodeJS.Timeout | null = null;

  /**
   * A job whose server stopped will never finish: it is marked interrupted. The embedded database has one server, so
   * at start-up every running job is its own stopped one; on a shared PostgreSQL server only jobs with no sign of life
   * for `STALE_JOB_MS` are, at start-up and then every minute.
   */
  async onApplicationBootstrap(): Promise<void> {
    // Queued jobs resume where they stopped (their chunks stay on the queue); only in-process jobs can be orphaned.
    if (this.queue.shared) return;
    await this.interruptStale(this.open.mode === 'embedded' ? 0 : STALE_JOB_MS);
    if (this.open.mode === 'server') {
      this.sweeper = setInterval(() => void this.interruptStale(STALE_JOB_MS).catch(() => undefined), 60_000);
      this.sweeper.unref();
    }
  }

  private async interruptStale(olderThanMs: number): Promise<void> {
    const mine = [...this.running.keys()];
    const stale = await this.db
      .update(yieldJobs)
      .set({ status: 'interrupted', error: 'the server stopped while this job ran; start it again' })
      .where(and(eq(yieldJobs.status, 'running'), lt(yieldJobs.heartbeatAt, new Date(Date.now() - olderThanMs)), mine.length > 0 ? notInArray(yieldJobs.id, mine) : undefined))
      .returning({ id: yieldJobs.id });
    if (stale.length > 0) this.logger.warn(`${stale.length} yield job(s) whose server stopped were marked interrupted`);
  }

  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly configurations: ConfigurationsService,
    private readonly simulation: SimulationService,
    private readonly audit: AuditService,
    @Inject(OPEN_DATABASE) private readonly open: OpenDatabase,
    private readonly queue: YieldQueueService,
  ) {}

  /** Starts a study of one version and returns at once; the chunks run in worker threads (or go to the shared queue). */
  async start(actor: User, teamId: string, configurationId: string, number: number, body: StartYieldJob): Promise<YieldJob> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const mine = await this.runningJobsOfTeam(teamId);
    if (mine >= MAX_RUNNING_JOBS_PER_TEAM) throw new TooManyJobsError(`the team already has ${mine} yield jobs running (at most ${MAX_RUNNING_JOBS_PER_TEAM}); wait for one to finish or cancel one`);
    const mesh = buildChipMesh(ref.version.content.mesh);
    const from = resolvePort(mesh, body.from, 'from');
    const to = resolvePort(mesh, body.to, 'to');
    const offsetsHz = this.simulation.offsets(ref.version.content, body.grid);
    const chunks = planMonteCarlo({ runs: body.runs, seed: body.seed, chunkSize: Math.max(1, Math.ceil(body.runs / CHUNKS_PER_JOB)) });
    const row = await this.db.transaction(async (tx) => {
      const [inserted] = await tx.insert(yieldJobs).values({ versionId: ref.version.id, request: body, runsTotal: body.runs, chunkCount: chunks.length, createdBy: actor.id }).returning();
      if (!inserted) throw new Error('YieldJobsService.start: insert returned no row');
      await this.audit.record(
        { action: 'yield_job.started', teamId, actorId: actor.id, target: `${ref.configuration.name} v${number}`, detail: { jobId: inserted.id, runs: body.runs, seed: body.seed } },
        tx,
      );
      return inserted;
    });
    const base = { configuration: ref.version.content, from, to, offsetsHz, mask: body.mask.regions, tolerance: { couplerSigmaRad: body.couplerSigmaRad, phaseSigmaRad: body.phaseSigmaRad } };
    const tasks = chunks.map((chunk) => ({ ...base, chunk }));
    if (this.queue.shared) {
      // On a shared database the chunks go to the queue: any server or `hexloom worker` takes them.
      await this.queue.enqueue(row.id, tasks);
    } else {
      const abort = new AbortController();
      this.running.set(row.id, { abort, teamId });
      this.updates.set(row.id, new Subject<YieldJob>());
      void this.run(row.id, tasks, abort.signal);
    }
    return (await this.toJobs([row]))[0] as YieldJob;
  }

  /** Running jobs of a team, on every server sharing the database. */
  private async runningJobsOfTeam(teamId: string): Promise<number> {
    const [row] = await this.db
      .select({ n: count() })
      .from(yieldJobs)
      .innerJoin(configurationVersions, eq(configurationVersions.id, yieldJobs.versionId))
      .innerJoin(configurations, eq(configurations.id, configurationVersions.configurationId))
      .where(and(eq(yieldJobs.status, 'running'), eq(configurations.teamId, teamId)));
    return row?.n ?? 0;
  }

  /** Job `jobId` of the version, or 404. */
  async get(teamId: string, configurationId: string, number: number, jobId: string): Promise<YieldJob> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    return (await this.toJobs([await this.rowOrFail(ref, jobId)]))[0] as YieldJob;
  }

  /** Cancels a running job (a finished one is left as it is) and returns it. */
  async cancel(actor: User, teamId: string, configurationId: string, number: number, jobId: string): Promise<YieldJob> {
    const ref = await this.configurations.findVersionOrFail(teamId, configurationId, number);
    const row = await this.rowOrFail(ref, jobId);
    if (row.status === 'running') {
      await this.db.transaction(async (tx) => {
        await tx.update(yieldJobs).set({ status: 'cancelled' }).where(and(eq(yieldJobs.id, jobId), eq(yieldJobs.status, 'running')));
        await this.audit.record({ action: 'yield_job.cancelled', teamId, actorId: actor.id, target: `${ref.configuration.name} v${number}`, detail: { jobId } }, tx);
      });
      // Stop the workers after the status is written, then give the streams the last state.
      this.running.get(jobId)?.abort.abort();
      await this.publish(jobId, true);
    }
    return this.get(teamId, configurationId, number, jobId);
  }

  /**
   * The job now, then each update as the job makes it, until it ends (a job that is not running gives one event).
   * @throws TooManyJobsError when the user already holds `MAX_STREAMS_PER_USER` streams open.
   */
  async follow(userId: string, teamId: string, configurationId: string, number: number, jobId: string): Promise<Observable<YieldJob>> {
    const now = await this.get(teamId, configurationId, number, jobId);
    const open = this.streams.get(userId) ?? 0;
    if (open >= MAX_STREAMS_PER_USER) throw new TooManyJobsError(`you already follow ${open} yield job streams (at most ${MAX_STREAMS_PER_USER}); close one first`);
    if (now.status === 'running' && this.queue.shared) this.watch(teamId, configurationId, number, jobId);
    const live = this.updates.get(jobId);
    if (now.status !== 'running' || !live) return of(now);
    this.streams.set(userId, open + 1);
    return concat(of(now), live.asObservable()).pipe(
      takeWhile((job) => job.status === 'running', true),
      finalize(() => this.streams.set(userId, Math.max(0, (this.streams.get(userId) ?? 1) - 1))),
    );
  }

  /**
   * On a shared database the chunks finish on other machines: one poll per followed job (not per stream) reads it each
   * second and pushes it to its streams until it ends.
   */
  private watch(teamId: string, configurationId: string, number: number, jobId: string): void {
    if (this.updates.has(jobId)) return;
    this.updates.set(jobId, new Subject<YieldJob>());
    const timer = setInterval(() => {
      void this.get(teamId, configurationId, number, jobId)
        .then(async (job) => {
          const running = job.status === 'running';
          if (!running) clearInterval(timer);
          await this.publish(jobId, !running);
        })
        .catch(() => clearInterval(timer));
    }, 1_000);
    timer.unref();
  }

  /** Reads the job and pushes it to its streams; `last` ends them. */
  private async publish(jobId: string, last = false): Promise<void> {
    const subject = this.updates.get(jobId);
    if (!subject) return;
    const [row] = await this.db.select().from(yieldJobs).where(eq(yieldJobs.id, jobId));
    if (row) subject.next((await this.toJobs([row]))[0] as YieldJob);
    if (last) {
      subject.complete();
      this.updates.delete(jobId);
    }
  }

  async onApplicationShutdown(): Promise<void> {
    if (this.sweeper) clearInterval(this.sweeper);
    for (const r of this.running.values()) r.abort.abort();
    this.running.clear();
    await this.pool?.destroy();
    this.pool = null;
  }

  private async run(jobId: string, tasks: YieldChunkTask[], signal: AbortSignal): Promise<void> {
    const runs: MonteCarloRun[] = [];
    try {
      this.pool ??= new Piscina({ filename: WORKER_FILE, maxThreads: THREADS, minThreads: 0, idleTimeout: 5_000, execArgv: ['--import', 'tsx'] });
      const pool = this.pool;
      for (let i = 0; i < tasks.length && !signal.aborted; i += THREADS) {
        const batch = tasks.slice(i, i + THREADS);
        const results = await Promise.all(batch.map((task) => pool.run(task, { signal }) as Promise<MonteCarloRun[]>));
        for (const r of results) runs.push(...r);
        if (signal.aborted) break;
        await this.db.update(yieldJobs).set({ runsDone: runs.length, heartbeatAt: new Date() }).where(and(eq(yieldJobs.id, jobId), eq(yieldJobs.status, 'running')));
        await this.publish(jobId);
      }
      if (!signal.aborted) {
        await this.db.update(yieldJobs).set({ status: 'done', runsDone: runs.length, summary: summariseMonteCarlo(runs) }).where(and(eq(yieldJobs.id, jobId), eq(yieldJobs.status, 'running')));
      }
    } catch (error) {
      if (!signal.aborted) {
        const message = error instanceof Error ? error.message : String(error);
        this.logger.warn(`yield job ${jobId} failed: ${message}`);
        await this.db
          .update(yieldJobs)
          .set({ status: 'failed', error: message })
          .where(and(eq(yieldJobs.id, jobId), eq(yieldJobs.status, 'running')))
          .catch(() => undefined);
      }
    } finally {
      this.running.delete(jobId);
      // A cancelled job's streams get their last event from cancel(), after its status is written.
      if (!signal.aborted) await this.publish(jobId, true).catch(() => undefined);
    }
  }

  private async rowOrFail(ref: VersionRef, jobId: string): Promise<YieldJobRow> {
    const [row] = await this.db.select().from(yieldJobs).where(and(eq(yieldJobs.id, jobId), eq(yieldJobs.versionId, ref.version.id)));
    if (!row) throw new NotFoundException(`Yield job "${jobId}" not found on version ${ref.version.number}`);
    return row;
  }

  private async toJobs(rows: YieldJobRow[]): Promise<YieldJob[]> {
    const logins = await loginMap(this.db, rows.map((r) => r.createdBy));
    return rows.map((r) => ({
      id: r.id,
      versionId: r.versionId,
      status: r.status,
      runsDone: r.runsDone,
      runsTotal: r.runsTotal,
      summary: r.summary ?? null,
      error: r.error,
      createdBy: logins.get(r.createdBy) ?? '',
      createdAt: r.createdAt.toISOString(),
    }));
  }
}

