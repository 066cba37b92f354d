import { useOnline } from '@client/lib/use-online';

/** Said once at the top while the phone has no network, so a keeper at the tank knows a save will not go through yet. */
export function OfflineBanner() {
  const online = useOnline();
  return (
    <div role="status" aria-live="polite">
      {online ? null : (
        <p className="bg-watch-soft px-4 py-2 text-center text-sm font-bold text-watch">
          <span aria-hidden>! </span>You are offline. What you type stays on this page; save once the
          connection is back.
        </p>
      )}
    </div>
  );
}
