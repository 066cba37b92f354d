/** A link that looks like the app's buttons (for navigation, where a <button> would be wrong). */
export const LINK_BUTTON = {
  primary:
    'inline-flex min-h-touch items-center justify-center gap-2 rounded-full bg-accent px-5 font-bold text-on-accent hover:bg-accent-hover',
  secondary:
    'inline-flex min-h-touch items-center justify-center gap-2 rounded-full bg-surface px-5 font-bold text-ink-soft ring-1 ring-line-strong hover:bg-tint',
} as const;
