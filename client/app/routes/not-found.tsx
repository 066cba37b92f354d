import { Link } from 'react-router';

export function Component() {
  return (
    <section className="mx-auto max-w-md py-16 text-center">
      <p className="text-sm font-bold uppercase tracking-wide text-ink-muted">404</p>
      <h1 className="mt-2 text-2xl font-extrabold text-ink">We couldn't find that page</h1>
      <p className="mt-2 text-ink-muted">The link may be old, or the page may have moved.</p>
      <Link to="/" className="mt-6 inline-flex min-h-touch items-center rounded-full bg-accent px-5 font-bold text-on-accent">
        Back to the start
      </Link>
    </section>
  );
}
