import { useEffect, useState } from 'react';

/**
 * Text kept in sessionStorage while it is being written, so a failed send, a reload or a detour to another page
 * never loses it. `clear()` after a successful send.
 */
export function useDraft(key: string): [string, (v: string) => void, () => void] {
  const storageKey = `shoalwise.draft.${key}`;
  const [value, setValue] = useState(() => {
    try {
      return sessionStorage.getItem(storageKey) ?? '';
    } catch {
      return '';
    }
  });
  useEffect(() => {
    try {
      if (value) sessionStorage.setItem(storageKey, value);
      else sessionStorage.removeItem(storageKey);
    } catch {
      // Private modes may refuse storage: the text still lives in the form.
    }
  }, [storageKey, value]);
  return [value, setValue, () => setValue('')];
}
