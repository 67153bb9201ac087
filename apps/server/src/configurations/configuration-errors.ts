/** Domain errors of the configurations feature. */
import type { ConfigurationVersion } from '@hexloom/contracts';
import { DomainError } from '../common/domain-error.js';

/** A save based on a version that is no longer the newest; the answer carries the newer version. */
export class StaleVersionError extends DomainError {
  override readonly name = 'StaleVersionError';
  readonly kind = 'conflict';
  constructor(baseVersion: number, latest: ConfigurationVersion) {
    super(`The save is based on version ${baseVersion}, but version ${latest.number} is newer; merge your change into it and save again`, [{ path: 'baseVersion', message: `stale: the newest is ${latest.number}` }], { latest });
  }
}

/** A saved content whose mesh is not the chip's, or that breaks the configuration rules. */
export class InvalidContentError extends DomainError {
  override readonly name = 'InvalidContentError';
  readonly kind = 'unprocessable';
  constructor(message: string, issues?: { path: string; message: string }[]) {
    super(message, issues);
  }
}
