import { useEffect, useRef, useState } from 'react';
import type { KitForm } from '../../lib/kit/kit-settings';

/** Typing in a number field waits this long before building (a click on a scale button builds at once). */
export const TYPING_DEBOUNCE_MS = 250;

/**
 * The settings the preview is built from: the valid form right after a click, after a pause while typing.
 * `nextChangeNow()` before a change makes that change settle at once; `settleNow()` settles the current form.
 */
export function useSettledSettings(initial: KitForm, valid: KitForm | null) {
  const [settled, setSettled] = useState<KitForm>(initial);
  const immediate = useRef(false);
  const validKey = valid ? JSON.stringify(valid) : null;
  useEffect(() => {
    if (!valid) return;
    const delay = immediate.current ? 0 : TYPING_DEBOUNCE_MS;
    immediate.current = false;
    const timer = setTimeout(() => setSettled(valid), delay);
    return () => clearTimeout(timer);
    // validKey stands for valid's content, so an equal form does not restart the timer.
  }, [validKey]);
  return {
    settled,
    /** valid's content as a string (null while the form has errors): changes exactly when the settings do. */
    validKey,
    /** Whether the next change of the settings builds at once (true) or after the typing pause. */
    nextChangeNow: (now = true) => {
      immediate.current = now;
    },
    settleNow: () => valid && setSettled(valid),
  };
}
