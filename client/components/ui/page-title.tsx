/** The browser tab's title for the page on screen (React puts it in <head>); the app's name comes last. */
export function PageTitle({ title }: { title: string }) {
  return <title>{`${title} · Shoalwise`}</title>;
}
