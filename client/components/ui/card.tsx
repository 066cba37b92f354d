import type { ReactNode } from 'react';

export function Card({ children, className = '' }: { children: ReactNode; className?: string }) {
  return <section className={`rounded-card bg-white p-5 shadow-card ${className}`}>{children}</section>;
}

export function Notice({ tone = 'info', children }: { tone?: 'info' | 'success' | 'warning' | 'error'; children: ReactNode }) {
  const tones = {
    info: 'bg-tide-50 text-tide-800 ring-tide-200',
    success: 'bg-kelp-100 text-kelp-700 ring-kelp-500/30',
    warning: 'bg-amber-100 text-amber-700 ring-amber-500/30',
    error: 'bg-ember-100 text-ember-700 ring-ember-500/30',
  } as const;
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`rounded-xl px-4 py-3 text-sm font-semibold ring-1 ${tones[tone]}`}>
      {children}
    </div>
  );
}

export function AuthCard({ title, subtitle, children }: { title: string; subtitle?: string; children: ReactNode }) {
  return (
    <div className="mx-auto max-w-md">
      <Card>
        <h1 className="text-2xl font-extrabold text-tide-900">{title}</h1>
        {subtitle ? <p className="mt-1 text-tide-700">{subtitle}</p> : null}
        <div className="mt-5">{children}</div>
      </Card>
    </div>
  );
}
