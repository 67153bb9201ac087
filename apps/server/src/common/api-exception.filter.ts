/** The single exception filter: every error becomes the JSON ApiError shape. */
import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { ApiError } from '@hexloom/contracts';
import type { Response } from 'express';
import { DomainError, type DomainErrorKind } from './domain-error.js';

const STATUS_OF_KIND: Record<DomainErrorKind, number> = {
  invalid: HttpStatus.BAD_REQUEST,
  unauthorized: HttpStatus.UNAUTHORIZED,
  conflict: HttpStatus.CONFLICT,
  forbidden: HttpStatus.FORBIDDEN,
  not_found: HttpStatus.NOT_FOUND,
  unprocessable: HttpStatus.UNPROCESSABLE_ENTITY,
  too_large: HttpStatus.PAYLOAD_TOO_LARGE,
  unsupported: HttpStatus.UNSUPPORTED_MEDIA_TYPE,
  too_many: HttpStatus.TOO_MANY_REQUESTS,
};

/** Typed errors of the computing libraries (stable names); their message names the bad value, so they are 422s. */
const LIBRARY_ERRORS = new Set(['MeshError', 'NetlistError', 'SolverInputError', 'SynthInputError', 'BenchInputError', 'SpectrumFileError']);

const REASON: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  409: 'Conflict',
  413: 'Payload Too Large',
  415: 'Unsupported Media Type',
  422: 'Unprocessable Entity',
  429: 'Too Many Requests',
  500: 'Internal Server Error',
};

/** Longest error message the log keeps; database errors quote the whole query and its parameters. */
const LOG_MESSAGE_CHARS = 300;

/**
 * An unexpected error for the log: its name, the first line of its message cut to 300 characters, and the code frames
 * of its stack — never request bodies, query parameters or whatever else a message quotes past that.
 */
export function describeForLog(exception: unknown): string {
  if (!(exception instanceof Error)) return `non-error thrown: ${typeof exception}`;
  const first = (exception.message.split('\n')[0] ?? '').slice(0, LOG_MESSAGE_CHARS);
  const frames = (exception.stack ?? '').split('\n').filter((l) => /^\s+at /.test(l)).slice(0, 12);
  return [`${exception.name}: ${first}${exception.message.length > first.length ? ' [...]' : ''}`, ...frames].join('\n');
}

/** Maps domain errors by kind (with their extra members), library input errors to 422, Nest HTTP exceptions by status, anything else to a logged 500. */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const res = host.switchToHttp().getResponse<Response>();
    const body = this.toApiError(exception);
    if (res.headersSent) return;
    // A handler may have set another Content-Type (the HTML sign-in page) before failing.
    res.status(body.statusCode).type('application/json').json(body);
  }

  private toApiError(exception: unknown): ApiError & Record<string, unknown> {
    if (exception instanceof DomainError) {
      const statusCode = STATUS_OF_KIND[exception.kind];
      return {
        statusCode,
        error: REASON[statusCode] ?? 'Error',
        message: exception.message,
        ...(exception.issues ? { issues: exception.issues } : {}),
        ...exception.extra,
      };
    }
    if (exception instanceof Error && LIBRARY_ERRORS.has(exception.name)) {
      return { statusCode: 422, error: REASON[422] ?? 'Error', message: exception.message };
    }
    if (exception instanceof HttpException) {
      const statusCode = exception.getStatus();
      const response = exception.getResponse();
      const message =
        typeof response === 'string'
          ? response
          : typeof (response as { message?: unknown }).message === 'string'
            ? (response as { message: string }).message
            : exception.message;
      return { statusCode, error: REASON[statusCode] ?? exception.name, message };
    }
    this.logger.error(describeForLog(exception));
    return { statusCode: 500, error: REASON[500] ?? 'Error', message: 'Internal server error' };
  }
}
