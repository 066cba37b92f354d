import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'danger' | 'ghost';
const VARIANTS: Record<Variant, string> = {
  primary: 'bg-tide-700 text-white hover:bg-tide-800 disabled:bg-tide-300',
  secondary: 'bg-white text-tide-800 ring-1 ring-tide-200 hover:bg-tide-50 disabled:text-tide-300',
  danger: 'bg-ember-500 text-white hover:bg-ember-700 disabled:bg-ember-100',
  ghost: 'text-tide-700 hover:bg-tide-50',
};

export function Button({ variant = 'primary', className = '', busy, children, ...rest }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; busy?: boolean }) {
  return (
    <button
      {...rest}
      disabled={rest.disabled || busy}
      aria-busy={busy || undefined}
      className={`inline-flex min-h-touch items-center justify-center gap-2 rounded-full px-5 font-bold transition-colors disabled:cursor-not-allowed ${VARIANTS[variant]} ${className}`}
    >
      {busy ? <span className="size-4 animate-spin rounded-full border-2 border-current border-t-transparent" aria-hidden /> : null}
      {children}
    </button>
  );
}
