import type { ErrorRequestHandler, RequestHandler } from 'express';
import multer from 'multer';
import { ZodError } from 'zod';
import { AppError } from '../lib/app-error.ts';
import { logger } from '../lib/logger.ts';

type ErrorBody = {
  error: { code: string; message: string; issues?: { path: string; message: string }[]; requestId?: string };
};

/** Unknown API routes answer JSON, not the client's HTML. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'route-not-found', message: `No API route ${req.method} ${req.path}` } });
};

/** Database errors that mean the database is away, not that the request was wrong. */
function isDatabaseUnavailable(err: unknown): boolean {
  const name = (err as { name?: string })?.name ?? '';
  const code = (err as { parent?: { code?: string }; code?: string })?.parent?.code ?? (err as { code?: string })?.code;
  return (
    name === 'SequelizeConnectionError' ||
    name === 'SequelizeConnectionRefusedError' ||
    name === 'SequelizeConnectionAcquireTimeoutError' ||
    name === 'SequelizeHostNotReachableError' ||
    code === 'ECONNREFUSED' ||
    code === '57P01' || // admin_shutdown
    code === '57P03' // cannot_connect_now
  );
}

/**
 * The one place that maps errors to HTTP and logs them. Client mistakes get a
 * 4xx naming the problem; anything else a bare 5xx with the request id.
 */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const requestId = res.locals.requestId as string | undefined;
  const send = (status: number, body: ErrorBody, headers: Record<string, string> = {}) => {
    if (res.headersSent) return;
    for (const [k, v] of Object.entries(headers)) res.setHeader(k, v);
    res.status(status).json(body);
  };

  if (err instanceof ZodError) {
    const issues = err.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
    return send(400, {
      error: {
        code: 'validation-failed',
        message: `Check ${issues.map((i) => i.path || 'the request').join(', ')}`,
        issues,
      },
    });
  }
  if (err instanceof AppError) {
    if (err.httpStatus >= 500) logger.error({ err, requestId }, err.message);
    return send(err.httpStatus, { error: { code: err.code, message: err.message } }, err.headers);
  }
  if (err instanceof multer.MulterError) {
    const status = err.code === 'LIMIT_FILE_SIZE' ? 413 : 400;
    return send(status, { error: { code: `upload-${err.code.toLowerCase().replaceAll('_', '-')}`, message: err.message } });
  }
  // body-parser: malformed JSON, too large, wrong charset.
  const status = (err as { status?: number; statusCode?: number }).status ?? (err as { statusCode?: number }).statusCode;
  const type = (err as { type?: string }).type;
  if (status && status >= 400 && status < 500) {
    const code =
      type === 'entity.parse.failed'
        ? 'malformed-json'
        : type === 'entity.too.large'
          ? 'body-too-large'
          : (err as { code?: string }).code === 'EBADCSRFTOKEN'
            ? 'csrf-invalid'
            : 'bad-request';
    const message =
      code === 'malformed-json'
        ? 'The request body is not valid JSON'
        : code === 'csrf-invalid'
          ? 'This form has expired; reload the page and try again'
          : (err as Error).message;
    return send(status, { error: { code, message } });
  }
  if (isDatabaseUnavailable(err)) {
    logger.error({ err, requestId }, 'database unavailable');
    return send(
      503,
      { error: { code: 'database-unavailable', message: 'The database is not reachable; try again shortly', requestId } },
      { 'Retry-After': '5' },
    );
  }
  logger.error({ err, requestId, method: req.method, path: req.path }, 'unhandled error');
  return send(500, { error: { code: 'internal', message: 'Something went wrong on our side', requestId } });
};
