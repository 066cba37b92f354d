/** How a message names someone: "@Display Name", at the start or after a space or bracket, ending at a word boundary. */

export interface Mentionable {
  userId: string;
  displayName: string;
}

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

function patternFor(name: string): RegExp {
  return new RegExp(`(^|[\\s(])@${escape(name)}(?=$|[\\s.,!?;:)'’])`, 'iu');
}

/** The people of `candidates` named with @ in `text`. Longer names win, so "@Ana Lee" is not also "@Ana". */
export function mentionedIn(text: string, candidates: readonly Mentionable[]): string[] {
  const found = new Set<string>();
  let rest = text;
  for (const person of [...candidates].sort((a, b) => b.displayName.length - a.displayName.length)) {
    const name = person.displayName.trim();
    if (!name) continue;
    const pattern = patternFor(name);
    if (pattern.test(rest)) {
      found.add(person.userId);
      rest = rest.replace(new RegExp(pattern.source, 'giu'), '$1');
    }
  }
  return [...found];
}

/** Where "@Name" mentions sit in a run of text, for highlighting: [start, end) of each, in order. */
export function mentionSpans(text: string, names: readonly string[]): { start: number; end: number }[] {
  const spans: { start: number; end: number }[] = [];
  for (const name of [...names].sort((a, b) => b.length - a.length)) {
    if (!name.trim()) continue;
    const re = new RegExp(patternFor(name.trim()).source, 'giu');
    for (const m of text.matchAll(re)) {
      const start = m.index + m[1]!.length;
      const end = start + 1 + name.trim().length;
      if (!spans.some((s) => start < s.end && end > s.start)) spans.push({ start, end });
    }
  }
  return spans.sort((a, b) => a.start - b.start);
}
