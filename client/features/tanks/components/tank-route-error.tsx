import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { ApiError } from '../../../lib/api-client';

function describe(error: unknown): { title: string; detail: string } {
  if (error instanceof ApiError && error.isForbidden) {
    return { title: "That isn't yours to see", detail: 'This tank belongs to another member. Their mentor and the club admins can follow it; ask them if you think you should too.' };
  }
  if ((error instanceof ApiError && error.isNotFound) || (isRouteErrorResponse(error) && error.status === 404)) {
    return { title: "That isn't yours to see", detail: 'There is no such tank in your club: the link may be old, the tank may belong to another club, or it may be kept private to its owner.' };
  }
  if (error instanceof ApiError) return { title: 'Something went wrong', detail: error.message };
  return { title: 'Something went wrong', detail: 'Please reload the page. If it keeps happening, tell your club admin.' };
}

/** Route error for the tank pages: shown inside the app's frame, with a way back to the list. */
export function TankRouteError() {
  const { title, detail } = describe(useRouteError());
  return (
    <section role="alert" className="mx-auto max-w-md py-12 text-center">
      <h1 className="text-2xl font-extrabold text-tide-900">{title}</h1>
      <p className="mt-2 text-tide-700">{detail}</p>
      <Link to="/tanks" className="mt-6 inline-flex min-h-touch items-center rounded-full bg-tide-700 px-5 font-bold text-white">
        Back to my tanks
      </Link>
    </section>
  );
}
