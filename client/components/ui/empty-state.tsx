import type { ReactNode } from 'react';

/** What an empty list says instead of nothing: what would be here, and what to do next. */
export function EmptyState({
  icon,
  title,
  children,
  action,
}: {
  icon?: ReactNode;
  title: string;
  children?: ReactNode;
  action?: ReactNode;
}) {
  return (
    <div className="flex flex-col items-center gap-2 rounded-card border-2 border-dashed border-line px-5 py-8 text-center">
      {icon ? (
        <span aria-hidden className="grid size-12 place-items-center rounded-full bg-tint text-link">
          {icon}
        </span>
      ) : null}
      <p className="text-lg font-extrabold text-ink">{title}</p>
      {children ? <div className="max-w-prose text-ink-muted">{children}</div> : null}
      {action ? <div className="mt-2">{action}</div> : null}
    </div>
  );
}
