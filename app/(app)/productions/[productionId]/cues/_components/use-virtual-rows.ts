"use client";

import { useCallback, useEffect, useRef, useState } from "react";

/**
 * Windowing for long tables with rows of one fixed height: only the rows in view (plus some
 * overscan) are rendered, and two spacer rows keep the scroll height true. Enough for 400 channels
 * or 600 cues without a library.
 */
export function useVirtualRows({
  count,
  rowHeight,
  overscan = 12,
}: {
  count: number;
  rowHeight: number;
  overscan?: number;
}) {
  const ref = useRef<HTMLDivElement>(null);
  const [scrollTop, setScrollTop] = useState(0);
  const [viewport, setViewport] = useState(480);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const ro = new ResizeObserver(() => setViewport(el.clientHeight || 480));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);
  const first = Math.max(0, Math.floor(scrollTop / rowHeight) - overscan);
  const last = Math.min(count, Math.ceil((scrollTop + viewport) / rowHeight) + overscan);
  const onScroll = useCallback((e: React.UIEvent<HTMLDivElement>) => setScrollTop(e.currentTarget.scrollTop), []);
  /** Brings row `index` into view (a third of the way down when it has to move), keeping the header clear. */
  const scrollToIndex = useCallback(
    (index: number, header = rowHeight) => {
      const el = ref.current;
      if (!el || index < 0) return;
      const top = index * rowHeight;
      if (top < el.scrollTop || top + rowHeight + header > el.scrollTop + el.clientHeight) {
        el.scrollTop = Math.max(0, top - el.clientHeight / 3);
        setScrollTop(el.scrollTop);
      }
    },
    [rowHeight],
  );
  return {
    ref,
    onScroll,
    first,
    last,
    padTop: first * rowHeight,
    padBottom: (count - last) * rowHeight,
    scrollToIndex,
  };
}
