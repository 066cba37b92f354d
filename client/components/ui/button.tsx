import type { ButtonHTMLAttributes } from 'react';
import { Link, type LinkProps } from 'react-router';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'ghost';
const VARIANTS: Record<ButtonVariant, string> = {
  primary: 'bg-accent text-on-accent hover:bg-accent-hover',
  secondary: 'bg-surface text-ink-soft ring-1 ring-line-strong hover:bg-tint',
  danger: 'bg-danger-solid text-on-danger hover:opacity-90',
  ghost: 'text-link hover:bg-tint',
};
const SIZES = { md: 'min-h-touch px-5', lg: 'min-h-14 px-6 text-lg' } as const;

/** The look of every button, and of links that act as one. */
export const buttonClass = (variant: ButtonVariant = 'primary', size: keyof typeof SIZES = 'md') =>
  `inline-flex items-center justify-center gap-2 rounded-full font-bold transition-colors disabled:cursor-not-allowed disabled:opacity-50 ${SIZES[size]} ${VARIANTS[variant]}`;

type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: ButtonVariant;
  size?: keyof typeof SIZES;
  busy?: boolean;
};

export function Button({
  variant,
  size,
  className = '',
  busy,
  children,
  type = 'button',
  ...rest
}: ButtonProps) {
  return (
    <button
      {...rest}
      type={type}
      disabled={rest.disabled || busy}
      aria-busy={busy || undefined}
      className={`${buttonClass(variant, size)} ${className}`}
    >
      {busy ? (
        <span
          className="size-4 animate-spin rounded-full border-2 border-current border-t-transparent"
          aria-hidden
        />
      ) : null}
      {children}
    </button>
  );
}

/** A link that looks like a button: it goes somewhere rather than doing something. */
export function ButtonLink({
  variant,
  size,
  className = '',
  ...rest
}: LinkProps & { variant?: ButtonVariant; size?: keyof typeof SIZES }) {
  return <Link {...rest} className={`${buttonClass(variant, size)} ${className}`} />;
}
