/**
 * Keyboard behaviour of a modal dialog: focus moves into it when it opens (to `initialFocus`, else its
 * first control), Tab and Shift+Tab stay inside it, Escape closes it, and focus returns to where it was
 * when it closes. Keys are heard on the dialog itself, so with two dialogs open (a question over the
 * start view) Escape closes only the one in front.
 */
import { useEffect, useRef, type RefObject } from "react";

const FOCUSABLE =
  'button:not([disabled]), [href], input:not([disabled]), select:not([disabled]), textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';

function focusables(root: HTMLElement): HTMLElement[] {
  return Array.from(root.querySelectorAll<HTMLElement>(FOCUSABLE));
}

export function useModal<T extends HTMLElement>(
  onClose: () => void,
  initialFocus?: RefObject<HTMLElement | null>,
): RefObject<T | null> {
  const ref = useRef<T | null>(null);
  const onCloseRef = useRef(onClose);
  onCloseRef.current = onClose;
  useEffect(() => {
    const root = ref.current;
    if (!root) return;
    const before = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    (initialFocus?.current ?? focusables(root)[0] ?? root).focus();
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape") {
        e.stopPropagation();
        onCloseRef.current();
        return;
      }
      if (e.key !== "Tab") return;
      const list = focusables(root);
      const first = list[0];
      const last = list[list.length - 1];
      if (!first || !last) {
        e.preventDefault();
      } else if (e.shiftKey && (document.activeElement === first || !root.contains(document.activeElement))) {
        e.preventDefault();
        last.focus();
      } else if (!e.shiftKey && document.activeElement === last) {
        e.preventDefault();
        first.focus();
      }
    };
    root.addEventListener("keydown", onKey);
    return () => {
      root.removeEventListener("keydown", onKey);
      // Back to the control that opened the dialog, if it is still on screen.
      if (before?.isConnected) before.focus();
    };
    // The dialog's elements are fixed for its lifetime; onClose is read through a ref.
    // eslint-disable-next-line react-hooks/exhaustive-deps -- see the comment above: the omitted values are read through refs on purpose
  }, []);
  return ref;
}
