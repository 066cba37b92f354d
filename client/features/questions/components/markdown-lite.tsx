import { Fragment, type ReactNode } from 'react';
import { parseMarkdownLite, type Block, type Inline } from '../lib/markdown-lite';

/** External links never carry our page along, nor lend it any ranking. */
const EXTERNAL_REL = 'noopener noreferrer nofollow';

function renderInline(nodes: Inline[]): ReactNode {
  return nodes.map((n, i) => {
    switch (n.type) {
      case 'text':
        return <Fragment key={i}>{n.text}</Fragment>;
      case 'break':
        return <br key={i} />;
      case 'strong':
        return (
          <strong key={i} className="font-extrabold">
            {renderInline(n.children)}
          </strong>
        );
      case 'mention':
        return (
          <span key={i} className="rounded bg-tint-strong px-1 font-bold text-ink-soft">
            {n.text}
          </span>
        );
      case 'link':
        return (
          <a
            key={i}
            href={n.href}
            rel={EXTERNAL_REL}
            target={n.external ? '_blank' : undefined}
            className="font-bold text-link underline break-words"
          >
            {renderInline(n.children)}
          </a>
        );
    }
  });
}

function renderBlock(b: Block, i: number): ReactNode {
  if (b.type === 'paragraph') return <p key={i}>{renderInline(b.children)}</p>;
  const items = b.items.map((item, j) => <li key={j}>{renderInline(item)}</li>);
  return b.ordered ? (
    <ol key={i} className="list-decimal pl-6">
      {items}
    </ol>
  ) : (
    <ul key={i} className="list-disc pl-6">
      {items}
    </ul>
  );
}

/** A message as written, with links, lists and bold; every character of it reaches the page as text. */
export function MarkdownLite({
  text,
  mentionNames = [],
}: {
  text: string;
  mentionNames?: readonly string[];
}) {
  return (
    <div className="space-y-2 break-words text-ink">
      {parseMarkdownLite(text, mentionNames).map(renderBlock)}
    </div>
  );
}
