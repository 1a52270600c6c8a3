/**
 * Tabs as the WAI-ARIA Authoring Practices describe them: a tablist of tabs, each controlling a tabpanel;
 * only the selected tab is in the Tab order; Left/Right arrow keys move to the previous/next tab (and
 * wrap), Home/End to the first/last, selecting it as they go.
 */
import { useCallback, useRef, type KeyboardEvent } from "react";

export function useTabs<T extends string>(prefix: string, ids: readonly T[], selected: T, onSelect: (id: T) => void) {
  const buttons = useRef(new Map<T, HTMLButtonElement>());
  const onKeyDown = useCallback(
    (event: KeyboardEvent<HTMLElement>) => {
      const index = ids.indexOf(selected);
      let next: number | null = null;
      if (event.key === "ArrowRight") next = (index + 1) % ids.length;
      else if (event.key === "ArrowLeft") next = (index - 1 + ids.length) % ids.length;
      else if (event.key === "Home") next = 0;
      else if (event.key === "End") next = ids.length - 1;
      if (next === null) return;
      event.preventDefault();
      const id = ids[next]!;
      onSelect(id);
      buttons.current.get(id)?.focus();
    },
    [ids, selected, onSelect],
  );
  return {
    list: { role: "tablist" as const, onKeyDown },
    tab: (id: T) => ({
      role: "tab" as const,
      type: "button" as const,
      id: `${prefix}-tab-${id}`,
      "aria-selected": id === selected,
      "aria-controls": id === selected ? `${prefix}-panel` : undefined,
      tabIndex: id === selected ? 0 : -1,
      ref: (el: HTMLButtonElement | null) => {
        if (el) buttons.current.set(id, el);
        else buttons.current.delete(id);
      },
      onClick: () => onSelect(id),
    }),
    /** The panel of the selected tab (one panel element whose content follows the selection). */
    panel: { role: "tabpanel" as const, id: `${prefix}-panel`, "aria-labelledby": `${prefix}-tab-${selected}` },
  };
}
