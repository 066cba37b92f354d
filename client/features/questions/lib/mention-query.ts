/** The "@partial" being typed just before the caret, if any: where it starts and what it says so far. */
export function mentionAtCaret(text: string, caret: number): { start: number; query: string } | null {
  const before = text.slice(0, caret);
  const m = /(^|[\s(])@([^\s@]{0,30})$/u.exec(before);
  if (!m) return null;
  return { start: before.length - m[2]!.length - 1, query: m[2]! };
}

/** The text with the "@partial" at `start` replaced by "@Display Name ", and where the caret goes after it. */
export function insertMention(
  text: string,
  at: { start: number; query: string },
  displayName: string,
): { text: string; caret: number } {
  const insert = `@${displayName} `;
  const next = text.slice(0, at.start) + insert + text.slice(at.start + 1 + at.query.length);
  return { text: next, caret: at.start + insert.length };
}
