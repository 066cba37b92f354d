import { forwardRef, type InputHTMLAttributes, type ReactNode } from 'react';

const BASE =
  'flex cursor-pointer items-center justify-center gap-2 bg-surface text-center text-sm font-bold text-ink-soft ring-1 ring-line-strong has-[:checked]:bg-accent has-[:checked]:text-on-accent has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-focus';
const SHAPES = {
  pill: 'min-h-touch rounded-full px-3',
  tile: 'min-h-touch rounded-control px-2',
  'big-tile': 'min-h-14 rounded-control px-2',
} as const;

/**
 * One option of a radio (or checkbox) group drawn as a button-like tile: the input stays in the page for the
 * keyboard and screen readers, and its focus shows on the tile.
 */
export const Choice = forwardRef<
  HTMLInputElement,
  InputHTMLAttributes<HTMLInputElement> & { children: ReactNode; shape?: keyof typeof SHAPES }
>(function Choice({ children, shape = 'tile', type = 'radio', className = '', ...rest }, ref) {
  return (
    <label className={`${BASE} ${SHAPES[shape]} ${className}`}>
      <input ref={ref} type={type} className="sr-only" {...rest} />
      {children}
    </label>
  );
});
