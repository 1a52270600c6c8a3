/** The status line's notice: a message shown for a few seconds (a newer message replaces it). */
import { useCallback, useState } from "react";

export const NOTICE_MS = 6000;

export function useNotice(): { notice: string | null; flash: (message: string) => void } {
  const [notice, setNotice] = useState<string | null>(null);
  const flash = useCallback((message: string) => {
    setNotice(message);
    window.setTimeout(() => setNotice((n) => (n === message ? null : n)), NOTICE_MS);
  }, []);
  return { notice, flash };
}
