import { Link } from 'react-router';

export function Component() {
  return (
    <section className="mx-auto max-w-md py-16 text-center">
      <p className="text-sm font-bold uppercase tracking-wide text-tide-600">404</p>
      <h1 className="mt-2 text-2xl font-extrabold text-tide-900">We couldn't find that page</h1>
      <p className="mt-2 text-tide-700">The link may be old, or the page may have moved.</p>
      <Link to="/" className="mt-6 inline-flex min-h-touch items-center rounded-full bg-tide-700 px-5 font-bold text-white">
        Back to the start
      </Link>
    </section>
  );
}
