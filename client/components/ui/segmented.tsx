/** A row of buttons of which one is on: a period, a list's filter. */
export function Segmented<T extends string | number | null>({
  label,
  options,
  value,
  onChange,
  inline,
  className = '',
}: {
  label: string;
  options: readonly { value: T; label: string }[];
  value: T;
  onChange: (value: T) => void;
  inline?: boolean;
  className?: string;
}) {
  return (
    <div
      role="group"
      aria-label={label}
      className={`${inline ? 'inline-flex' : 'flex'} flex-wrap gap-1 rounded-full bg-surface p-1 shadow-card ${className}`}
    >
      {options.map((o) => (
        <button
          key={o.label}
          type="button"
          aria-pressed={value === o.value}
          onClick={() => onChange(o.value)}
          className={`min-h-touch rounded-full px-3 text-sm font-bold sm:px-4 ${value === o.value ? 'bg-accent text-on-accent' : 'text-link hover:bg-tint'}`}
        >
          {o.label}
        </button>
      ))}
    </div>
  );
}
