import type { FieldError, FieldErrors, FieldValues, Resolver } from 'react-hook-form';
import type { z } from 'zod';
import type { FieldOf } from './form-errors';

export interface Issue {
  path: string;
  message: string;
}

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

export function issuesToErrors<T extends FieldValues>(
  issues: readonly Issue[],
  fieldOf: FieldOf,
): FieldErrors<T> {
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

const zodIssues = (error: z.ZodError): Issue[] =>
  error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }));

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
