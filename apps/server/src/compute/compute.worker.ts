/** Worker-thread entry: runs one compute task and answers its result, or its error as plain data. */
import { runComputeTask, type ComputeTask } from './compute-task.js';

/** An error as it crosses the thread boundary: its stable name, message, and a domain error's kind and issues. */
export type SerialisedError = { name: string; message: string; kind?: string; issues?: { path: string; message: string }[]; extra?: Record<string, unknown> };

export type WorkerAnswer = { ok: true; value: unknown } | { ok: false; error: SerialisedError };

export default function compute(task: ComputeTask): WorkerAnswer {
  try {
    return { ok: true, value: runComputeTask(task) };
  } catch (error) {
    const e = error as Error & { kind?: string; issues?: SerialisedError['issues']; extra?: Record<string, unknown> };
    return { ok: false, error: { name: e.name ?? 'Error', message: e.message ?? String(error), ...(e.kind ? { kind: e.kind } : {}), ...(e.issues ? { issues: e.issues } : {}), ...(e.extra ? { extra: e.extra } : {}) } };
  }
}
