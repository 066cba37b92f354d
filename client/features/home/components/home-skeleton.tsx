/** The shape of the tank cards while the home loads, so nothing jumps when it arrives. */
export function HomeSkeleton() {
  return (
    <ul className="space-y-4" aria-label="Loading your tanks" aria-busy>
      {[0, 1].map((i) => (
        <li key={i} className="rounded-card bg-surface p-5 shadow-card">
          <div className="flex justify-between gap-3">
            <div className="h-5 w-1/2 animate-pulse rounded bg-tint-strong" />
            <div className="h-6 w-24 animate-pulse rounded-full bg-tint" />
          </div>
          <div className="mt-4 flex gap-2">
            <div className="h-7 w-28 animate-pulse rounded-full bg-tint" />
            <div className="h-7 w-28 animate-pulse rounded-full bg-tint" />
          </div>
          <div className="mt-3 h-14 animate-pulse rounded-full bg-tint-strong" />
        </li>
      ))}
    </ul>
  );
}
