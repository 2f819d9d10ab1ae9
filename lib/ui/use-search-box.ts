"use client";
import { useEffect, useRef, useState, type MouseEvent } from "react";
import { useDebounced } from "@/lib/ui/use-debounced";

/**
 * A list's search box kept in the URL: the text applies once typing pauses, follows back and
 * forward, and a pending search is dropped when the user follows a link out of the list (it
 * would otherwise replace the URL after the click and pull them back to the list).
 */
export function useSearchBox(urlQ: string, apply: (q: string) => void, ms = 250) {
  const [text, setText] = useState(urlQ);
  const debounced = useDebounced(text, ms);
  const leaving = useRef(false);

  useEffect(() => {
    if (!leaving.current && debounced !== urlQ) apply(debounced);
    // Only the debounced text should trigger this.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [debounced]);

  // Back and forward change the URL: the box follows (set while rendering, React's pattern for
  // state that tracks a prop).
  const [seenQ, setSeenQ] = useState(urlQ);
  if (seenQ !== urlQ) {
    setSeenQ(urlQ);
    setText(urlQ);
  }

  return {
    text,
    setText: (next: string) => {
      leaving.current = false;
      setText(next);
    },
    /** On the list's wrapper: a plain click on a link means the user is leaving this list. */
    onClickCapture: (e: MouseEvent) => {
      if (e.button !== 0 || e.metaKey || e.ctrlKey || e.shiftKey || e.altKey) return;
      if (e.target instanceof Element && e.target.closest("a[href]")) leaving.current = true;
    },
  };
}
