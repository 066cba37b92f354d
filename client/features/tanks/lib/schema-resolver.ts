import type { FieldError, FieldErrors, FieldValues, Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { ApiError } from '../../../lib/api-client';

export interface Issue {
  path: string;
  message: string;
}

/** Maps an API/schema path to the form field showing it; null puts the message at the top of the form. */
export type FieldOf = (path: string) => string | null;

function setAt(target: Record<string, unknown>, path: string, error: FieldError): void {
  const parts = path.split('.');
  let node = target;
  for (const part of parts.slice(0, -1)) {
    node[part] ??= {};
    node = node[part] as Record<string, unknown>;
  }
  const leaf = parts[parts.length - 1]!;
  if (!node[leaf]) node[leaf] = error;
}

export function issuesToErrors<T extends FieldValues>(issues: readonly Issue[], fieldOf: FieldOf): FieldErrors<T> {
  const errors: Record<string, unknown> = {};
  const top: string[] = [];
  for (const issue of issues) {
    const field = fieldOf(issue.path);
    if (field) setAt(errors, field, { type: 'schema', message: issue.message });
    else if (!top.includes(issue.message)) top.push(issue.message);
  }
  if (top.length) errors.root = { type: 'schema', message: top.join(' ') };
  return errors as FieldErrors<T>;
}

const zodIssues = (error: z.ZodError): Issue[] => error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }));

/**
 * A react-hook-form resolver that checks the form with a shared zod schema: the form's strings become the API
 * input, the schema judges it (the same schema the server validates with), and each issue lands on its field.
 * `extra` adds checks beyond the schema that the server also makes (e.g. the shared normalizer's errors).
 */
export function schemaResolver<TForm extends FieldValues, TSchema extends z.ZodType>(
  schema: TSchema,
  toInput: (values: TForm) => unknown,
  fieldOf: (path: string, values: TForm) => string | null,
  extra?: (parsed: z.output<TSchema>) => Issue[],
): Resolver<TForm, unknown, z.output<TSchema>> {
  return (values) => {
    const parsed = schema.safeParse(toInput(values));
    const issues = parsed.success ? (extra?.(parsed.data) ?? []) : zodIssues(parsed.error);
    if (parsed.success && issues.length === 0) return { values: parsed.data, errors: {} };
    return { values: {}, errors: issuesToErrors<TForm>(issues, (path) => fieldOf(path, values)) };
  };
}

/** Puts a server 400's issues on the form's fields; returns the message for the top of the form, if any is left. */
export function placeServerIssues(
  error: unknown,
  fieldOf: FieldOf,
  setError: (name: string, error: { type: string; message: string }) => void,
): string | undefined {
  if (!(error instanceof ApiError)) return 'Could not reach Shoalwise. Check your connection and try again: what you entered is still here.';
  let unplaced = error.issues.length === 0;
  for (const issue of error.issues) {
    const field = fieldOf(issue.path);
    if (field) setError(field, { type: 'server', message: issue.message });
    else unplaced = true;
  }
  return unplaced ? error.message : undefined;
}
