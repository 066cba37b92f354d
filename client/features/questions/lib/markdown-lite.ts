import { mentionSpans } from '@shared/questions/mentions';

/**
 * A tiny subset of Markdown for threads: paragraphs, line breaks, "- " and "1. " lists, **bold**, [links](url) and
 * bare http(s) addresses, plus "@Name" mentions. It yields a tree the renderer turns into React elements, so text is
 * always text: there is no HTML in or out.
 */
export type Inline =
  | { type: 'text'; text: string }
  | { type: 'strong'; children: Inline[] }
  | { type: 'link'; href: string; external: boolean; children: Inline[] }
  | { type: 'mention'; text: string }
  | { type: 'break' };

export type Block =
  { type: 'paragraph'; children: Inline[] } | { type: 'list'; ordered: boolean; items: Inline[][] };

const BULLET = /^\s*[-*]\s+(.*)$/;
const NUMBERED = /^\s*\d{1,3}[.)]\s+(.*)$/;
const BARE_URL_TRAILING = /[.,;:!?'’"”]+$/;

/** Only http(s) addresses and paths inside the app ("/tanks/…", not "//elsewhere"); anything else is no link. */
export function safeHref(raw: string): { href: string; external: boolean } | null {
  const url = raw.trim();
  // Control characters and spaces can smuggle a scheme past a naive check.
  if (!url || /\s/.test(url) || [...url].some((c) => c.charCodeAt(0) < 0x20 || c.charCodeAt(0) === 0x7f))
    return null;
  if (/^\/(?![/\\])/.test(url)) return { href: url, external: false };
  if (!/^https?:\/\//i.test(url)) return null;
  try {
    const parsed = new URL(url);
    return parsed.protocol === 'http:' || parsed.protocol === 'https:'
      ? { href: parsed.href, external: true }
      : null;
  } catch {
    return null;
  }
}

function withMentions(text: string, names: readonly string[]): Inline[] {
  const out: Inline[] = [];
  let at = 0;
  for (const { start, end } of mentionSpans(text, names)) {
    if (start > at) out.push({ type: 'text', text: text.slice(at, start) });
    out.push({ type: 'mention', text: text.slice(start, end) });
    at = end;
  }
  if (at < text.length) out.push({ type: 'text', text: text.slice(at) });
  return out;
}

/** Links and bare addresses within a run that has no bold in it. */
function linksIn(text: string, names: readonly string[]): Inline[] {
  const out: Inline[] = [];
  const pattern = /\[([^\]\n]{1,200})\]\(([^)\s]{1,2000})\)|https?:\/\/[^\s<>()[\]]+/gi;
  let at = 0;
  for (const m of text.matchAll(pattern)) {
    let source = m[0];
    let label = m[1];
    let target = m[2];
    if (label === undefined) {
      // A sentence's full stop after an address is not part of it.
      source = source.replace(BARE_URL_TRAILING, '');
      label = source;
      target = source;
    }
    const safe = safeHref(target!);
    if (!safe) continue; // left as the text the person typed
    if (m.index > at) out.push(...withMentions(text.slice(at, m.index), names));
    out.push({
      type: 'link',
      href: safe.href,
      external: safe.external,
      children: [{ type: 'text', text: label }],
    });
    at = m.index + source.length;
  }
  if (at < text.length) out.push(...withMentions(text.slice(at), names));
  return out;
}

export function parseInline(text: string, names: readonly string[] = []): Inline[] {
  const out: Inline[] = [];
  const pattern = /\*\*(?=\S)([^*]+?)\*\*/g;
  let at = 0;
  for (const m of text.matchAll(pattern)) {
    if (m.index > at) out.push(...linksIn(text.slice(at, m.index), names));
    out.push({ type: 'strong', children: linksIn(m[1]!, names) });
    at = m.index + m[0].length;
  }
  if (at < text.length) out.push(...linksIn(text.slice(at), names));
  return out;
}

function paragraph(lines: string[], names: readonly string[]): Block {
  const children: Inline[] = [];
  lines.forEach((line, i) => {
    if (i > 0) children.push({ type: 'break' });
    children.push(...parseInline(line, names));
  });
  return { type: 'paragraph', children };
}

/** `names`: display names to mark as mentions. */
export function parseMarkdownLite(source: string, names: readonly string[] = []): Block[] {
  const blocks: Block[] = [];
  let lines: string[] = [];
  let list: { ordered: boolean; items: Inline[][] } | null = null;
  const flush = () => {
    if (lines.length) blocks.push(paragraph(lines, names));
    if (list) blocks.push({ type: 'list', ...list });
    lines = [];
    list = null;
  };
  for (const line of source.replace(/\r\n?/g, '\n').split('\n')) {
    const bullet = BULLET.exec(line);
    const numbered = bullet ? null : NUMBERED.exec(line);
    const item = bullet ?? numbered;
    if (item) {
      const ordered = Boolean(numbered);
      if (lines.length || (list && list.ordered !== ordered)) flush();
      list ??= { ordered, items: [] };
      list.items.push(parseInline(item[1]!, names));
    } else if (!line.trim()) {
      flush();
    } else {
      if (list) flush();
      lines.push(line.trim());
    }
  }
  flush();
  return blocks;
}
