/** Runs the server's compute work on worker threads, so a long simulation or synthesis never holds the event loop. */
import { availableParallelism } from 'node:os';
import { Injectable, type OnApplicationShutdown } from '@nestjs/common';
import { Piscina } from 'piscina';
import { DomainError, type DomainErrorKind, type DomainIssue } from '../common/domain-error.js';
import type { ComputeResult, ComputeTask } from './compute-task.js';
import type { SerialisedError, WorkerAnswer } from './compute.worker.js';

/** The worker file next to this module (.ts under the test runner, .js when built); tsx loads either. */
const WORKER_FILE = new URL(`./compute.worker${import.meta.url.endsWith('.ts') ? '.ts' : '.js'}`, import.meta.url).href;

/** A domain error raised in a worker, rebuilt on this side with its name, kind and issues (same HTTP answer). */
class WorkerDomainError extends DomainError {
  override readonly name: string;
  readonly kind: DomainErrorKind;
  constructor(e: SerialisedError) {
    super(e.message, e.issues as DomainIssue[] | undefined, e.extra);
    this.name = e.name;
    this.kind = e.kind as DomainErrorKind;
  }
}

/** The error a worker reported, as the exception filter expects it: a domain error, a named library error, or an error. */
function rebuild(e: SerialisedError): Error {
  if (e.kind) return new WorkerDomainError(e);
  const error = new Error(e.message);
  error.name = e.name;
  return error;
}

/** The pool of compute workers (threads: the machine's cores, at most 4; started on first use, stopped when idle). */
@Injectable()
export class ComputePoolService implements OnApplicationShutdown {
  private pool: Piscina | null = null;

  /** Runs `task` on a worker thread; rethrows what the task threw there. */
  async run<T extends ComputeTask>(task: T): Promise<ComputeResult<T['kind']>> {
    this.pool ??= new Piscina({ filename: WORKER_FILE, maxThreads: Math.min(4, Math.max(1, availableParallelism())), minThreads: 0, idleTimeout: 30_000, execArgv: ['--import', 'tsx'] });
    const answer = (await this.pool.run(task)) as WorkerAnswer;
    if (!answer.ok) throw rebuild(answer.error);
    return answer.value as ComputeResult<T['kind']>;
  }

  async onApplicationShutdown(): Promise<void> {
    await this.pool?.destroy();
    this.pool = null;
  }
}
