/** A determinate bar when the share is known, an indeterminate stripe when it is not. */
export function ProgressBar({ label, fraction }: { label: string; fraction: number | null }) {
  const pct = fraction === null ? null : Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <div>
      <div className="flex justify-between text-sm font-bold text-ink-soft">
        <span>{label}</span>
        {pct !== null ? <span>{pct} %</span> : null}
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={pct ?? undefined}
        className="mt-1 h-3 overflow-hidden rounded-full bg-tint-strong"
      >
        <div
          className={`h-full rounded-full bg-accent transition-[width] duration-300 ${pct === null ? 'w-1/3 animate-pulse' : ''}`}
          style={pct === null ? undefined : { width: `${pct}%` }}
        />
      </div>
    </div>
  );
}
