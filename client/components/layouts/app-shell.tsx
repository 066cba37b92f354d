import type { ReactNode } from 'react';
import { NavLink, Outlet, useNavigation } from 'react-router';
import { OfflineBanner } from './offline-banner';
import { MAIN_ID, SkipLink } from './skip-link';

export interface NavItem {
  to: string;
  label: string;
  /** A shorter word for the phone's bottom bar, where six labels share 390 px. */
  short?: string;
  end?: boolean;
}

function Brand() {
  return (
    <NavLink to="/" className="flex items-center gap-2 font-extrabold text-on-chrome">
      <img src="/favicon.svg" alt="" className="size-8" />
      <span className="text-lg">Shoalwise</span>
    </NavLink>
  );
}

/** The same links in the header (wide screens) and the bottom bar (phones), each with its look. */
function NavLinks({
  nav,
  look,
  short,
}: {
  nav: NavItem[];
  look: (active: boolean) => string;
  short?: boolean;
}) {
  return nav.map((item) => (
    <NavLink
      key={item.to}
      to={item.to}
      end={item.end}
      aria-label={short && item.short ? item.label : undefined}
      className={({ isActive }) => look(isActive)}
    >
      {short ? (item.short ?? item.label) : item.label}
    </NavLink>
  ));
}

export function AppShell({ nav, headerEnd }: { nav: NavItem[]; headerEnd?: ReactNode }) {
  const navigation = useNavigation();
  return (
    <div className="min-h-dvh">
      <SkipLink />
      <header className="bg-chrome [--sw-focus:var(--sw-on-chrome)]">
        <div className="mx-auto flex max-w-5xl items-center justify-between gap-4 px-4 py-3">
          <Brand />
          <nav aria-label="Main" className="hidden gap-1 sm:flex">
            <NavLinks
              nav={nav}
              look={(on) =>
                `rounded-full px-3 py-2 text-sm font-bold ${on ? 'bg-chrome-active text-on-chrome' : 'text-on-chrome-muted hover:bg-chrome-active'}`
              }
            />
          </nav>
          {headerEnd}
        </div>
        {navigation.state === 'loading' ? (
          <div className="h-0.5 animate-pulse bg-on-chrome-muted" aria-hidden />
        ) : null}
      </header>
      <OfflineBanner />
      <main id={MAIN_ID} tabIndex={-1} className="mx-auto max-w-5xl px-4 pt-6 pb-24 outline-none sm:pb-10">
        <Outlet />
      </main>
      <nav
        aria-label="Main (mobile)"
        style={{ gridTemplateColumns: `repeat(${nav.length}, minmax(0, 1fr))` }}
        className="fixed inset-x-0 bottom-0 grid border-t border-line bg-surface sm:hidden"
      >
        <NavLinks
          nav={nav}
          short
          look={(on) =>
            `flex min-h-14 items-center justify-center border-t-4 text-xs font-bold ${on ? 'border-accent text-ink' : 'border-transparent text-ink-muted'}`
          }
        />
      </nav>
    </div>
  );
}
