import { useLocation } from 'react-router';
import { ButtonLink } from '@client/components/ui/button';
import { PageTitle } from '@client/components/ui/page-title';

/** A link that leads nowhere: say so plainly and offer the places people usually meant. */
export function Component() {
  const { pathname } = useLocation();
  return (
    <section className="mx-auto max-w-md py-12 text-center">
      <PageTitle title="Page not found" />
      <p className="text-sm font-bold tracking-wide text-ink-muted uppercase">Page not found</p>
      <h1 className="mt-2 text-2xl font-extrabold text-ink">There is nothing at this address</h1>
      <p className="mt-2 text-ink-muted">
        <code className="rounded bg-tint px-1.5 py-0.5 text-sm break-all text-ink-soft">{pathname}</code> may
        be an old link, or a typing slip. Your tanks and tests are safe: nothing was lost.
      </p>
      <div className="mt-6 flex flex-wrap justify-center gap-2">
        <ButtonLink to="/tanks">Go to my tanks</ButtonLink>
        <ButtonLink to="/questions" variant="secondary">
          My questions
        </ButtonLink>
        <ButtonLink to="/" variant="ghost">
          Home
        </ButtonLink>
      </div>
    </section>
  );
}
