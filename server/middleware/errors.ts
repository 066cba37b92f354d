import { ForbiddenError } from '@casl/ability';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { AppError, errors } from '../lib/app-error';
import { toFieldIssues } from './validate';

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError({ code: 'not_found', status: 404, message: `No API route ${req.method} ${req.path}.` }));
};

function isDatabaseDown(err: unknown): boolean {
  const e = err as { code?: string; message?: string };
  return (
    ['ECONNREFUSED', 'ECONNRESET', '57P01', '57P03', 'ETIMEDOUT'].includes(e?.code ?? '') ||
    /timeout exceeded when trying to connect|Connection terminated|connect ECONNREFUSED/i.test(
      e?.message ?? '',
    )
  );
}

function toAppError(err: unknown): AppError | undefined {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) return errors.badRequest('Some fields need attention.', toFieldIssues(err));
  if (err instanceof ForbiddenError) return errors.forbidden(err.message);
  const e = err as { type?: string; status?: number };
  if (e?.type === 'entity.too.large') return errors.tooLarge('The request is too large.');
  if (e?.type === 'entity.parse.failed') return errors.badRequest('The request body is not valid JSON.');
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500) {
    return new AppError({
      code: 'bad_request',
      status: e.status,
      message: 'The request could not be processed.',
    });
  }
  if (isDatabaseDown(err)) return errors.unavailable();
  return undefined;
}

/** One place that turns every error into `{ error: { code, message }, issues? }`; stack traces only in development. */
export function errorHandler(options: { exposeStack: boolean }): ErrorRequestHandler {
  return (err, req, res, _next) => {
    const known = toAppError(err);
    if (res.headersSent) return;
    if (known) {
      if (known.status >= 500) req.log?.warn({ err }, known.message);
      if (known.headers) res.set(known.headers);
      res.status(known.status).json({
        error: {
          code: known.code,
          message: known.message,
          ...(known.details ? { details: known.details } : {}),
        },
        ...(known.issues ? { issues: known.issues } : {}),
      });
      return;
    }
    req.log?.error({ err }, 'unhandled error');
    res.status(500).json({
      error: {
        code: 'internal',
        message: 'Something went wrong on our side. Please try again.',
        ...(options.exposeStack && err instanceof Error ? { stack: err.stack } : {}),
      },
    });
  };
}
