import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { ApiError } from '../../lib/api-client';

function describe(error: unknown): { title: string; detail: string } {
  if (isRouteErrorResponse(error)) {
    if (error.status === 404) return { title: "We couldn't find that page", detail: 'The link may be old.' };
    return { title: `Something went wrong (${error.status})`, detail: error.statusText };
  }
  if (error instanceof ApiError) {
    if (error.isForbidden) return { title: "That isn't yours to see", detail: error.message };
    if (error.isNotFound) return { title: "We couldn't find that", detail: error.message };
    return { title: 'Something went wrong', detail: error.message };
  }
  return { title: 'Something went wrong', detail: 'Please reload the page. If it keeps happening, tell your club admin.' };
}

export function RouteError() {
  const { title, detail } = describe(useRouteError());
  return (
    <main role="alert" className="mx-auto max-w-md px-4 py-16 text-center">
      <h1 className="text-2xl font-extrabold text-tide-900">{title}</h1>
      <p className="mt-2 text-tide-700">{detail}</p>
      <Link to="/" className="mt-6 inline-flex min-h-touch items-center rounded-full bg-tide-700 px-5 font-bold text-white">
        Back to the start
      </Link>
    </main>
  );
}
