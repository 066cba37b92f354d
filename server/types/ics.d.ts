import 'ics';

declare module 'ics' {
  /** Exported at run time (the package's own URL check) but missing from its type declarations. */
  export function isValidURL(url: string): boolean;
}
