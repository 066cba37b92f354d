import type { RequestHandler } from 'express';
import { errors, type FieldIssue } from '../lib/app-error';

const UNSTORABLE =
  'Contains a character that cannot be stored (a NUL character or a broken Unicode character).';
const MAX_LISTED = 20;

/** PostgreSQL text and jsonb refuse NUL; an unpaired surrogate would be stored as U+FFFD, silently changing the text. */
const UNPAIRED_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;
const storable = (s: string) => !s.includes('\u0000') && !UNPAIRED_SURROGATE.test(s);

/**
 * Every string in a parsed body or query, keys included, checked iteratively (a deeply nested body must not
 * overflow the stack). Returns the dotted paths of the strings PostgreSQL cannot store as sent.
 */
export function unstorableTextPaths(root: unknown, prefix: string): string[] {
  const found: string[] = [];
  const stack: [unknown, string][] = [[root, prefix]];
  while (stack.length && found.length < MAX_LISTED) {
    const [value, path] = stack.pop()!;
    if (typeof value === 'string') {
      if (!storable(value)) found.push(path || '(root)');
    } else if (value !== null && typeof value === 'object') {
      for (const [key, child] of Object.entries(value)) {
        const childPath = path ? `${path}.${key}` : key;
        if (!storable(key)) found.push(path || '(root)');
        else stack.push([child, childPath]);
      }
    }
  }
  return found;
}

/** Path segments as the router will decode them into params (a malformed escape is left to the router's own 400). */
function unstorablePathSegments(path: string): string[] {
  return path.split('/').some((segment) => {
    try {
      return !storable(decodeURIComponent(segment));
    } catch {
      return false;
    }
  })
    ? ['params']
    : [];
}

/**
 * One rule for every route, before any handler sees the input: text the database cannot store is a 400 naming the
 * field, never a failed query answered with a 500 (ASVS 1.2.x, 2.2.1). `ownRules` names top-level body fields whose
 * route checks them with a more helpful message of its own (a CSV file's binary content); mounted on that route's
 * prefix first, it marks the request checked so the app-wide guard passes it by.
 */
export function rejectUnstorableText(options: { ownRules?: string[] } = {}): RequestHandler {
  const own = new Set(options.ownRules ?? []);
  return (req, res, next) => {
    if (res.locals.storableTextChecked) return next();
    res.locals.storableTextChecked = true;
    const body =
      req.body !== null && typeof req.body === 'object' && !Array.isArray(req.body) && own.size
        ? Object.fromEntries(Object.entries(req.body as Record<string, unknown>).filter(([k]) => !own.has(k)))
        : req.body;
    const paths = [
      ...unstorablePathSegments(req.path),
      ...unstorableTextPaths(body, ''),
      ...unstorableTextPaths(req.query, 'query'),
    ];
    if (!paths.length) return next();
    const issues: FieldIssue[] = [...new Set(paths)].map((path) => ({ path, message: UNSTORABLE }));
    next(errors.badRequest('Some fields need attention.', issues));
  };
}
