import type { ReactNode } from 'react';
import { TONES, type Tone } from './badge';
import { PageTitle } from './page-title';

/** A white (in dark mode, deep) panel: the unit every screen is built from. `title` gives it a heading. */
export function Card({
  children,
  title,
  actions,
  className = '',
}: {
  children: ReactNode;
  title?: ReactNode;
  actions?: ReactNode;
  className?: string;
}) {
  return (
    <section className={`rounded-card bg-surface p-5 shadow-card ring-1 ring-line ${className}`}>
      {title ? (
        <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
          <h2 className="text-lg font-extrabold text-ink">{title}</h2>
          {actions}
        </div>
      ) : null}
      {children}
    </section>
  );
}

type NoticeTone = 'info' | 'success' | 'warning' | 'error';
const NOTICE: Record<NoticeTone, { tone: Tone; mark: string }> = {
  info: { tone: 'info', mark: 'i' },
  success: { tone: 'ok', mark: '✓' },
  warning: { tone: 'watch', mark: '!' },
  error: { tone: 'danger', mark: '▲' },
};

/** A message in the page's flow; errors are announced at once, the rest politely. */
export function Notice({ tone = 'info', children }: { tone?: NoticeTone; children: ReactNode }) {
  const look = NOTICE[tone];
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      className={`flex gap-2 rounded-control px-4 py-3 text-sm font-semibold ring-1 ${TONES[look.tone]}`}
    >
      <span aria-hidden className="font-extrabold">
        {look.mark}
      </span>
      <div className="min-w-0 flex-1">{children}</div>
    </div>
  );
}

export function AuthCard({
  title,
  subtitle,
  children,
}: {
  title: string;
  subtitle?: string;
  children: ReactNode;
}) {
  return (
    <div className="mx-auto max-w-md">
      <Card>
        <PageTitle title={title} />
        <h1 className="text-2xl font-extrabold text-ink">{title}</h1>
        {subtitle ? <p className="mt-1 text-ink-muted">{subtitle}</p> : null}
        <div className="mt-5">{children}</div>
      </Card>
    </div>
  );
}
