/**
 * The one error type services throw for expected failures. The error handler
 * turns it into `{ error: { code, message } }` with `httpStatus`.
 */
export class AppError extends Error {
  readonly code: string;
  readonly httpStatus: number;
  readonly isOperational: boolean;
  readonly headers: Record<string, string>;

  constructor(
    code: string,
    message: string,
    httpStatus: number,
    options: { isOperational?: boolean; cause?: unknown; headers?: Record<string, string> } = {},
  ) {
    super(message, { cause: options.cause });
    this.name = 'AppError';
    this.code = code;
    this.httpStatus = httpStatus;
    this.isOperational = options.isOperational ?? true;
    this.headers = options.headers ?? {};
  }
}

export const notFound = (what: string, code = 'not-found') => new AppError(code, `${what} not found`, 404);
export const forbidden = (message = 'You cannot do that in this workshop') => new AppError('forbidden', message, 403);
