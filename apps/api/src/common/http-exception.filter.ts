import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { QueryFailedError } from 'typeorm';
import { AuthedRequest } from './current-user';

const CODES: Record<number, string> = {
  400: 'bad_request',
  401: 'unauthorised',
  403: 'forbidden',
  404: 'not_found',
  409: 'conflict',
  413: 'too_large',
  415: 'unsupported_media_type',
  422: 'unprocessable',
  429: 'too_many_requests',
};

const RETRYABLE = new Set(['40P01', '40001', '55P03']);

/** Domain rule violations thrown by services; mapped to 409 or 422 with the rule's message. */
export class RuleViolation extends HttpException {
  constructor(message: string, code = 'rule_violation', status = HttpStatus.CONFLICT) {
    super({ message, code }, status);
  }
}

/** One shape for every error: `{statusCode, message, code}`; unknown errors become a generic 500. */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const ctx = host.switchToHttp();
    const res = ctx.getResponse<Response>();
    const req = ctx.getRequest<AuthedRequest>();
    let status = HttpStatus.INTERNAL_SERVER_ERROR;
    let message = 'Something went wrong on our side; it has been logged. Please try again.';
    let code = 'internal_error';

    if (exception instanceof HttpException) {
      status = exception.getStatus();
      const body = exception.getResponse();
      if (typeof body === 'string') {
        message = body;
      } else if (body && typeof body === 'object') {
        const b = body as { message?: unknown; code?: unknown };
        message = Array.isArray(b.message) ? b.message.join('; ') : String(b.message ?? exception.message);
        code = typeof b.code === 'string' ? b.code : (CODES[status] ?? 'error');
      }
      if (typeof body === 'string' || !(body as { code?: unknown }).code) {
        code = CODES[status] ?? 'error';
      }
    } else if (isBodyParserError(exception)) {
      status = exception.status;
      code = status === 413 ? 'too_large' : 'bad_request';
      message = status === 413 ? 'The request body is too large' : 'The request body is not valid JSON';
    } else if (exception instanceof QueryFailedError && (exception as { code?: string }).code === '22P02') {
      status = HttpStatus.BAD_REQUEST;
      code = 'bad_request';
      message = 'A value in the request has the wrong format';
    } else if (exception instanceof QueryFailedError && RETRYABLE.has((exception as { code?: string }).code ?? '')) {
      // Deadlock, serialisation failure or lock timeout: the transaction was rolled back whole,
      // so nothing changed and the same request can simply be sent again.
      status = HttpStatus.CONFLICT;
      code = 'retry';
      message = 'Someone else changed the same stock at the same moment; nothing was saved. Please try again.';
    }

    if (status >= 500) {
      this.logger.error(
        `${req.method} ${req.originalUrl} [${req.requestId ?? '-'}] ${exception instanceof Error ? (exception.stack ?? exception.message) : String(exception)}`,
      );
    }
    if (res.headersSent) {
      return;
    }
    res.status(status).json({ statusCode: status, message, code });
  }
}

function isBodyParserError(e: unknown): e is { status: number; type: string } {
  return !!e && typeof e === 'object' && 'type' in e && 'status' in e && typeof (e as { status: unknown }).status === 'number';
}
