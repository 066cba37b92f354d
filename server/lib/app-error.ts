export interface FieldIssue {
  path: string;
  message: string;
}

export interface AppErrorOptions {
  code: string;
  status: number;
  message: string;
  issues?: FieldIssue[];
  details?: Record<string, unknown>;
  headers?: Record<string, string>;
}

/** An error the API shows to the caller as `{ error: { code, message, issues? } }`. */
export class AppError extends Error {
  readonly code: string;
  readonly status: number;
  readonly issues: FieldIssue[] | undefined;
  readonly details: Record<string, unknown> | undefined;
  readonly headers: Record<string, string> | undefined;

  constructor(options: AppErrorOptions) {
    super(options.message);
    this.name = 'AppError';
    this.code = options.code;
    this.status = options.status;
    this.issues = options.issues;
    this.details = options.details;
    this.headers = options.headers;
  }
}

export const errors = {
  badRequest: (message: string, issues?: FieldIssue[]) =>
    new AppError({ code: 'bad_request', status: 400, message, issues }),
  unauthenticated: (message = 'Please sign in.') =>
    new AppError({ code: 'unauthenticated', status: 401, message }),
  forbidden: (message = 'You are not allowed to do that.') =>
    new AppError({ code: 'forbidden', status: 403, message }),
  notFound: (what = 'That') =>
    new AppError({ code: 'not_found', status: 404, message: `${what} was not found.` }),
  conflict: (message: string) => new AppError({ code: 'conflict', status: 409, message }),
  gone: (message: string) => new AppError({ code: 'gone', status: 410, message }),
  tooLarge: (message: string) => new AppError({ code: 'too_large', status: 413, message }),
  unprocessable: (message: string) => new AppError({ code: 'unprocessable', status: 422, message }),
  tooMany: (retryAfterSeconds: number) =>
    new AppError({
      code: 'rate_limited',
      status: 429,
      message: `Too many attempts. Try again in ${Math.ceil(retryAfterSeconds / 60)} minute(s).`,
      headers: { 'Retry-After': String(Math.ceil(retryAfterSeconds)) },
    }),
  unavailable: (message = 'The service is briefly unavailable. Please try again shortly.') =>
    new AppError({ code: 'unavailable', status: 503, message }),
};
