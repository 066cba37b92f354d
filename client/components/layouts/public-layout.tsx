import { Link, Outlet } from 'react-router';

export function PublicLayout() {
  return (
    <div className="min-h-dvh bg-chrome px-4 pb-12">
      <header className="mx-auto flex max-w-md items-center gap-2 py-6">
        <Link to="/" className="flex items-center gap-2 text-xl font-extrabold text-on-chrome">
          <img src="/favicon.svg" alt="" className="size-9" /> Shoalwise
        </Link>
      </header>
      <main>
        <Outlet />
      </main>
    </div>
  );
}
