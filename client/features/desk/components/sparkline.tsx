/** A tiny line of the recent values; drawn as SVG so a row stays light. */
export function Sparkline({ points, label }: { points: { at: string; value: number }[]; label: string }) {
  if (points.length < 2)
    return <span className="text-xs text-ink-muted">{points.length === 1 ? '1 test' : 'no tests'}</span>;
  const w = 96;
  const h = 28;
  const values = points.map((p) => p.value);
  const min = Math.min(...values);
  const max = Math.max(...values);
  const span = max - min || 1;
  const d = points
    .map(
      (p, i) =>
        `${i === 0 ? 'M' : 'L'}${((i / (points.length - 1)) * (w - 4) + 2).toFixed(1)},${(h - 2 - ((p.value - min) / span) * (h - 4)).toFixed(1)}`,
    )
    .join(' ');
  const lastX = w - 2;
  const lastY = h - 2 - ((values.at(-1)! - min) / span) * (h - 4);
  return (
    <svg
      width={w}
      height={h}
      viewBox={`0 0 ${w} ${h}`}
      role="img"
      aria-label={label}
      className="text-ink-muted"
    >
      <path
        d={d}
        fill="none"
        stroke="currentColor"
        strokeWidth="2"
        strokeLinejoin="round"
        strokeLinecap="round"
      />
      <circle cx={lastX} cy={lastY} r="3" className="fill-danger" />
    </svg>
  );
}
