import type { ReactNode } from 'react';

export type Tone = 'neutral' | 'info' | 'ok' | 'watch' | 'danger';

/** Soft background, strong text and a faint edge per tone: the colours every status in the app is drawn with. */
export const TONES: Record<Tone, string> = {
  neutral: 'bg-tint-strong text-ink-soft ring-line',
  info: 'bg-tint text-link ring-line',
  ok: 'bg-ok-soft text-ok ring-ok/30',
  watch: 'bg-watch-soft text-watch ring-watch/40',
  danger: 'bg-danger-soft text-danger ring-danger/40',
};

/**
 * A short status: always a word, with a mark (a shape) before it, so the meaning never rests on colour alone.
 * `title` explains the word on hover.
 */
export function Badge({
  tone = 'neutral',
  mark,
  title,
  children,
}: {
  tone?: Tone;
  mark?: ReactNode;
  title?: string;
  children: ReactNode;
}) {
  return (
    <span
      title={title}
      className={`inline-flex items-center gap-1 rounded-full px-2.5 py-0.5 text-xs font-extrabold ring-1 ${TONES[tone]}`}
    >
      {mark ? <span aria-hidden>{mark}</span> : null}
      {children}
    </span>
  );
}
