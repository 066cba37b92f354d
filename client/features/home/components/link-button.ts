/** A link that looks like the app's buttons (for navigation, where a <button> would be wrong). */
export const LINK_BUTTON = {
  primary: 'inline-flex min-h-touch items-center justify-center gap-2 rounded-full bg-tide-700 px-5 font-bold text-white hover:bg-tide-800',
  secondary: 'inline-flex min-h-touch items-center justify-center gap-2 rounded-full bg-white px-5 font-bold text-tide-800 ring-1 ring-tide-200 hover:bg-tide-50',
} as const;
