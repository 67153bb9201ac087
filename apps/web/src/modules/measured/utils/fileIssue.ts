// A reader's error as a line number and a reason in words.
import { SpectrumFileError } from '@hexloom/solver';

/** One problem of a measured file; `line` is 1-based, null when the problem is the whole file. */
export type MeasuredFileIssue = { line: number | null; reason: string };

/** SpectrumFileError "csv line 3: column amplitude_db has "x", not a number" -> { line: 3, reason: 'column amplitude_db has …' }. */
export function fileIssue(error: unknown): MeasuredFileIssue {
  if (error instanceof SpectrumFileError) return { line: error.line, reason: error.message.replace(/^\S+ line \d+: /, '') };
  return { line: null, reason: error instanceof Error ? error.message : String(error) };
}
