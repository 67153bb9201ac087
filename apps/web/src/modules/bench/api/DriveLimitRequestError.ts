// The 422 of a bench export whose drive values exceed the chip's limits, with each shifter listed.
import type { driveViolationSchema } from '@hexloom/contracts';
import type { z } from 'zod';
import { ApiRequestError } from '../../core/api/ApiRequestError.js';

/** One shifter beyond its power (W) or voltage (V) limit. */
export type DriveViolationBody = z.infer<typeof driveViolationSchema>;

/** An ApiRequestError (422) that also carries the server's list of violations and the cautions. */
export class DriveLimitRequestError extends ApiRequestError {
  /** Every shifter whose drive would exceed its limit. */
  readonly violations: readonly DriveViolationBody[];
  /** The cautions the server sent with the refusal. */
  readonly cautions: readonly string[];

  constructor(params: { message: string; request: string; violations: readonly DriveViolationBody[]; cautions: readonly string[] }) {
    super({ statusCode: 422, error: 'Unprocessable Entity', message: params.message, request: params.request });
    this.violations = params.violations;
    this.cautions = params.cautions;
  }
}
