export const MAIN_ID = 'main';

/** The first thing the keyboard reaches: straight past the header to the page itself. */
export function SkipLink() {
  return (
    <a
      href={`#${MAIN_ID}`}
      className="sr-only z-50 rounded-full bg-surface px-4 py-2 font-bold text-link shadow-card focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
    >
      Skip to the page
    </a>
  );
}
