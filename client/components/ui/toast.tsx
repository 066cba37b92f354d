import { createContext, useCallback, useContext, useMemo, useRef, useState, type ReactNode } from 'react';
import { TONES } from './badge';

export type ToastTone = 'success' | 'error';
interface ToastItem {
  id: number;
  tone: ToastTone;
  message: string;
}

const ToastContext = createContext<((message: string, tone?: ToastTone) => void) | null>(null);

/** How long a toast stays: long enough to read two lines, short enough not to cover the bottom bar for good. */
const SHOW_MS = 6_000;
const LOOK: Record<ToastTone, { className: string; mark: string }> = {
  success: { className: TONES.ok, mark: '✓' },
  error: { className: TONES.danger, mark: '▲' },
};

/**
 * Short messages after an action ("Saved", "Could not save"). The live regions exist before any message, so
 * screen readers announce each one: saves politely, failures at once.
 */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [items, setItems] = useState<ToastItem[]>([]);
  const next = useRef(0);
  const dismiss = useCallback((id: number) => setItems((all) => all.filter((t) => t.id !== id)), []);
  const show = useCallback(
    (message: string, tone: ToastTone = 'success') => {
      const id = ++next.current;
      setItems((all) => [...all.slice(-2), { id, tone, message }]);
      setTimeout(() => dismiss(id), SHOW_MS);
    },
    [dismiss],
  );
  const region = (tone: ToastTone) => (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      aria-live={tone === 'error' ? 'assertive' : 'polite'}
      className="contents"
    >
      {items
        .filter((t) => t.tone === tone)
        .map((t) => (
          <div
            key={t.id}
            className={`pointer-events-auto flex items-start gap-2 rounded-control px-4 py-3 text-sm font-bold shadow-card ring-1 ${LOOK[tone].className}`}
          >
            <span aria-hidden>{LOOK[tone].mark}</span>
            <p className="flex-1">{t.message}</p>
            <button
              type="button"
              onClick={() => dismiss(t.id)}
              className="-my-1 rounded-full px-2 text-base leading-none"
              aria-label="Dismiss"
            >
              ×
            </button>
          </div>
        ))}
    </div>
  );
  return (
    <ToastContext.Provider value={show}>
      {children}
      <div className="pointer-events-none fixed inset-x-3 bottom-20 z-50 mx-auto flex max-w-md flex-col gap-2 sm:bottom-6">
        {region('error')}
        {region('success')}
      </div>
    </ToastContext.Provider>
  );
}

/** `toast.success('Test saved')`, `toast.error('Could not save: …')`. */
export function useToast() {
  const show = useContext(ToastContext);
  if (!show) throw new Error('useToast outside ToastProvider');
  return useMemo(
    () => ({
      success: (message: string) => show(message, 'success'),
      error: (message: string) => show(message, 'error'),
    }),
    [show],
  );
}
