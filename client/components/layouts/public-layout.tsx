import { Link, Outlet } from 'react-router';
import { OfflineBanner } from './offline-banner';
import { MAIN_ID, SkipLink } from './skip-link';

export function PublicLayout() {
  return (
    <div className="min-h-dvh bg-chrome pb-12">
      <SkipLink />
      <OfflineBanner />
      <header className="mx-auto flex max-w-md items-center gap-2 px-4 py-6 [--sw-focus:var(--sw-on-chrome)]">
        <Link to="/" className="flex items-center gap-2 text-xl font-extrabold text-on-chrome">
          <img src="/favicon.svg" alt="" className="size-9" /> Shoalwise
        </Link>
      </header>
      <main id={MAIN_ID} tabIndex={-1} className="px-4 outline-none">
        <Outlet />
      </main>
    </div>
  );
}
