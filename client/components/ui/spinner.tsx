export function Spinner({ label = 'Loading…' }: { label?: string }) {
  return (
    <span role="status" className="inline-flex items-center gap-2 text-tide-600">
      <span className="size-5 animate-spin rounded-full border-2 border-tide-200 border-t-tide-600" aria-hidden />
      <span className="text-sm">{label}</span>
    </span>
  );
}

export function FullPageSpinner() {
  return (
    <div className="grid min-h-dvh place-items-center">
      <Spinner />
    </div>
  );
}
