/** `hexloom worker`: takes Monte Carlo chunks of the team servers' yield jobs from the shared PostgreSQL queue. */
import { availableParallelism } from 'node:os';
import type { Command } from 'commander';
import { runQueueWorker } from '@hexloom/server/worker';
import { CliError } from '../cli-error.js';

type WorkerOptions = { databaseUrl?: string; threads?: string; quiet?: boolean };

/** The database URL of the option or of DATABASE_URL; only PostgreSQL server URLs (the embedded database has no queue). */
export function workerDatabaseUrl(option: string | undefined, env: NodeJS.ProcessEnv): string {
  const url = option ?? env['DATABASE_URL'];
  if (!url) throw new CliError('name the team servers\' PostgreSQL database with --database-url or DATABASE_URL (the embedded database has no shared queue)');
  if (!/^postgres(ql)?:\/\//.test(url)) throw new CliError(`--database-url must be a postgres:// or postgresql:// URL, got "${url.replace(/\/\/[^@/]*@/, '//...@')}"`);
  return url;
}

export function registerWorkerCommand(program: Command): void {
  program
    .command('worker')
    .description("Run Monte Carlo chunks of the team servers' yield jobs from their shared PostgreSQL database until stopped (Ctrl-C finishes the chunks in hand)")
    .option('--database-url <url>', 'PostgreSQL database the team servers share (default: DATABASE_URL)')
    .option('--threads <n>', 'chunks run at once, one per thread (default: all cores)')
    .option('--quiet', 'no line per chunk')
    .action(async (o: WorkerOptions) => {
      const databaseUrl = workerDatabaseUrl(o.databaseUrl, process.env);
      const threads = o.threads === undefined ? availableParallelism() : Number(o.threads);
      if (!(Number.isInteger(threads) && threads >= 1 && threads <= 256)) throw new CliError(`--threads must be an integer from 1 to 256, got "${o.threads}"`);
      let runs = 0;
      const started = performance.now();
      const worker = await runQueueWorker({
        databaseUrl,
        threads,
        onChunk: (c) => {
          runs += c.runs;
          if (o.quiet) return;
          const what = c.skipped ? 'skipped (job ended or chunk already done)' : `${c.runs} runs in ${c.seconds.toFixed(2)} s`;
          process.stderr.write(`job ${c.jobId} chunk ${c.chunkIndex}: ${what}\n`);
        },
      });
      process.stderr.write(`hexloom worker: taking yield chunks on ${threads} thread(s); Ctrl-C to stop\n`);
      await new Promise<void>((resolve) => {
        const stop = (): void => resolve();
        process.once('SIGINT', stop);
        process.once('SIGTERM', stop);
      });
      process.stderr.write('hexloom worker: finishing the chunks in hand...\n');
      await worker.stop();
      const seconds = (performance.now() - started) / 1000;
      process.stderr.write(`hexloom worker: stopped after ${runs} runs in ${seconds.toFixed(1)} s\n`);
    });
}
