const show = (v: unknown): string => {
  if (Array.isArray(v) && v.length === 2 && v.every((x) => typeof x === 'number')) return `${v[0]}–${v[1]}`;
  if (v === undefined) return '(none)';
  return typeof v === 'object' ? JSON.stringify(v) : String(v);
};

const isLeaf = (v: unknown) =>
  v === null || typeof v !== 'object' || (Array.isArray(v) && v.every((x) => typeof x !== 'object'));

/** What changed between two versions of a profile, one line per changed value, for the history. */
export function describeChanges(before: unknown, after: unknown, path = ''): string[] {
  if (isLeaf(before) || isLeaf(after)) {
    return JSON.stringify(before) === JSON.stringify(after)
      ? []
      : [`${path || '(profile)'}: ${show(before)} → ${show(after)}`];
  }
  const a = before as Record<string, unknown>;
  const b = after as Record<string, unknown>;
  const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].sort();
  return keys.flatMap((k) => describeChanges(a[k], b[k], path ? `${path}.${k}` : k));
}
