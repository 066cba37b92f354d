import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { ApiError } from '../../../lib/api-client';

function describe(error: unknown): { title: string; detail: string } {
  if (error instanceof ApiError && error.isForbidden) {
    return { title: "That isn't yours to see", detail: 'Questions are read by the keeper who asked, their mentor and the club admins.' };
  }
  if ((error instanceof ApiError && error.isNotFound) || (isRouteErrorResponse(error) && error.status === 404)) {
    return { title: "We couldn't find that question", detail: 'The link may be old, or the question belongs to another of your clubs: switch club and try again.' };
  }
  if (error instanceof ApiError) return { title: 'Something went wrong', detail: error.message };
  return { title: 'Something went wrong', detail: 'Please reload the page. If it keeps happening, tell your club admin.' };
}

/** Shown inside the app's frame, with a way back to the list. */
export function QuestionRouteError() {
  const { title, detail } = describe(useRouteError());
  return (
    <section role="alert" className="mx-auto max-w-md py-12 text-center">
      <h1 className="text-2xl font-extrabold text-tide-900">{title}</h1>
      <p className="mt-2 text-tide-700">{detail}</p>
      <Link to="/questions" className="mt-6 inline-flex min-h-touch items-center rounded-full bg-tide-700 px-5 font-bold text-white">
        Back to questions
      </Link>
    </section>
  );
}
