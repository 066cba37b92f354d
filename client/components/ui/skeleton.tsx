import type { ReactNode } from 'react';

/** A grey shape where content will be: the page keeps its layout while data arrives. */
export function Skeleton({ className = 'h-4 w-full' }: { className?: string }) {
  return (
    <span
      aria-hidden
      className={`block animate-pulse rounded-control bg-tint-strong motion-reduce:animate-none ${className}`}
    />
  );
}

/**
 * Placeholder shapes for something loading, announced once by its name ("Loading the tank…") rather than
 * read out shape by shape.
 */
export function Loading({ label, children }: { label: string; children?: ReactNode }) {
  return (
    <div role="status" aria-busy="true" className="space-y-3">
      <span className="sr-only">{label}</span>
      {children ?? (
        <>
          <Skeleton className="h-7 w-2/3" />
          <Skeleton className="h-4 w-full" />
          <Skeleton className="h-4 w-5/6" />
        </>
      )}
    </div>
  );
}

/** The usual shape of a page about one thing: a title, a line, then a few cards. */
export function PageSkeleton({ label }: { label: string }) {
  return (
    <Loading label={label}>
      <Skeleton className="h-8 w-1/2" />
      <Skeleton className="h-4 w-1/3" />
      <Skeleton className="h-40 w-full rounded-card" />
      <Skeleton className="h-40 w-full rounded-card" />
    </Loading>
  );
}

/** Before the app knows who is signed in: the frame of a page, quietly. */
export function FullPageLoading() {
  return (
    <div className="mx-auto max-w-5xl px-4 pt-20">
      <PageSkeleton label="Opening Shoalwise…" />
    </div>
  );
}
