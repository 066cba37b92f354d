import type { Verdict } from '@client/lib/bands';

const TONE: Record<Verdict['level'], string> = {
  ok: 'text-ok',
  caution: 'text-watch',
  danger: 'text-danger',
};

/** A shape per level (circle, triangle, octagon) so the meaning never rests on colour alone. */
export function VerdictIcon({ level, direction }: Pick<Verdict, 'level' | 'direction'>) {
  const common = {
    width: 18,
    height: 18,
    viewBox: '0 0 20 20',
    'aria-hidden': true,
    className: 'shrink-0',
  } as const;
  if (level === 'ok') {
    return (
      <svg {...common}>
        <circle cx="10" cy="10" r="9" fill="currentColor" />
        <path
          d="M5.5 10.5l3 3 6-6.5"
          stroke="white"
          strokeWidth="2.2"
          fill="none"
          strokeLinecap="round"
          strokeLinejoin="round"
        />
      </svg>
    );
  }
  if (level === 'caution') {
    return (
      <svg {...common}>
        <path d="M10 1.5l9 16.5H1z" fill="currentColor" />
        <path
          d={direction === 'low' ? 'M10 7v6m-2.5-2.5L10 13l2.5-2.5' : 'M10 14V8m-2.5 2.5L10 8l2.5 2.5'}
          stroke="white"
          strokeWidth="1.8"
          fill="none"
          strokeLinecap="round"
        />
      </svg>
    );
  }
  return (
    <svg {...common}>
      <path d="M6.2 1h7.6L19 6.2v7.6L13.8 19H6.2L1 13.8V6.2z" fill="currentColor" />
      <path d="M10 5v6.5" stroke="white" strokeWidth="2.2" strokeLinecap="round" />
      <circle cx="10" cy="14.8" r="1.3" fill="white" />
    </svg>
  );
}

export function VerdictLine({ verdict }: { verdict: Verdict }) {
  return (
    <p className={`flex items-start gap-1.5 text-sm font-semibold ${TONE[verdict.level]}`}>
      <VerdictIcon level={verdict.level} direction={verdict.direction} />
      <span>{verdict.text}</span>
    </p>
  );
}

export const verdictTone = (level: Verdict['level']) => TONE[level];
