import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';
import { errors, type FieldIssue } from '../lib/app-error';

interface Schemas {
  body?: z.ZodType;
  query?: z.ZodType;
  params?: z.ZodType;
}

type Parsed<S extends Schemas> = {
  [K in keyof S]: S[K] extends z.ZodType ? z.output<S[K]> : never;
};

export function toFieldIssues(error: z.ZodError, prefix?: string): FieldIssue[] {
  return error.issues.map((i) => ({
    path: [prefix, ...i.path.map(String)].filter(Boolean).join('.') || '(root)',
    message: i.message,
  }));
}

/** Parses one part of a request or throws a 400 naming each bad field. */
export function parseInput<T extends z.ZodType>(schema: T, data: unknown, part: string): z.output<T> {
  const result = schema.safeParse(data ?? {});
  if (!result.success) {
    throw errors.badRequest(
      'Some fields need attention.',
      toFieldIssues(result.error, part === 'body' ? undefined : part),
    );
  }
  return result.data;
}

/** Validates body/query/params with zod; the parsed values land in `res.locals.input`. */
export function validate<S extends Schemas>(schemas: S): RequestHandler {
  return (req: Request, res: Response, next: NextFunction) => {
    const input: Record<string, unknown> = {};
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (schema) input[part] = parseInput(schema, req[part], part);
    }
    res.locals.input = input;
    next();
  };
}

/** The parsed input of a route that used `validate(schemas)`. */
export function inputOf<S extends Schemas>(res: Response, _schemas: S): Parsed<S> {
  return res.locals.input as Parsed<S>;
}
