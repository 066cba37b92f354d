import { isRouteErrorResponse, useRouteError } from 'react-router';
import { ButtonLink } from '@client/components/ui/button';
import { PageTitle } from '@client/components/ui/page-title';
import { ApiError } from '@client/lib/api-client';

interface Words {
  title: string;
  detail: string;
}

/** What a screen says instead of the generic words when the thing it shows is not the reader's, or not there. */
export interface RouteErrorWords {
  forbidden?: Words;
  notFound?: Words;
}

function describe(error: unknown, words: RouteErrorWords): Words {
  const notFound =
    (error instanceof ApiError && error.isNotFound) || (isRouteErrorResponse(error) && error.status === 404);
  if (error instanceof ApiError && error.isForbidden)
    return words.forbidden ?? { title: "That isn't yours to see", detail: error.message };
  if (notFound)
    return (
      words.notFound ??
      (error instanceof ApiError
        ? { title: "We couldn't find that", detail: error.message }
        : { title: "We couldn't find that page", detail: 'The link may be old.' })
    );
  if (isRouteErrorResponse(error))
    return { title: `Something went wrong (${error.status})`, detail: error.statusText };
  if (error instanceof ApiError) return { title: 'Something went wrong', detail: error.message };
  return {
    title: 'Something went wrong',
    detail: 'Please reload the page. If it keeps happening, tell your club admin.',
  };
}

function ErrorMessage({
  words,
  back,
  className,
}: {
  words: Words;
  back: { to: string; label: string };
  className: string;
}) {
  return (
    <div className={className}>
      <PageTitle title={words.title} />
      <h1 className="text-2xl font-extrabold text-ink">{words.title}</h1>
      <p className="mt-2 text-ink-muted">{words.detail}</p>
      <ButtonLink to={back.to} className="mt-6">
        {back.label}
      </ButtonLink>
    </div>
  );
}

/** The app's last resort: a whole page, with a way back to the start. */
export function RouteError() {
  return (
    <main role="alert" className="mx-auto max-w-md px-4 py-16 text-center">
      <ErrorMessage
        words={describe(useRouteError(), {})}
        back={{ to: '/', label: 'Back to the start' }}
        className=""
      />
    </main>
  );
}

/** What a screen shows when its data could not be had: a refusal or a missing record is an answer, not a crash. */
export function SectionError({
  error,
  words,
  back,
}: {
  error: unknown;
  words: RouteErrorWords;
  back: { to: string; label: string };
}) {
  return (
    <section role="alert">
      <ErrorMessage
        words={describe(error, words)}
        back={back}
        className="mx-auto max-w-md py-12 text-center"
      />
    </section>
  );
}

/** A route's error inside the app's frame, in the screen's own words, with a way back to its list. */
export function SectionRouteError(props: { words: RouteErrorWords; back: { to: string; label: string } }) {
  return <SectionError error={useRouteError()} {...props} />;
}
